/**
 * `design.not-converged` when the gradient method runs out of iterations on the design flows
 * (sizing/design.ts). A tree converges in one or two steps, so the solver is made to report that it
 * did not (its flows and heads stay the real ones); the message says how many iterations it had.
 */
import { describe, expect, it, vi } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";

vi.mock(import("@/lib/hydraulics/network/gga"), async (importOriginal) => {
  const real = await importOriginal();
  return {
    ...real,
    solveNetwork: (...a: Parameters<typeof real.solveNetwork>) => ({ ...real.solveNetwork(...a), converged: false, iterations: a[4]?.maxIterations ?? 60 }),
  };
});

describe("design flows that did not converge", () => {
  it("are a warning per mode, giving the 40 iterations a design solve has", () => {
    const out = calculate(smallSystem());
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    const f = out.results.findings.filter((x) => x.code === "design.not-converged");
    expect(f.map((x) => [x.severity, x.message, x.refs])).toEqual([
      ["warning", "heating design flows did not converge in 40 iterations; loops in the network may be badly conditioned", []],
    ]);
  });
});
