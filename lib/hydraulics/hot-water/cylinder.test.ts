import { describe, expect, it } from "vitest";
import { waterDensityKgM3, waterSpecificHeatJkgK } from "../fluids";
import { cylinderReheatMinutes } from "./cylinder";

// Defining equation t = V·ρ·cp·ΔT/P (energy balance). No published worked example was found:
// the checks are the arithmetic of the equation (computed here) and its default properties.
describe("cylinderReheatMinutes", () => {
  it("150 L, 10 → 60 °C, 3 kW, ρ 1000, cp 4186 → 174.42 min (computed from the definition)", () => {
    const t = cylinderReheatMinutes({ volumeL: 150, coldWaterC: 10, storeTemperatureC: 60, coilOutputKw: 3, densityKgM3: 1000, specificHeatJkgK: 4186 });
    expect(t).toBeCloseTo((0.15 * 1000 * 4186 * 50) / 3000 / 60, 9);
    expect(t).toBeCloseTo(174.42, 2);
  });
  it("defaults to IAPWS water at the mean of cold and store temperature", () => {
    const t = cylinderReheatMinutes({ volumeL: 200, coldWaterC: 10, storeTemperatureC: 50, coilOutputKw: 10 });
    expect(t).toBeCloseTo((0.2 * waterDensityKgM3(30) * waterSpecificHeatJkgK(30) * 40) / 10_000 / 60, 9);
    expect(t).toBeGreaterThan(55);
    expect(t).toBeLessThan(56);
  });
  it("throws RangeError naming the field", () => {
    expect(() => cylinderReheatMinutes({ volumeL: 200, coldWaterC: 10, storeTemperatureC: 50, coilOutputKw: 0 })).toThrow(/coilOutputKw/);
    expect(() => cylinderReheatMinutes({ volumeL: 200, coldWaterC: 50, storeTemperatureC: 50, coilOutputKw: 3 })).toThrow(/storeTemperatureC/);
    expect(() => cylinderReheatMinutes({ volumeL: 0, coldWaterC: 10, storeTemperatureC: 50, coilOutputKw: 3 })).toThrow(/volumeL/);
  });
});
