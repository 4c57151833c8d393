/**
 * Differential bypass sizing (sizing/bypass.ts) in the cases around its verdict: two radiator
 * zones between manifolds, the bypass between the manifolds' third outlets.
 * - need = the larger of the zones' design Δp between the bypass ends and the Δp the pump puts
 *   there with every zone open (bypass shut); a drawn opening below it is `bypass.opening-low`,
 *   one at it is not (below, by definition), and the message names whichever of the two governs;
 * - the bypass may be drawn either way round; a zone valve drawn shut is opened for the
 *   all-zones-open case; a bypass with no heating circuit between its ends gets no opening
 *   (`bypass.not-across-zones`) rather than a made-up one.
 * Hand values of the same system are in bypass-verdict.test.ts; here the engine's own
 * runs are compared with each other where only the drawing changes.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { STRONG, WEAK, type Curve } from "@/lib/hydraulics/testing/two-zone-bypass";

interface Opts {
  curve: Curve; valveKv: number; opening?: number | null; reversed?: boolean; zv2Open?: boolean; onFlowMain?: boolean;
  /** the bypass's flow end on the heat pump's flow port itself (two pipes there) */
  atHeatPump?: boolean;
  /** a third, stiff load from the flow manifold back to a tee on the return main, past the return manifold */
  outsideLoad?: boolean;
}
function run(o: Opts) {
  const cu = (id: string, from: string, to: string, size: string, lengthM: number) => ({ id, from, to, material: "copper", size, lengthM });
  const rad = (id: string, heatLoadW: number) => ({ id, type: "radiator", props: { outputAtDt50W: 8000, heatLoadW, valveKv: o.valveKv, waterVolumeL: 8 } });
  const [endA, endB] = o.onFlowMain ? ["mf.p3", "tx.c"] : o.reversed ? ["mr.p3", "mf.p3"] : o.atHeatPump ? ["hp.flow", "mr.p3"] : ["mf.p3", "mr.p3"];
  const out = calculate({
    format: "loopwright/schematic", version: 1, name: "bypass cases", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 1000 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, minFlowM3h: 0, kv: 5, waterVolumeL: 2, pumpCurve: o.curve } },
      { id: "tx", type: "tee" },
      { id: "mf", type: "manifold", props: { outlets: 4 } },
      { id: "ty", type: "tee" },
      { id: "h3", type: "heat-load", props: { heatLoadW: o.outsideLoad ? 800 : 0, kv: 0.1, waterVolumeL: 1 } },
      { id: "mr", type: "manifold", props: { outlets: 3 } },
      { id: "zv1", type: "zone-valve", props: { kvs: 4, open: true } },
      { id: "zv2", type: "zone-valve", props: { kvs: 4, open: o.zv2Open ?? true } },
      rad("r1", 1500),
      rad("r2", 1000),
      { id: "bp", type: "dp-bypass-valve", props: { kvs: 2, openingKpa: o.opening ?? null } },
    ],
    pipes: [
      cu("fm0", "hp.flow", "tx.a", "22", 1.5), cu("fm", "tx.b", "mf.common", "22", 1.5), cu("rm0", "mr.common", "ty.a", "22", 1.5), cu("rm", "ty.b", "hp.return", "22", 1.5),
      cu("c0", "mf.p4", "h3.flow", "15", 2), cu("c1", "h3.return", "ty.c", "15", 2),
      cu("a0", "mf.p1", "zv1.a", "15", 1), cu("a1", "zv1.b", "r1.flow", "15", 4), cu("a2", "r1.return", "mr.p1", "15", 5),
      cu("b0", "mf.p2", "zv2.a", "15", 1), cu("b1", "zv2.b", "r2.flow", "15", 4), cu("b2", "r2.return", "mr.p2", "15", 5),
      cu("y1", endA, "bp.a", "15", 0.5), cu("y2", "bp.b", endB, "15", 0.5),
    ],
  });
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  const r = out.results;
  return { r, bp: r.bypass!, of: (code: string) => r.findings.filter((f) => f.code === code) };
}
const needOf = (b: { zonesDpKpa: number | null; openZonesDpKpa: number | null }) => Math.max(b.zonesDpKpa!, b.openZonesDpKpa!);

