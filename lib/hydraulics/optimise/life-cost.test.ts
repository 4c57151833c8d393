import { describe, expect, it } from "vitest";
import { energyCostPerKpa, pumpElectricalKw } from "./life-cost";

describe("pump energy (P = Q·Δp/η)", () => {
  it("gives the hydraulic power of a worked case: 1 L/s against 10 m of water is 98.1 W", () => {
    // Hydraulic power ρ·g·V̇·H (Çengel & Cimbala ch. 14): 1000 kg/m³ · 9.81 m/s² · 0.001 m³/s · 10 m = 98.1 W.
    // In the function's units: 3.6 m³/h and 98.1 kPa, η = 1.
    expect(pumpElectricalKw(3.6, 98.1, 1) * 1000).toBeCloseTo(98.1, 9);
  });
  it("divides by the efficiency and scales with hours, years and price", () => {
    // 0.72 m³/h (0.2 L/s) at 40 kPa = 8 W hydraulic; at η 0.25 → 32 W electrical.
    expect(pumpElectricalKw(0.72, 40, 0.25)).toBeCloseTo(0.032, 12);
    // 32 W for 4000 h × 15 y = 1920 kWh; at 0.30 → 576 per 40 kPa → 14.4 per kPa
    expect(energyCostPerKpa(0.72, { years: 15, hoursPerYear: 4000, pricePerKwh: 0.3, pumpEfficiency: 0.25 })).toBeCloseTo(14.4, 9);
  });
  it("refuses an efficiency outside (0, 1]", () => {
    expect(() => pumpElectricalKw(1, 1, 0)).toThrow(/pumpEfficiency/);
    expect(() => pumpElectricalKw(1, 1, 1.2)).toThrow(/pumpEfficiency/);
  });
});
