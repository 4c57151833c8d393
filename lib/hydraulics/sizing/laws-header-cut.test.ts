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
import { headerDoc } from "@/lib/hydraulics/testing/header-system";

describe("a header's primary pass is cut at design", () => {
  it("the primary carries the rated 5 kW at ΔT 10 K and no design flow rests on the assumed exchanger Kv", () => {
    const out = calculate(headerDoc({ ratedW: 5000, loadW: 4000, hpKv: null }));
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
