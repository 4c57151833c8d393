/**
 * How many Newton steps colebrookUnchecked takes — what its doc promises ("converges in 3–5" from
 * Haaland, "one or two steps" from a warm start, "at most 50 steps"). The root itself is checked in
 * friction.test.ts; a slower start or a lost stop test gives the same f, so only the step count shows it.
 * Counted through Math.log10: one call for the Haaland start, one per Newton step (g(x) = x + 2·log10(…)).
 */
import { afterEach, describe, expect, it, vi } from "vitest";
import { colebrookUnchecked, haaland, haalandRoughTerm, haalandStartX } from "./colebrook";

afterEach(() => vi.restoreAllMocks());

function log10Calls(run: () => number): { calls: number; f: number } {
  const spy = vi.spyOn(Math, "log10");
  const f = run();
  const calls = spy.mock.calls.length;
  spy.mockRestore();
  return { calls, f };
}

describe("Colebrook by Newton on x = 1/√f: step counts", () => {
  // Hand reasoning: Haaland (1983) is within ~1.5 % of Colebrook in f, so within ~0.8 % (≈ 0.06 of x ≈ 7–9)
  // in x; g(x) = x + 2·log10(a + b·x) has g' ≈ 1 and |g''| ≈ 2b²/((a + bx)²·ln 10) ≪ 1, so each Newton
  // step squares the error (times |g''|/2g' < 0.01): 0.06 → < 4e-5 → < 2e-11, and the step after that is
  // below the 1e-10 stop — three steps, or two when the start is already closer. Every case below:
  // 1 log10 call for the start + at most 3 for the steps.
  it.each([
    [4000, 0], [1e4, 0], [1e5, 0], [1e6, 0], [1e8, 0],
    [1e4, 1e-4], [2e4, 0.002], [1e5, 1e-3], [4000, 0.05], [1e6, 0.01], [1e5, 1e-6],
  ])("Re %s, ε/D %s: from Haaland, at most 3 Newton steps", (re, rr) => {
    const { calls, f } = log10Calls(() => colebrookUnchecked(re, rr));
    expect(calls).toBeGreaterThanOrEqual(3); // the start + at least two steps (the first is ~1e-2)
    expect(calls).toBeLessThanOrEqual(4);
    expect(f).toBeGreaterThan(0.005); // a Moody-chart f (0.0076 at Re 1e8 smooth … 0.072 at ε/D 0.05)
  });
  it("from a warm start at the converged x: one step, no Haaland start", () => {
    const x = 1 / Math.sqrt(colebrookUnchecked(1e5, 1e-4));
    expect(log10Calls(() => colebrookUnchecked(1e5, 1e-4, x)).calls).toBe(1);
  });
  it("from a warm start 0.1 % off the root: two steps — the second's error estimate (|g''/2g'|·Δx² < 1e-12) ends it, no confirming third", () => {
    // Δx₁ ≈ 0.008 of x ≈ 8 leaves ≈ 0.003·Δx₁² ≈ 2e-7; Δx₂ ≈ 2e-7 leaves ≈ 1e-16 < 1e-12 (a |Δx| < 1e-10 test alone needs a third)
    const x = 1 / Math.sqrt(colebrookUnchecked(1e5, 1e-4));
    const { calls, f } = log10Calls(() => colebrookUnchecked(1e5, 1e-4, x * 1.001));
    expect(calls).toBe(2);
    expect(f).toBeCloseTo(1 / (x * x), 14);
  });
  it("from a start Newton cannot recover from it gives up after exactly 50 steps (NaN, no hang)", () => {
    // smooth pipe, Re 1e5: b = 2.51e-5; from x = 1e6 the first step lands at x ≈ −1.9 (g ≈ 1e6, g' ≈ 1),
    // where a + b·x < 0: log10 gives NaN, |NaN| < 1e-10 is never true, and only the 50-step cap ends the loop
    const { calls, f } = log10Calls(() => colebrookUnchecked(1e5, 0, 1e6));
    expect(calls).toBe(50);
    expect(f).toBeNaN();
  });
  it("the Haaland start from a kept rough term is haaland()'s 1/√f, and Newton from it gives the cold result to the last bit", () => {
    for (const [re, rr] of [[4000, 0], [1e5, 1e-4], [2e6, 0.01]] as const) {
      const start = haalandStartX(re, haalandRoughTerm(rr));
      expect(start).toBeCloseTo(1 / Math.sqrt(haaland(re, rr)), 12);
      expect(colebrookUnchecked(re, rr, start)).toBe(colebrookUnchecked(re, rr));
    }
  });
});
