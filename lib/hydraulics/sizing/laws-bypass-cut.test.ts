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
import { flowM3h } from "@/lib/hydraulics/testing/hand-calc";
import { STRONG, twoZoneBypass, W } from "@/lib/hydraulics/testing/two-zone-bypass";

describe("a dp-bypass is shut at design", () => {
  it("no flow through it, the mains carry the loads' sum, and no design flow rests on the assumed exchanger Kv", () => {
    const out = calculate(twoZoneBypass({ curve: STRONG, valveKv: 1, hpKv: null }));
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
