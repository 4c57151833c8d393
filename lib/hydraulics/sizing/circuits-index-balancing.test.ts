/**
 * Circuits (sizing/circuits.ts): a heat pump with its own pump feeds two equal heat loads
 * (2 kW, Kv 1) in parallel; the second load's branch is ΔL longer. Worked out by hand
 * (q = P/(ρ·cp·ΔT); Kv law Δp = 100·(q/Kv)²·ρ/1000 kPa, IEC 60534-1; Darcy–Weisbach with
 * Colebrook for Cu 22, EN 1057 bore; IAPWS water at the 40 °C mean, testing/hand-calc.ts):
 * - each circuit's drop = heat pump Kv 2 + the mains at 2q + its branch and load at q;
 * - the index circuit is the larger drop, wherever it is listed; on an exact tie only the first;
 * - the other circuit's excess = the difference, and the balancing Kv that burns it
 *   Kv = q·√(ρ/1000 / (Δp/100 kPa)); below 0.1 kPa no Kv is given (nothing to burn);
 * - the path runs from the pump round to it (the heat pump first, as its exchanger is in the drop);
 * - a circuit no pump drives has no path, drop, index, excess or Kv; a load drawn the wrong
 *   way round has no path, but the drawing still calculates.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { copperDpKpa, flowM3h, kvDpKpa, kvForDp, WATER } from "@/lib/hydraulics/testing/hand-calc";

const W = WATER[40];
const q = flowM3h(2000, 10, W); // 0.173625 m³/h per load

function run(o: { extraM: number; pumpCurve?: [number, number][] | null; h2Reversed?: boolean }) {
  const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
  const out = calculate({
    format: "loopwright/schematic", version: 1, name: "circuits", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 500 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 6, kv: 2, waterVolumeL: 2, pumpCurve: o.pumpCurve === undefined ? [[0, 40], [1, 30], [2, 0]] : o.pumpCurve } },
      { id: "t1", type: "tee" }, { id: "t2", type: "tee" },
      { id: "h1", type: "heat-load", props: { heatLoadW: 2000, kv: 1, waterVolumeL: 1 } },
      { id: "h2", type: "heat-load", props: { heatLoadW: 2000, kv: 1, waterVolumeL: 1 } },
    ],
    pipes: [
      cu("a", "hp.flow", "t1.a", 2), cu("b", "t1.b", "h1.flow", 3), cu("c", "h1.return", "t2.a", 3),
      cu("d", "t1.c", o.h2Reversed ? "h2.return" : "h2.flow", 3 + o.extraM), cu("e", o.h2Reversed ? "h2.flow" : "h2.return", "t2.b", 3),
      cu("r", "t2.c", "hp.return", 2),
    ],
  });
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  const mode = out.results.modes.find((m) => m.mode === "heating")!;
  return { r: out.results, mode, c: (load: string) => mode.circuits.find((x) => x.load === load)! };
}
/** Hand: heat pump Kv 2 and 4 m of mains at 2q, the branch's pipes and the load's Kv 1 at q. */
const drop = (branchM: number) => kvDpKpa(2 * q, 2, W.rho) + copperDpKpa(2 * q, "22", 4, W) + copperDpKpa(q, "22", branchM, W) + kvDpKpa(q, 1, W.rho);

describe("index circuit, excess and balancing Kv", () => {
  it("the longer branch (listed second) is the index; the other's excess and Kv as worked by hand", () => {
    const { c, mode } = run({ extraM: 10 });
    // ±0.2 %: ρ, cp of the engine's water against the IAPWS table enter q² (≤ 0.1 %)
    expect(Math.abs(c("h1").pressureDropKpa! / drop(6) - 1)).toBeLessThan(2e-3);
    expect(Math.abs(c("h2").pressureDropKpa! / drop(16) - 1)).toBeLessThan(2e-3);
    expect(mode.circuits.map((x) => [x.load, x.index])).toEqual([["h1", false], ["h2", true]]);
    const excess = copperDpKpa(q, "22", 10, W); // 10 m more of Cu 22 at q: ≈ 0.213 kPa
    expect(excess).toBeGreaterThan(0.15);
    expect(Math.abs(c("h1").excessKpa! / excess - 1)).toBeLessThan(5e-3);
    expect(c("h2").excessKpa).toBe(0);
    expect(c("h2").balancingKv).toBeNull();
    // Kv = q/√(Δp/100 kPa · 1000/ρ); ±0.3 %: half the excess's tolerance
    expect(Math.abs(c("h1").balancingKv! / kvForDp(q, excess, W.rho) - 1)).toBeLessThan(3e-3);
    expect(mode.pump!.requiredHeadKpa).toBe(c("h2").pressureDropKpa);
  });

  it("an excess under 0.1 kPa (2 m more, ≈ 0.043 kPa) gets no balancing Kv", () => {
    const { c } = run({ extraM: 2 });
    const excess = copperDpKpa(q, "22", 2, W);
    expect(excess).toBeLessThan(0.06);
    expect(Math.abs(c("h1").excessKpa! / excess - 1)).toBeLessThan(5e-3);
    expect(c("h1").balancingKv).toBeNull();
    expect(c("h2").index).toBe(true);
  });

  it("two identical branches tie exactly: one index circuit, the first listed, the other with no excess", () => {
    const { mode } = run({ extraM: 0 });
    expect(mode.circuits[0]!.pressureDropKpa).toBe(mode.circuits[1]!.pressureDropKpa);
    expect(mode.circuits.map((x) => [x.load, x.index, x.excessKpa, x.balancingKv])).toEqual([["h1", true, 0, null], ["h2", false, 0, null]]);
  });
});

describe("circuit paths", () => {
  it("from the heat pump with its own pump round through each load back to it", () => {
    const { c } = run({ extraM: 1 });
    expect(c("h1").pump).toBe("hp");
    expect(c("h1").path).toEqual(["hp", "a", "b", "h1", "c", "r"]);
    expect(c("h2").path).toEqual(["hp", "a", "d", "h2", "e", "r"]);
  });

  it("a load drawn the wrong way round has no path; the other circuit keeps its own", () => {
    const { c } = run({ extraM: 1, h2Reversed: true });
    expect(c("h2").path).toEqual([]);
    expect(c("h1").path).toEqual(["hp", "a", "b", "h1", "c", "r"]);
  });

  it("no pump at all: circuit.no-pump, and each circuit has no pump, path, drop, index, excess or Kv", () => {
    const { r, mode } = run({ extraM: 1, pumpCurve: null });
    expect(r.findings.filter((f) => f.code === "circuit.no-pump").map((f) => f.refs)).toEqual([["h1", "h2"]]);
    expect(mode.circuits.map((x) => [x.load, x.pump, x.path, x.pressureDropKpa, x.index, x.excessKpa, x.balancingKv])).toEqual([
      ["h1", null, [], null, false, null, null],
      ["h2", null, [], null, false, null, null],
    ]);
    expect(mode.pumps).toEqual([]);
  });
});
