/**
 * Plant verdicts on each side of their limits, expected values worked out here:
 * - minimum system water volume (defrost): a buffer is recommended when the system holds
 *   less than the heat source's minSystemVolumeL (`system.volume-low`); V_s = pipes'
 *   inner volume (EN 1057 Table X bores) + the parts' stated water contents;
 * - hot water: no reheat time when the store is set at or above the hottest flow
 *   (`hot-water.flow-too-cool`, second law), and `hot-water.store-cool` below 60 °C
 *   storage (HSE ACoP L8 / HSG274 Part 2, references §9); reheat = V·ρ·cp·ΔT/P with the
 *   coil limited to the heat source's rated output (water at the store mean, references §1.1).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { COPPER_ID_MM, litresPerM, WATER } from "@/lib/hydraulics/testing/hand-calc";

type Props = Record<string, unknown>;
function doc(hp: Props = {}, cylinder: Props | null = null, design: Props = {}) {
  const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
  const parts: unknown[] = [
    { id: "hp", type: "heat-pump", props: { ratedOutputKw: 6, kv: 4, waterVolumeL: 30, pumpCurve: [[0, 60], [1, 50], [2, 0]], ...hp } },
    { id: "hl", type: "heat-load", props: { heatLoadW: 3000, kv: 2, waterVolumeL: 60 } },
  ];
  const pipes = [cu("f", "hp.flow", "hl.flow", 5), cu("r", "hl.return", "hp.return", 5)];
  if (cylinder) {
    parts.push({ id: "dv", type: "diverter-valve", props: { kvs: 6, position: "a" } }, { id: "tr", type: "tee" },
      { id: "cyl", type: "cylinder", props: { volumeL: 200, coilKv: 3, coilOutputKw: 10, coldWaterC: 10, coilWaterVolumeL: 0, ...cylinder } });
    pipes.splice(0, 2, cu("f0", "hp.flow", "dv.ab", 1), cu("f", "dv.a", "hl.flow", 4), cu("r", "hl.return", "tr.a", 4), cu("r0", "tr.c", "hp.return", 1),
      cu("c1", "dv.b", "cyl.coilFlow", 2), cu("c2", "cyl.coilReturn", "tr.b", 2));
  }
  const out = calculate({
    format: "loopwright/schematic", version: 1, name: "plant verdict", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 500, ...design },
    parts, pipes,
  });
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
const codes = (r: ReturnType<typeof doc>, code: string) => r.findings.filter((f) => f.code === code).map((f) => f.refs);

describe("minimum system volume (buffer recommended)", () => {
  // 10 m Cu 22 (0.32047 L/m) + heat pump 30 L + load 60 L = 93.205 L
  const systemL = 10 * litresPerM(COPPER_ID_MM["22"]) + 90;
  it("hand: V_s 93.20 L", () => expect(systemL).toBeCloseTo(93.205, 3));

  it("minimum 2 % below V_s: no buffer, no system.volume-low", () => {
    const r = doc({ minSystemVolumeL: 0.98 * systemL });
    expect(Math.abs(r.volume!.systemL! / systemL - 1)).toBeLessThan(1e-9);
    expect(r.volume!.bufferRecommended).toBe(false);
    expect(codes(r, "system.volume-low")).toEqual([]);
  });

  it("minimum 2 % above V_s: buffer recommended, system.volume-low naming the heat pump", () => {
    const r = doc({ minSystemVolumeL: 1.02 * systemL });
    expect(r.volume!.bufferRecommended).toBe(true);
    expect(r.volume!.minimumL).toBeCloseTo(1.02 * systemL, 9);
    expect(codes(r, "system.volume-low")).toEqual([["hp"]]);
  });

  it("no minimum stated: nothing to judge (null)", () => {
    expect(doc().volume!.bufferRecommended).toBeNull();
  });
});

describe("hot-water store: reheat, the hottest flow and the 60 °C storage", () => {
  // reheat = 0.2 m³ · ρ·cp(35 °C, store mean of 10/60) · 50 K / 6 kW (coil 10 kW limited to the rated 6 kW)
  const reheatMin = (0.2 * WATER[35].rho * WATER[35].cp * 50) / 6000 / 60;

  it("store 60 °C, hottest flow 61 °C: reheat 115.4 min, no cautions", () => {
    const r = doc({}, { storeTemperatureC: 60 }, { maxFlowTemperatureC: 61 });
    expect(reheatMin).toBeCloseTo(115.4, 1);
    // ±0.1 %: ρ·cp of water at the store mean against the table (measured 6e-5 in engine-independent B)
    expect(Math.abs(r.hotWater!.reheatMinutes! / reheatMin - 1)).toBeLessThan(1e-3);
    expect(codes(r, "hot-water.flow-too-cool")).toEqual([]);
    expect(codes(r, "hot-water.store-cool")).toEqual([]);
  });

  it("store 60 °C, hottest flow 60 °C: no reheat time (null), hot-water.flow-too-cool naming the cylinder", () => {
    const r = doc({}, { storeTemperatureC: 60 }, { maxFlowTemperatureC: 60 });
    expect(r.hotWater!.reheatMinutes).toBeNull();
    expect(codes(r, "hot-water.flow-too-cool")).toEqual([["cyl"]]);
  });

  it("store 59 °C: below the 60 °C storage of legionella control → hot-water.store-cool naming the cylinder", () => {
    const r = doc({}, { storeTemperatureC: 59 }, { maxFlowTemperatureC: 65 });
    expect(codes(r, "hot-water.store-cool")).toEqual([["cyl"]]);
  });
});

describe("hot-water store: which flow temperature judges it, and the coil against the heat source", () => {
  // reheat = V·ρ·cp·(t_store − t_cold)/P (references §1.1), water at the 35 °C store mean (hand-calc WATER table)
  const reheatAt = (kW: number) => (0.2 * WATER[35].rho * WATER[35].cp * 50) / (kW * 1000) / 60;
  const fields = (r: ReturnType<typeof doc>, code: string) => r.findings.filter((f) => f.code === code).map((f) => [f.refs, f.fields]);

  it("no hottest flow stated: a reheat time, and hot-water.flow-unknown pointing at the hot-water flow field", () => {
    const r = doc({}, { storeTemperatureC: 60 });
    expect(Math.abs(r.hotWater!.reheatMinutes! / reheatAt(6) - 1)).toBeLessThan(1e-3);
    expect(fields(r, "hot-water.flow-unknown")).toEqual([[["cyl"], ["design.hotWaterFlowTemperatureC"]]]);
  });
  it("a hot-water flow temperature is the one judged (65 °C passes a 60 °C store even with the heating's highest at 55 °C)", () => {
    const r = doc({}, { storeTemperatureC: 60 }, { hotWaterFlowTemperatureC: 65, maxFlowTemperatureC: 55 });
    expect(r.hotWater!.reheatMinutes).not.toBeNull();
    expect(fields(r, "hot-water.flow-too-cool")).toEqual([]);
    expect(fields(r, "hot-water.flow-unknown")).toEqual([]);
  });
  it("a hot-water flow at the store setting: no reheat, the finding points at that field; with only the highest flow, at that one", () => {
    const hw = doc({}, { storeTemperatureC: 60 }, { hotWaterFlowTemperatureC: 60, maxFlowTemperatureC: 70 });
    expect(hw.hotWater!.reheatMinutes).toBeNull();
    expect(fields(hw, "hot-water.flow-too-cool")).toEqual([[["cyl"], ["design.hotWaterFlowTemperatureC"]]]);
    const max = doc({}, { storeTemperatureC: 60 }, { maxFlowTemperatureC: 59 });
    expect(fields(max, "hot-water.flow-too-cool")).toEqual([[["cyl"], ["design.maxFlowTemperatureC"]]]);
  });
  it("a coil smaller than the heat source reheats at its own output: 4 kW coil on a 6 kW heat pump → 173.1 min", () => {
    const r = doc({}, { storeTemperatureC: 60, coilOutputKw: 4 }, { maxFlowTemperatureC: 65 });
    expect(reheatAt(4)).toBeCloseTo(173.1, 1);
    expect(Math.abs(r.hotWater!.reheatMinutes! / reheatAt(4) - 1)).toBeLessThan(1e-3);
  });
  it("store exactly 60 °C is not cool; 59.9 °C is", () => {
    expect(fields(doc({}, { storeTemperatureC: 60 }, { maxFlowTemperatureC: 65 }), "hot-water.store-cool")).toEqual([]);
    expect(fields(doc({}, { storeTemperatureC: 59.9 }, { maxFlowTemperatureC: 65 }), "hot-water.store-cool").length).toBe(1);
  });
});
