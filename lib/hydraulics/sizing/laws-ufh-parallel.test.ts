/**
 * Two underfloor loops in parallel between a flow and a return manifold, at design: each
 * loop gets its own design flow Q = Φ/(ρ·cp·ΔT) (first law), the mains carry the sum
 * (continuity), and each circuit's drop is its loop pipe (12 mm PE-X, ε 0.007 mm, DIN
 * 1988-300; Darcy–Weisbach with Colebrook) plus its 0.6 m of Cu 15 tails plus the mains
 * (heat exchanger Kv 5 by IEC 60534-1, 6.5 m Cu 22) at the summed flow. Water at the 40 °C
 * mean of 45/35 °C (IAPWS, references §1.1).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { copperDpKpa, flowM3h, kvDpKpa, pipeFlow, WATER } from "@/lib/hydraulics/testing/hand-calc";

const W = WATER[40];

function doc() {
  const cu = (id: string, from: string, to: string, size: string, lengthM: number) => ({ id, from, to, material: "copper", size, lengthM });
  const ufh = (id: string, heatLoadW: number, loopLengthM: number) => ({ id, type: "ufh-loop", props: { heatLoadW, loopLengthM, innerDiameterMm: 12 } });
  return {
    format: "loopwright/schematic", version: 1, name: "two loops", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 1000 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, kv: 5, waterVolumeL: 2, pumpCurve: [[0, 50], [1, 40], [2, 0]] } },
      { id: "mf", type: "manifold", props: { outlets: 2 } },
      { id: "mr", type: "manifold", props: { outlets: 2 } },
      ufh("u1", 1500, 60),
      ufh("u2", 800, 40),
      { id: "t", type: "tee" },
      { id: "ev", type: "expansion-vessel", props: { volumeL: 12 } },
    ],
    pipes: [
      cu("pf", "hp.flow", "mf.common", "22", 3), cu("pr", "mr.common", "t.a", "22", 3), cu("pr2", "t.b", "hp.return", "22", 0.5),
      cu("v", "t.c", "ev.connection", "15", 0.5),
      cu("a1", "mf.p1", "u1.flow", "15", 0.3), cu("a2", "u1.return", "mr.p1", "15", 0.3),
      cu("b1", "mf.p2", "u2.flow", "15", 0.3), cu("b2", "u2.return", "mr.p2", "15", 0.3),
    ],
  };
}
// ±0.5 %: engine against hand (same published methods)
const near = (got: number, want: number) => expect(Math.abs(got / want - 1)).toBeLessThan(5e-3);

describe("two UFH loops in parallel at design", () => {
  it("each loop its own design flow, the mains the sum, each circuit its loop + tails + mains", () => {
    const out = calculate(doc());
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    const m = out.results.modes[0]!;
    const q1 = flowM3h(1500, 10, W);
    const q2 = flowM3h(800, 10, W);
    const pipe = (id: string) => m.pipes.find((p) => p.id === id)!.flowM3h!;
    near(pipe("pf"), q1 + q2);
    near(pipe("a1"), q1);
    near(pipe("b1"), q2);
    const mains = kvDpKpa(q1 + q2, 5, W.rho) + copperDpKpa(q1 + q2, "22", 6.5, W);
    const circuit = (id: string) => m.circuits.find((c) => c.load === id)!.pressureDropKpa!;
    near(circuit("u1"), pipeFlow(q1, 12, 0.007, 60, W).dpKpa + copperDpKpa(q1, "15", 0.6, W) + mains);
    near(circuit("u2"), pipeFlow(q2, 12, 0.007, 40, W).dpKpa + copperDpKpa(q2, "15", 0.6, W) + mains);
  });
});
