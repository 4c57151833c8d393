/**
 * A diverter valve sends the heat pump's flow to the radiator (heating) or the cylinder
 * coil (hot water), never both. Heat pump (own pump, heat exchanger Kv 5) → 5 m Cu 22 →
 * diverter ab; a → 2 m → cylinder coil → 2 m; b → 2 m → radiator → 2 m; both back
 * through 5.5 m Cu 22. Worked out by hand: design flows Q = Φ/(ρ·cp·ΔT) (first law);
 * simulated flows where the pump curve (straight lines) meets the path's losses: Kv drops
 * by IEC 60534-1, pipes by Darcy–Weisbach with Colebrook. Water at the 40 °C mean of
 * 45/35 °C (IAPWS, references §1.1).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { bisect, copperDpKpa, curveHeadKpa, flowM3h, kvDpKpa, WATER } from "@/lib/hydraulics/testing/hand-calc";

const W = WATER[40];
const CURVE: [number, number][] = [[0, 50], [1, 40], [2, 0]];

function diverterDoc(scenarios: { name: string; mode: "heating" | "hot-water"; valves: Record<string, boolean | "a" | "b"> }[]) {
  const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
  return {
    format: "loopwright/schematic", version: 1, name: "diverter", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 1000 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 6, kv: 5, waterVolumeL: 2, pumpCurve: CURVE } },
      { id: "dv", type: "diverter-valve", props: { kvs: 2 } },
      { id: "cyl", type: "cylinder", props: { coilKv: 1.5, coilOutputKw: 5 } },
      { id: "r1", type: "radiator", props: { outputAtDt50W: 8000, heatLoadW: 2000, valveKv: 1 } },
      { id: "t1", type: "tee" },
      { id: "t2", type: "tee" },
      { id: "ev", type: "expansion-vessel", props: { volumeL: 12 } },
    ],
    pipes: [
      cu("pf", "hp.flow", "dv.ab", 5),
      cu("ca", "dv.a", "cyl.coilFlow", 2), cu("cr", "cyl.coilReturn", "t1.a", 2),
      cu("ra", "dv.b", "r1.flow", 2), cu("rr", "r1.return", "t1.b", 2),
      cu("ret", "t1.c", "t2.a", 5), cu("ret2", "t2.b", "hp.return", 0.5),
      { ...cu("v", "t2.c", "ev.connection", 0.5), size: "15" },
    ],
    scenarios,
  };
}
function run(scenarios: Parameters<typeof diverterDoc>[0]) {
  const out = calculate(diverterDoc(scenarios));
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
/** Hand: heat exchanger Kv 5 + diverter Kvs 2 + 14.5 m Cu 22 (5 + 2 + 2 + 5 + 0.5) + the branch's own Kv. */
const opPoint = (branchKv: number) =>
  bisect((q) => curveHeadKpa(CURVE, q) - kvDpKpa(q, 5, W.rho) - kvDpKpa(q, 2, W.rho) - kvDpKpa(q, branchKv, W.rho) - copperDpKpa(q, "22", 14.5, W), 0.01, 1.99);
// ±0.5 %: engine against hand (same published methods; operating points to the solver's 1e-5)
const near = (got: number, want: number) => expect(Math.abs(got / want - 1)).toBeLessThan(5e-3);
const pipeFlow = (s: { pipes: { id: string; flowM3h: number | null }[] }, id: string) => s.pipes.find((p) => p.id === id)!.flowM3h!;
const partFlow = (s: { parts: { id: string; flowM3h: number | null }[] }, id: string) => s.parts.find((p) => p.id === id)!.flowM3h!;

describe("diverter: simulated, the selected side takes all the flow, the other none", () => {
  it("heating: radiator at its operating point, coil dry; hot water: coil at its point, radiator dry; forced to a in heating: the coil", () => {
    const r = run([
      { name: "heat", mode: "heating", valves: {} },
      { name: "dhw", mode: "hot-water", valves: {} },
      { name: "forced", mode: "heating", valves: { dv: "a" } },
    ]);
    const [heat, dhw, forced] = r.scenarios;
    expect(opPoint(1) / opPoint(1.5)).toBeLessThan(0.95); // the two branches run at different points
    near(pipeFlow(heat!, "ra"), opPoint(1));
    expect(pipeFlow(heat!, "ca")).toBe(0);
    near(partFlow(heat!, "dv"), opPoint(1));
    near(pipeFlow(dhw!, "ca"), opPoint(1.5));
    expect(pipeFlow(dhw!, "ra")).toBe(0);
    near(partFlow(dhw!, "dv"), opPoint(1.5));
    near(pipeFlow(forced!, "ca"), opPoint(1.5));
    expect(pipeFlow(forced!, "ra")).toBe(0);
  });
});

describe("diverter at design: each mode's loads on their own side", () => {
  it("heating: the radiator's design flow through the diverter; hot water: the coil's (the heat pump's rated 6 kW at ΔT 10 K)", () => {
    const r = run([{ name: "heat", mode: "heating", valves: {} }]);
    expect(r.findings.filter((f) => f.code === "load.no-return-path")).toEqual([]);
    const heating = r.modes.find((m) => m.mode === "heating")!;
    const hot = r.modes.find((m) => m.mode === "hot-water")!;
    near(partFlow(heating, "dv"), flowM3h(2000, 10, W));
    near(pipeFlow(heating, "ra"), flowM3h(2000, 10, W));
    expect(pipeFlow(heating, "ca")).toBe(0);
    // contract (schematic-format.md): in hot-water mode the coil takes the heat source's rated output
    near(partFlow(hot, "dv"), flowM3h(6000, 10, W));
    near(pipeFlow(hot, "ca"), flowM3h(6000, 10, W));
    expect(pipeFlow(hot, "ra")).toBe(0);
  });
});
