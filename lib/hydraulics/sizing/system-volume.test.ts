/**
 * System water volume (what the expansion vessel and the heat source's minimum volume are judged on):
 * pipes' inner volume (EN 1057 Table X bores) + each UFH loop's pipe (πd²/4 · loop length) + the parts'
 * stated water contents, every term worked out here.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { COPPER_ID_MM, litresPerM } from "@/lib/hydraulics/testing/hand-calc";

function volumeOf(loop: Record<string, unknown>) {
  const cu = (id: string, from: string, to: string) => ({ id, from, to, material: "copper", size: "22", lengthM: 3 });
  const out = calculate({
    format: "loopwright/schematic", version: 1, name: "system volume", fluid: { kind: "water" },
    design: { flowTemperatureC: 40, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1, targetGradientPaPerM: 300 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, kv: 4, waterVolumeL: 2, pumpCurve: [[0, 60], [1, 50], [2, 0]] } },
      { id: "ufh", type: "ufh-loop", props: { heatLoadW: 800, roomTemperatureC: 20, maxSurfaceTemperatureC: 29, floorAreaM2: 12, ...loop } },
    ],
    pipes: [cu("f", "hp.flow", "ufh.flow"), cu("r", "ufh.return", "hp.return")],
  });
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results.volume!.systemL!;
}

describe("system volume with a UFH loop", () => {
  // 6 m Cu 22: 6·π·0.0202²/4 = 1.9228 L; heat pump 2 L; loop 60 m of 12 mm bore: 60·π·0.012²/4 = 6.7858 L
  const pipesAndPlant = 6 * litresPerM(COPPER_ID_MM["22"]) + 2;
  it("hand: 1.9228 L of pipe + 2 L + 6.7858 L of loop = 10.7087 L", () => {
    expect(pipesAndPlant + 60 * litresPerM(12)).toBeCloseTo(10.7087, 4);
  });
  it("the loop's water is added (60 m of 12 mm bore), and a longer loop adds in proportion (120 m → 13.5717 L)", () => {
    expect(Math.abs(volumeOf({ loopLengthM: 60, innerDiameterMm: 12 }) / (pipesAndPlant + 60 * litresPerM(12)) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(volumeOf({ loopLengthM: 120, innerDiameterMm: 12 }) / (pipesAndPlant + 120 * litresPerM(12)) - 1)).toBeLessThan(1e-9);
  });
  it("a wider bore holds more: 60 m of 16 mm → 12.064 L of loop", () => {
    expect(60 * litresPerM(16)).toBeCloseTo(12.064, 3);
    expect(Math.abs(volumeOf({ loopLengthM: 60, innerDiameterMm: 16 }) / (pipesAndPlant + 60 * litresPerM(16)) - 1)).toBeLessThan(1e-9);
  });
});