describe("bypass.opening-low at the need and its message", () => {
  it("an opening exactly at the need is not below it: no finding", () => {
    const need = needOf(run({ curve: STRONG, valveKv: 0.3 }).bp);
    const at = run({ curve: STRONG, valveKv: 0.3, opening: need });
    expect(needOf(at.bp)).toBe(need);
    expect(at.of("bypass.opening-low")).toEqual([]);
  });

  it("no opening drawn: it is recommended, not called low", () => {
    const { bp, of } = run({ curve: STRONG, valveKv: 0.3 });
    expect(bp.recommendedOpeningKpa).toBeGreaterThan(needOf(bp));
    expect(of("bypass.opening-low")).toEqual([]);
  });

  it("the pump's all-zones-open Δp governs (strong pump): the message names that Δp", () => {
    const first = run({ curve: STRONG, valveKv: 0.3 }).bp;
    expect(first.openZonesDpKpa!).toBeGreaterThan(first.zonesDpKpa!);
    const { of } = run({ curve: STRONG, valveKv: 0.3, opening: 50 });
    expect(of("bypass.opening-low").map((f) => f.message)).toEqual([
      `bp: opens at 50 kPa, below the ${first.openZonesDpKpa!.toFixed(1)} kPa the pump puts across its ends with every zone open, so it passes flow with every zone open`,
    ]);
  });

  it("the zones' design Δp governs (weak pump, stiff valves): the message names the zones' Δp", () => {
    const first = run({ curve: WEAK, valveKv: 0.3 }).bp;
    expect(first.zonesDpKpa!).toBeGreaterThan(first.openZonesDpKpa!);
    const { of } = run({ curve: WEAK, valveKv: 0.3, opening: 10 });
    expect(of("bypass.opening-low").map((f) => f.message)).toEqual([
      `bp: opens at 10 kPa, below the zones' ${first.zonesDpKpa!.toFixed(1)} kPa at design flow, so it passes flow with every zone open`,
    ]);
  });
});

describe("how the bypass is drawn", () => {
  it("drawn the other way round (a on the return manifold): the same Δps and opening", () => {
    const fwd = run({ curve: STRONG, valveKv: 0.3 }).bp;
    const rev = run({ curve: STRONG, valveKv: 0.3, reversed: true }).bp;
    expect(fwd.zonesDpKpa).not.toBeNull();
    expect(rev.zonesDpKpa!).toBeCloseTo(fwd.zonesDpKpa!, 9);
    expect(rev.openZonesDpKpa!).toBeCloseTo(fwd.openZonesDpKpa!, 6);
    expect(rev.recommendedOpeningKpa!).toBeCloseTo(fwd.recommendedOpeningKpa!, 6);
  });

  it("a zone valve drawn shut is opened for the all-zones-open Δp: the same as with both drawn open", () => {
    const open = run({ curve: STRONG, valveKv: 0.3 }).bp;
    const shut = run({ curve: STRONG, valveKv: 0.3, zv2Open: false }).bp;
    expect(shut.openZonesDpKpa!).toBeCloseTo(open.openZonesDpKpa!, 6);
  });

  it("the all-zones-open case opens the zone valves only: no other part is taken for a valve", () => {
    const { r } = run({ curve: STRONG, valveKv: 0.3 });
    expect(r.findings.filter((f) => f.code === "scenario.unknown-valve")).toEqual([]);
  });

  it("the bypass joined at the heat pump's own flow port: still across the zones", () => {
    const { bp, of } = run({ curve: STRONG, valveKv: 0.3, atHeatPump: true });
    expect(of("bypass.not-across-zones")).toEqual([]);
    // from the flow port: the zones' Δp plus the 3 m of flow main and more, so above the manifold-to-manifold Δp
    expect(bp.zonesDpKpa!).toBeGreaterThan(run({ curve: STRONG, valveKv: 0.3 }).bp.zonesDpKpa!);
  });

  it("a load leaving from the flow manifold but returning past the return manifold does not count: the zones' Δp is unchanged", () => {
    const without = run({ curve: STRONG, valveKv: 0.3 }).bp;
    const withOutside = run({ curve: STRONG, valveKv: 0.3, outsideLoad: true }).bp;
    // the zones' flows are their design flows either way, so the Δp across them is the same
    expect(withOutside.zonesDpKpa!).toBeCloseTo(without.zonesDpKpa!, 9);
  });

  it("both ends on the flow side: bypass.not-across-zones, no Δp and no opening recommended", () => {
    const { bp, of } = run({ curve: STRONG, valveKv: 0.3, onFlowMain: true, opening: 5 });
    expect(bp.zonesDpKpa).toBeNull();
    expect(bp.openZonesDpKpa).toBeNull();
    expect(bp.recommendedOpeningKpa).toBeNull();
    const f = of("bypass.not-across-zones");
    expect(f.map((x) => [x.severity, x.refs])).toEqual([["warning", ["bp"]]]);
    expect(f[0]!.message).toBe("bp: no heating circuit passes between its two ends, so no opening pressure can be recommended");
    expect(of("bypass.opening-low")).toEqual([]);
  });
});
