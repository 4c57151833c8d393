/**
 * What the designer is told when the design flows cannot be trusted (sizing/design.ts):
 * `design.not-converged`. No valid drawing found so far reaches it within the design solve's own
 * limits (40 gradient-method iterations, 30 secant rounds for a pump head), so the limits are cut.
 */
import { describe, expect, it } from "vitest";
import { contextOf } from "@/lib/hydraulics/testing/context-of";
import { fixedBypass, smallSystem } from "@/lib/hydraulics/testing/small-system";
import { solveDesign } from "./design";

const notConverged = (doc: unknown, limits: { maxIterations: number; headRounds: number }) => {
  const { ctx, findings } = contextOf(doc);
  solveDesign(ctx, "heating", limits);
  return findings.list.filter((f) => f.code === "design.not-converged");
};

describe("design.not-converged", () => {
  it("a pump head still moving after its rounds: a warning naming the pump and how far the head still moved", () => {
    // the heat pump's own pump drives a loop through the fixed bypass, so its head is a fixed point
    const f = notConverged(fixedBypass(), { maxIterations: 40, headRounds: 2 });
    expect(f.map((x) => [x.severity, x.refs])).toEqual([["warning", ["hp"]]]);
    const m = /^heating design flows did not settle: the head of a pump beside a bypass or other passive path changed by (\S+) kPa after 2 rounds, so its required head and the flows it drives are not reliable$/.exec(f[0]!.message);
    expect(m).not.toBeNull();
    expect(Number(m![1])).toBeGreaterThan(1e-7);
  });

  it("a pump head whose re-solves run out of iterations: a warning", () => {
    // each secant round re-solves the network: one gradient-method step leaves it unconverged
    expect(notConverged(fixedBypass(), { maxIterations: 1, headRounds: 30 })).toHaveLength(1);
  });

  it("the same head given its full 30 rounds settles, and says nothing", () => {
    expect(notConverged(fixedBypass(), { maxIterations: 40, headRounds: 30 })).toEqual([]);
  });

  it("the gradient method out of iterations: a warning saying how many it had", () => {
    // a tree: the first step gives the flows by continuity, the second confirms them
    const f = notConverged(smallSystem(), { maxIterations: 1, headRounds: 30 });
    expect(f.map((x) => [x.severity, x.message, x.refs])).toEqual([
      ["warning", "heating design flows did not converge in 1 iterations; loops in the network may be badly conditioned", []],
    ]);
    expect(notConverged(smallSystem(), { maxIterations: 40, headRounds: 30 })).toEqual([]);
  });
});
