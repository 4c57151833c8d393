/**
 * A simulation starts from the flows an earlier simulation of the same valves settled at in
 * the same calculation (simulate.ts, ctx.settled). Only the start may change: every answer is
 * checked against a cold solve of the same state in a fresh context.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { contextOf } from "@/lib/hydraulics/testing/context-of";
import { STRONG, twoZoneBypass } from "@/lib/hydraulics/testing/two-zone-bypass";
import { scenarioState } from "./run";
import { simulate } from "./simulate";

const OPEN = { name: "all zones open", mode: "heating" as const, valves: {} };
const ZV1_SHUT = { name: "zone 1 shut", mode: "heating" as const, valves: { zv1: false } };

/** One simulation of spec in a fresh context: nothing settled before it. */
function cold(doc: unknown, spec: typeof OPEN | typeof ZV1_SHUT, openings = new Map<string, number | null>()) {
  const { ctx } = contextOf(doc);
  return simulate(ctx, scenarioState(ctx, spec, openings), null);
}

const maxDiff = (a: Float64Array, b: Float64Array) => a.reduce((m, x, k) => Math.max(m, Math.abs(x - b[k]!)), 0);

describe("simulations of the same valves in one calculation", () => {
  it("the second starts where the first settled: one iteration, the same flows", () => {
    const doc = twoZoneBypass({ curve: STRONG, valveKv: 0.3 });
    const { ctx } = contextOf(doc);
    const first = simulate(ctx, scenarioState(ctx, OPEN, new Map()), null);
    const again = simulate(ctx, scenarioState(ctx, OPEN, new Map()), null);
    expect(first.iterations).toBeGreaterThan(2);
    expect(again.iterations).toBe(1);
    expect(again.converged).toBe(true);
    // Newton's step from a settled point moves it by less than the solver's accuracy (1e-5 of Σ|q|)
    expect(maxDiff(again.q, first.q)).toBeLessThan(1e-6);
  });

  it("other valves start cold and reach their own answer", () => {
    const doc = twoZoneBypass({ curve: STRONG, valveKv: 0.3 });
    const { ctx } = contextOf(doc);
    simulate(ctx, scenarioState(ctx, OPEN, new Map()), null);
    const shut = simulate(ctx, scenarioState(ctx, ZV1_SHUT, new Map()), null);
    expect(shut.iterations).toBeGreaterThan(1);
    expect(maxDiff(shut.q, cold(doc, ZV1_SHUT).q)).toBeLessThan(1e-4);
  });

  it("a bypass that opens in the later state moves the flows away from the start, to the cold answer", () => {
    const doc = twoZoneBypass({ curve: STRONG, valveKv: 0.3 });
    const { ctx } = contextOf(doc);
    const shutBypass = simulate(ctx, scenarioState(ctx, OPEN, new Map()), null);
    // 5 kPa is far below the ≈ 55 kPa the pump puts across the bypass with every zone open
    const low = new Map([["bp", 5]]);
    const opened = simulate(ctx, scenarioState(ctx, OPEN, low), null);
    const bypass = ctx.model.links.findIndex((l) => l.id === "bp");
    expect(Math.abs(shutBypass.q[bypass]!)).toBe(0);
    expect(Math.abs(opened.q[bypass]!)).toBeGreaterThan(0.1);
    expect(opened.iterations).toBeGreaterThan(1);
    expect(maxDiff(opened.q, cold(doc, OPEN, low).q)).toBeLessThan(1e-4);
  });

  it("calculate(): the default all-zones-open scenario starts from the bypass sizing's run", () => {
    const r = calculate(twoZoneBypass({ curve: STRONG, valveKv: 0.3 }));
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    const open = r.results.scenarios.find((s) => s.name === "all zones open")!;
    expect(open.iterations).toBe(1);
    // the recommended opening holds the bypass shut with every zone open: the answer is the sizing run's
    const { ctx } = contextOf(twoZoneBypass({ curve: STRONG, valveKv: 0.3 }));
    const ref = simulate(ctx, scenarioState(ctx, OPEN, new Map([["bp", r.results.bypass!.recommendedOpeningKpa]])), null);
    ctx.doc.pipes.forEach((p, i) => {
      const got = open.pipes.find((x) => x.id === p.id)!.flowM3h!;
      expect(Math.abs(got - ref.q[ctx.model.pipeLink[i]!]!)).toBeLessThan(1e-4);
    });
  });
});
