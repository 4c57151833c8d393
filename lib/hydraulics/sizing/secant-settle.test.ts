/**
 * The secant settle behind the heads of pumps beside passive paths (design.ts), on functions whose
 * roots and secant steps are written out by hand here.
 */
import { describe, expect, it } from "vitest";
import { settleBySecant } from "./secant-settle";

describe("settleBySecant", () => {
  it("finds the root of cos g − g, 0.7390851332 (Burden & Faires, Numerical Analysis, 9th ed., §2.3, Example 1), in a few secant steps", () => {
    // The published root, from memory; checked independently: cos(0.7390851332) − 0.7390851332 < 1e-10.
    const root = 0.7390851332;
    expect(Math.abs(Math.cos(root) - root)).toBeLessThan(1e-10);
    const s = settleBySecant([0.5], [Math.cos(0.5) - 0.5], ([g]) => [Math.cos(g!) - g!], 8, 1e-12);
    expect(s.settled).toBe(true);
    expect(s.values[0]).toBeCloseTo(root, 10);
    expect(s.residual).toBeLessThan(1e-12);
    // Substitution alone (g ← cos g) shrinks the error only by |sin 0.739| = 0.67 a step: 8 steps
    // from 0.5 leave it near 0.24 × 0.67⁸ ≈ 1e-2, far from settled.
    expect(s.rounds).toBeLessThanOrEqual(8);
  });

  it("takes the substitution step first, then secant steps: on f = 3 − 2g from 0, g = 3 then the root 1.5", () => {
    // f(0) = 3 is given; round 1: no earlier point, g ← 0 + 3 = 3; round 2: secant through (0, 3) and (3, −3):
    // g ← 3 − (−3)(3 − 0)/(−3 − 3) = 1.5, where f = 0.
    const seen: number[] = [];
    const f = ([g]: readonly number[]) => (seen.push(g!), [3 - 2 * g!]);
    const s = settleBySecant([0], [3], f, 30, 1e-7);
    expect(seen).toEqual([3, 1.5]);
    expect(s).toEqual({ values: [1.5], residual: 0, settled: true, rounds: 2 });
  });

  it("stops after the rounds it is given, on each side of the limit, and checks the last step", () => {
    const f = ([g]: readonly number[]) => [3 - 2 * g!];
    // one round: g = 3 is where it stops, unsettled, with |f(3)| = 3
    expect(settleBySecant([0], [3], f, 1, 1e-7)).toEqual({ values: [3], residual: 3, settled: false, rounds: 1 });
    // two rounds: the second step lands on the root and is checked before stopping
    expect(settleBySecant([0], [3], f, 2, 1e-7)).toEqual({ values: [1.5], residual: 0, settled: true, rounds: 2 });
    // no rounds: only the start is checked
    expect(settleBySecant([0], [3], f, 0, 1e-7)).toEqual({ values: [0], residual: 3, settled: false, rounds: 0 });
    expect(settleBySecant([1.5], [0], f, 0, 1e-7)).toEqual({ values: [1.5], residual: 0, settled: true, rounds: 0 });
  });

  it("counts as settled only below the tolerance", () => {
    expect(settleBySecant([0], [0.5], () => [0.5], 0, 0.5).settled).toBe(false);
    expect(settleBySecant([0], [0.5], () => [0.5], 0, 0.50001).settled).toBe(true);
    expect(settleBySecant([0], [-0.5], () => [-0.5], 0, 0.50001).settled).toBe(true);
    expect(settleBySecant([0], [-0.5], () => [-0.5], 0, 0.5).settled).toBe(false);
  });

  it("steps each entry on its own and is unsettled while any entry is: the largest |f| is reported", () => {
    // entry 0: f = 3 − 2g settles at 1.5; entry 1: f = −1 whatever g, so the secant divides by zero
    // and each step falls back to substitution, g ← g − 1.
    const s = settleBySecant([0, 10], [3, -1], ([a]) => [3 - 2 * a!, -1], 5, 1e-7);
    expect(s).toEqual({ values: [1.5, 5], residual: 1, settled: false, rounds: 5 });
  });

  it("an empty set settles at once", () => {
    expect(settleBySecant([], [], () => [], 30, 1e-7)).toEqual({ values: [], residual: -Infinity, settled: true, rounds: 0 });
  });
});
