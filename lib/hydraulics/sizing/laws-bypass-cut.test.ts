/**
 * A differential bypass is shut at design (it opens only when the zones close), so it adds
 * no loop to the design network: on a tree the design flows follow the loads by continuity
 * alone and rest on no assumed resistance. Here the heat pump's exchanger Kv is left empty,
 * so a typical value is assumed for it; were the bypass counted open at design, its path
 * between the manifolds would close a loop and every flow would rest on that assumption
 * (design.ts, designHasLoops). Design flows Q = Φ/(ρ·cp·ΔT) (first law), water at the
 * 40 °C mean of 45/35 °C (IAPWS, references §1.1).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { flowM3h, WATER } from "@/lib/hydraulics/testing/hand-calc";

const W = WATER[40];

function doc() {
  const cu = (id: string, from: string, to: string, size: string, lengthM: number) => ({ id, from, to, material: "copper", size, lengthM });
  const rad = (id: string, heatLoadW: number) => ({ id, type: "radiator", props: { outputAtDt50W: 8000, heatLoadW, valveKv: 1, waterVolumeL: 8 } });
  return {
    format: "loopwright/schematic", version: 1, name: "bypass shut at design", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 1000 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, waterVolumeL: 2, pumpCurve: [[0, 60], [0.5, 55], [1, 40], [2, 0]] } },
      { id: "mf", type: "manifold", props: { outlets: 3 } },
      { id: "mr", type: "manifold", props: { outlets: 3 } },
      { id: "zv1", type: "zone-valve", props: { kvs: 4, open: true } },
      { id: "zv2", type: "zone-valve", props: { kvs: 4, open: true } },
      rad("r1", 1500),
      rad("r2", 1000),
      { id: "bp", type: "dp-bypass-valve", props: { kvs: 2, openingKpa: null } },
    ],
    pipes: [
      cu("fm", "hp.flow", "mf.common", "22", 3), cu("rm", "mr.common", "hp.return", "22", 3),
      cu("a0", "mf.p1", "zv1.a", "15", 1), cu("a1", "zv1.b", "r1.flow", "15", 4), cu("a2", "r1.return", "mr.p1", "15", 5),
      cu("b0", "mf.p2", "zv2.a", "15", 1), cu("b1", "zv2.b", "r2.flow", "15", 4), cu("b2", "r2.return", "mr.p2", "15", 5),
      cu("y1", "mf.p3", "bp.a", "15", 0.5), cu("y2", "bp.b", "mr.p3", "15", 0.5),
    ],
  };
}

describe("a dp-bypass is shut at design", () => {
  it("no flow through it, the mains carry the loads' sum, and no design flow rests on the assumed exchanger Kv", () => {
    const out = calculate(doc());
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    const r = out.results;
    expect(r.assumptions.length).toBeGreaterThan(0); // the exchanger Kv is assumed
    const m = r.modes[0]!;
    const pipe = (id: string) => m.pipes.find((p) => p.id === id)!;
    expect(pipe("y1").flowM3h).toBe(0);
    // ±0.1 %: design flows by continuity against the hand values (same water properties)
    expect(Math.abs(pipe("fm").flowM3h! / flowM3h(2500, 10, W) - 1)).toBeLessThan(1e-3);
    for (const id of ["fm", "rm", "a1", "b1"]) expect(pipe(id).restsOn).toEqual([]);
  });
});
