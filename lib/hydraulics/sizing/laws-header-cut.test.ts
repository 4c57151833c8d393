/**
 * At design a low-loss header's primary pass is cut (its flow enters as a fixed demand), so
 * the primary loop through the heat pump is no loop of the design network: the design flows
 * follow the loads by continuity alone and rest on no assumed resistance, even with the
 * heat pump's exchanger Kv left empty (a typical value assumed). Were the primary pass
 * counted open, heat pump and pass would close a loop and every flow would rest on that
 * assumption (design.ts, designHasLoops). Primary flow Q = Φ/(ρ·cp·ΔT) of the rated output
 * (first law), water at the 40 °C mean of 45/35 °C (IAPWS, references §1.1).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { flowM3h, WATER } from "@/lib/hydraulics/testing/hand-calc";

function doc() {
  const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
  return {
    format: "loopwright/schematic", version: 1, name: "header, assumed exchanger Kv", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 1000 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, waterVolumeL: 2, pumpCurve: [[0, 50], [1, 40], [2, 0]] } },
      { id: "llh", type: "low-loss-header", props: { volumeL: 2 } },
      { id: "pump", type: "pump", props: { curve: [[0, 50], [1, 40], [2, 0]] } },
      { id: "r1", type: "radiator", props: { outputAtDt50W: 20000, heatLoadW: 4000, valveKv: 1, waterVolumeL: 8 } },
      { id: "t", type: "tee" },
      { id: "ev", type: "expansion-vessel", props: { volumeL: 12 } },
    ],
    pipes: [
      cu("pf", "hp.flow", "llh.p1", 3), cu("pr", "llh.p2", "t.a", 2), cu("pr2", "t.b", "hp.return", 1),
      { ...cu("v", "t.c", "ev.connection", 0.5), size: "15" },
      cu("sf", "llh.p3", "pump.in", 3), cu("s1", "pump.out", "r1.flow", 2), cu("s2", "r1.return", "llh.p4", 5),
    ],
  };
}

describe("a header's primary pass is cut at design", () => {
  it("the primary carries the rated 5 kW at ΔT 10 K and no design flow rests on the assumed exchanger Kv", () => {
    const out = calculate(doc());
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    const r = out.results;
    expect(r.assumptions.length).toBeGreaterThan(0); // the exchanger Kv is assumed
    const m = r.modes[0]!;
    const pipe = (id: string) => m.pipes.find((p) => p.id === id)!;
    // ±0.1 %: continuity against the hand value (same water properties)
    expect(Math.abs(pipe("pf").flowM3h! / flowM3h(5000, 10, WATER[40]) - 1)).toBeLessThan(1e-3);
    for (const id of ["pf", "pr", "sf", "s1", "s2"]) expect(pipe(id).restsOn).toEqual([]);
  });
});
