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

  it("a short-circuit between flow and return (a balancing valve) never sends a path backwards through the pump", () => {
    // pump → 4 valves → t1 → h1 → t2 → heat pump → pump; the bridge t1–t2 makes the way back round
    // through the pump (pu, p0, hp, p8, p10, bv, p9, p6: 8 links) shorter than the way forward (10)
    const cu = (id: string, from: string, to: string) => ({ id, from, to, material: "copper", size: "22", lengthM: 1 });
    const iv = (id: string) => ({ id, type: "isolation-valve", props: { kv: 10 } });
    const out = calculate({
      format: "loopwright/schematic", version: 1, name: "bridge", fluid: { kind: "water" },
      design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 500 },
      parts: [
        { id: "hp", type: "heat-pump", props: { ratedOutputKw: 8, kv: 2, waterVolumeL: 2 } },
        { id: "pu", type: "pump", props: { curve: [[0, 20], [1, 15], [2, 0]] } },
        iv("v1"), iv("v2"), iv("v3"), iv("v4"), { id: "t1", type: "tee" }, { id: "t2", type: "tee" },
        { id: "bv", type: "balancing-valve", props: { kv: 0.2 } },
        { id: "h1", type: "heat-load", props: { heatLoadW: 3000, kv: 1, waterVolumeL: 1 } },
      ],
      pipes: [
        cu("p0", "hp.flow", "pu.in"), cu("p1", "pu.out", "v1.a"), cu("p2", "v1.b", "v2.a"), cu("p3", "v2.b", "v3.a"), cu("p4", "v3.b", "v4.a"),
        cu("p5", "v4.b", "t1.a"), cu("p6", "t1.b", "h1.flow"), cu("p7", "h1.return", "t2.a"), cu("p8", "t2.b", "hp.return"),
        cu("p9", "t1.c", "bv.a"), cu("p10", "bv.b", "t2.c"),
      ],
    });
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    expect(out.results.modes[0]!.circuits.map((x) => x.path)).toEqual([
      ["p1", "v1", "p2", "v2", "p3", "v3", "p4", "v4", "p5", "p6", "h1", "p7", "p8", "hp", "p0"],
    ]);
  });

  it("a load drawn the wrong way round has no path; the other circuit keeps its own", () => {
    const { c } = run({ extraM: 1, h2Reversed: true });
    expect(c("h2").path).toEqual([]);
    expect(c("h1").path).toEqual(["hp", "a", "b", "h1", "c", "r"]);
  });

  it("a load with both ends on the flow side has no path (no way back to the pump's inlet), and the drawing still calculates", () => {
    const cu = (id: string, from: string, to: string) => ({ id, from, to, material: "copper", size: "22", lengthM: 1 });
    const out = calculate({
      format: "loopwright/schematic", version: 1, name: "flow-side load", fluid: { kind: "water" },
      design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 500 },
      parts: [
        { id: "hp", type: "heat-pump", props: { ratedOutputKw: 6, kv: 2, waterVolumeL: 2, pumpCurve: [[0, 40], [1, 30], [2, 0]] } },
        { id: "tx", type: "tee" }, { id: "t1", type: "tee" },
        { id: "h1", type: "heat-load", props: { heatLoadW: 2000, kv: 1, waterVolumeL: 1 } },
        { id: "h2", type: "heat-load", props: { heatLoadW: 500, kv: 1, waterVolumeL: 1 } },
      ],
      pipes: [
        cu("a", "hp.flow", "tx.a"), cu("a2", "tx.b", "t1.a"), cu("b", "t1.b", "h1.flow"), cu("c", "h1.return", "hp.return"),
        cu("d", "t1.c", "h2.flow"), cu("e", "h2.return", "tx.c"),
      ],
    });
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    const paths = Object.fromEntries(out.results.modes[0]!.circuits.map((x) => [x.load, x.path]));
    expect(paths).toEqual({ h1: ["hp", "a", "a2", "b", "h1", "c"], h2: [] });
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
