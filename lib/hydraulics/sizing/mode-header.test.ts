/**
 * A low-loss header between a primary loop (heat pump with its own pump) and a secondary
 * loop (pump → one radiator), worked out by hand. Water at the 40 °C mean of 45/35 °C
 * (IAPWS, references §1.1); design flows Q = Φ/(ρ·cp·ΔT) (first law); Kv drops by IEC
 * 60534-1, pipe drops by Darcy–Weisbach with Colebrook; pump curves read by straight lines.
 * - design: the primary brings the heat pump's rated output at the design ΔT, the secondary
 *   draws its load's flow; where it draws more, secondary return mixes into the flow:
 *   T = (Qp·T_flow + (Qs − Qp)·T_return)/Qs (mixing by flow, first-law balance), with the
 *   warning header.primary-low;
 * - simulated, each loop runs on its own pump (the header's legs are near loss-free), and the
 *   header's common leg carries the difference Qp − Qs (continuity at the header);
 * - the mode's pump is the one that needs the most head.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { bisect, copperDpKpa, curveHeadKpa, flowM3h, kvDpKpa, WATER } from "@/lib/hydraulics/testing/hand-calc";
import { CURVE, headerDoc, type Opts } from "@/lib/hydraulics/testing/header-system";

const W = WATER[40];
function run(o: Opts) {
  const out = calculate(headerDoc(o));
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
const lowFindings = (r: ReturnType<typeof run>) => r.findings.filter((f) => f.code === "header.primary-low");
/** Hand: primary loop = heat exchanger Kv + 6 m Cu 22; secondary = radiator valve Kv + 10 m Cu 22. */
const primaryDp = (q: number, kv = 5) => kvDpKpa(q, kv, W.rho) + copperDpKpa(q, "22", 6, W);
const secondaryDp = (q: number, kv = 1) => kvDpKpa(q, kv, W.rho) + copperDpKpa(q, "22", 10, W);
// ±0.5 %: engine against hand (same published methods; operating points to the solver's 1e-5)
const near = (got: number, want: number) => expect(Math.abs(got / want - 1)).toBeLessThan(5e-3);

describe("header.primary-low: the secondary draws more than the primary brings", () => {
  it("5 kW source, 7.5 kW secondary load: warns, naming both flows and the mixed flow temperature ≈ 41.7 °C", () => {
    const r = run({ ratedW: 5000, loadW: 7500 });
    const qp = flowM3h(5000, 10, W);
    const qs = flowM3h(7500, 10, W);
    const mixed = (qp * 45 + (qs - qp) * 35) / qs; // = 45 − 10·(1 − 5/7.5) = 41.67 °C
    const f = lowFindings(r);
    expect(f).toHaveLength(1);
    expect(f[0]!.severity).toBe("warning");
    expect(f[0]!.refs).toEqual(["llh", "hp"]);
    expect(f[0]!.message).toContain(`draws ${qs.toFixed(3)} m³/h`);
    expect(f[0]!.message).toContain(`brings ${qp.toFixed(3)} m³/h`);
    expect(f[0]!.message).toContain("heating mode");
    expect(f[0]!.message).toContain(`about ${mixed.toFixed(1)} °C instead of 45 °C`);
    expect(mixed.toFixed(1)).toBe("41.7");
    expect(f[0]!.message).toMatch(/^llh: /);
  });

  it("either side of the limit: secondary 2 % above warns; equal, or 2 % below, does not", () => {
    expect(lowFindings(run({ ratedW: 5000, loadW: 5100 }))).toHaveLength(1);
    expect(lowFindings(run({ ratedW: 5000, loadW: 5000 }))).toHaveLength(0);
    expect(lowFindings(run({ ratedW: 5000, loadW: 4900 }))).toHaveLength(0);
  });

  it("design flows: the heat pump carries the primary flow, the secondary pipes the radiator's, and the header reports the primary pass", () => {
    const r = run({ ratedW: 5000, loadW: 7500 });
    const m = r.modes[0]!;
    const pipe = (id: string) => m.pipes.find((p) => p.id === id)!.flowM3h!;
    near(m.heatSourceFlowM3h!, flowM3h(5000, 10, W));
    near(pipe("pf"), flowM3h(5000, 10, W));
    near(pipe("s2"), flowM3h(7500, 10, W));
    near(m.parts.find((p) => p.id === "llh")!.flowM3h!, flowM3h(5000, 10, W));
  });
});

describe("simulated: each loop on its own pump, the common leg carries the difference", () => {
  it("heat pump loop and secondary loop meet their curves; header common leg = Qp − Qs", () => {
    const r = run({ ratedW: 5000, loadW: 4000 });
    const qp = bisect((q) => curveHeadKpa(CURVE, q) - primaryDp(q), 0.01, 1.99);
    const qs = bisect((q) => curveHeadKpa(CURVE, q) - secondaryDp(q), 0.01, 1.99);
    expect(qp - qs).toBeGreaterThan(0.2); // far enough apart that a leg carrying the wrong flow shows
    const s = r.scenarios[0]!;
    near(s.heatSourceFlowM3h!, qp);
    near(s.pipes.find((p) => p.id === "s2")!.flowM3h!, qs);
    near(s.parts.find((p) => p.id === "llh")!.flowM3h!, qp - qs);
  });
});

describe("the mode's pump: the one that needs the most head", () => {
  it("secondary needs more (radiator valve Kv 1 at 7.5 kW): the secondary pump", () => {
    const qp = flowM3h(5000, 10, W);
    const qs = flowM3h(7500, 10, W);
    expect(secondaryDp(qs)).toBeGreaterThan(primaryDp(qp) * 1.5);
    const m = run({ ratedW: 5000, loadW: 7500 }).modes[0]!;
    expect(m.pumps.map((p) => p.id).sort()).toEqual(["hp", "pump"]);
    expect(m.pump!.id).toBe("pump");
    near(m.pump!.requiredHeadKpa!, secondaryDp(qs));
  });

  it("primary needs more (heat exchanger Kv 0.8, radiator valve Kv 5): the heat pump", () => {
    const qp = flowM3h(5000, 10, W);
    const qs = flowM3h(4000, 10, W);
    expect(primaryDp(qp, 0.8)).toBeGreaterThan(secondaryDp(qs, 5) * 1.5);
    const m = run({ ratedW: 5000, loadW: 4000, hpKv: 0.8, valveKv: 5 }).modes[0]!;
    expect(m.pump!.id).toBe("hp");
    near(m.pump!.requiredHeadKpa!, primaryDp(qp, 0.8));
  });
});
