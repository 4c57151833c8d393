/**
 * Parts with more than one link: a diverter reports the side its mode selects (heating: the heating
 * side; hot-water: the cylinder side — sizing/state.ts), a low-loss header its primary pass with no
 * drop of its own. Flows are hand calculations: q = P/(ρ·cp·ΔT) (references §1.1 water).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { flowM3h, WATER } from "@/lib/hydraulics/testing/hand-calc";

type Results = Extract<ReturnType<typeof calculate>, { ok: true }>["results"];
function results(d: object): Results {
  const out = calculate(d);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
const design = { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 500 };
const flowOf = (r: Results, mode: string, id: string) => r.modes.find((m) => m.mode === mode)!.parts.find((p) => p.id === id)!;

/** Heat pump → diverter (a: heat load, b: cylinder coil) → tee → heat pump. */
function diverterDoc() {
  return {
    format: "loopwright/schematic", version: 1, name: "diverter", fluid: { kind: "water" }, design,
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 6, kv: 4, waterVolumeL: 30, pumpCurve: [[0, 60], [1, 50], [2, 0]] } },
      { id: "hl", type: "heat-load", props: { heatLoadW: 3000, kv: 2, waterVolumeL: 60 } },
      { id: "dv", type: "diverter-valve", props: { kvs: 6, position: "a" } },
      { id: "tr", type: "tee" },
      { id: "cyl", type: "cylinder", props: { volumeL: 200, coilKv: 3, coilOutputKw: 10, coldWaterC: 10, coilWaterVolumeL: 0 } },
    ],
    pipes: [cu("f0", "hp.flow", "dv.ab", 1), cu("f", "dv.a", "hl.flow", 4), cu("r", "hl.return", "tr.a", 4), cu("r0", "tr.c", "hp.return", 1),
      cu("c1", "dv.b", "cyl.coilFlow", 2), cu("c2", "cyl.coilReturn", "tr.b", 2)],
  };
}

describe("diverter", () => {
  it("heating mode: the heating side's flow, the heat load's 3 kW at 10 K", () => {
    const r = results(diverterDoc());
    // q = 3000/(992.2·4179.4·10)·3600 = 0.2604 m³/h (water at the 40 °C mean)
    const q = flowM3h(3000, 10, WATER[40]);
    expect(flowOf(r, "heating", "hl").flowM3h! / q).toBeCloseTo(1, 3);
    expect(flowOf(r, "heating", "dv").flowM3h! / q).toBeCloseTo(1, 3);
    expect(flowOf(r, "heating", "cyl").flowM3h).toBe(0);
  });

  it("hot-water mode: the cylinder side's flow; the heat load has none", () => {
    const r = results(diverterDoc());
    const coil = flowOf(r, "hot-water", "cyl").flowM3h!;
    expect(coil).toBeGreaterThan(0.1);
    expect(flowOf(r, "hot-water", "hl").flowM3h).toBe(0);
    expect(flowOf(r, "hot-water", "dv").flowM3h! / coil).toBeCloseTo(1, 6); // one series path, to the solver's tolerance
  });
});

describe("low-loss header", () => {
  it("reports its primary pass (the heat pump's flow) and no drop of its own", () => {
    const r = results({
      format: "loopwright/schematic", version: 1, name: "header", fluid: { kind: "water" }, design,
      parts: [
        { id: "hp", type: "heat-pump", props: { ratedOutputKw: 6, kv: 5, waterVolumeL: 2, pumpCurve: [[0, 60], [1, 50], [2, 0]] } },
        { id: "bv", type: "low-loss-header", props: { volumeL: 2 } },
        { id: "pu", type: "pump", props: { curve: [[0, 30], [0.5, 25], [1, 15], [1.5, 0]] } },
        { id: "rad", type: "radiator", props: { outputAtDt50W: 14000, heatLoadW: 4000, valveKv: 2.5, waterVolumeL: 0 } },
      ],
      pipes: [cu("q1", "hp.flow", "bv.p1", 2), cu("q2", "bv.p2", "hp.return", 2), cu("s1", "bv.p3", "pu.in", 1), cu("s2", "pu.out", "rad.flow", 8), cu("s3", "rad.return", "bv.p4", 8)],
    });
    const bv = flowOf(r, "heating", "bv");
    expect(bv.pressureDropKpa).toBe(0);
    expect(bv.flowM3h! / flowOf(r, "heating", "hp").flowM3h!).toBeCloseTo(1, 9);
    expect(bv.flowM3h!).toBeGreaterThan(0);
    expect(r.findings.filter((f) => f.code === "valve.shut")).toHaveLength(0);
  });
});
