import { describe, expect, it } from "vitest";
import { flowForHeat, heatForFlowW, massFlowForHeat } from "./flow";
import { fluidProperties } from "./fluids";

const rel = (a: number, e: number) => Math.abs(a / e - 1);

// references.md §10 (defining equation Q = ṁ·cp·ΔT; values computed with IAPWS water at the
// mean temperature). Printed to 4–5 digits; our IAPWS-IF97 cp differs from IAPWS-95 by ≤ 0.05 %
// → 0.2 % (check #39).
describe("flowForHeat with IAPWS properties at the mean temperature", () => {
  it.each([
    [10_000, 5, 37.5, 0.4819, 1.7347],
    [10_000, 7, 38.5, 0.3443, 1.2395],
    [8_000, 5, 32.5, 0.3848, 1.3853],
    [10_000, 20, 70, 0.122, 0.4394],
    [1_000, 10, 70, 0.02441, 0.08787],
  ])("%d W, ΔT %d K, mean %f °C → %f L/s, %f m³/h", (p, dt, t, ls, m3h) => {
    const w = fluidProperties({ kind: "water" }, t);
    const q = flowForHeat({ powerW: p, deltaTK: dt, densityKgM3: w.densityKgM3, specificHeatJkgK: w.specificHeatJkgK });
    expect(rel(q * 1000, ls)).toBeLessThan(2e-3);
    expect(rel(q * 3600, m3h)).toBeLessThan(2e-3);
  });
});

describe("simplified convention (cp 4180, ρ 1000) — exact arithmetic", () => {
  it("10 kW, 5 K → 1.7225 m³/h (check #40; printed to 4 decimals)", () => {
    const q = flowForHeat({ powerW: 10_000, deltaTK: 5, densityKgM3: 1000, specificHeatJkgK: 4180 });
    expect(q * 3600).toBeCloseTo(1.7225, 4);
    expect(q * 1000).toBeCloseTo(0.4785, 4);
  });
  // Hand calculation with water at 70 °C rounded from references §1.1 (IAPWS-95: cp 4.1901 kJ/kg·K,
  // ρ 977.765 kg/m³): ṁ = 1000/(4190·10) = 0.0238663 kg/s; V = ṁ/977.8 = 2.44082e-5 m³/s = 87.87 L/h
  it("1000 W, 10 K, cp 4190 → ṁ 0.0238663 kg/s; ρ 977.8 → 87.87 L/h (references §10, last row)", () => {
    expect(massFlowForHeat({ powerW: 1000, deltaTK: 10, densityKgM3: 977.8, specificHeatJkgK: 4190 })).toBeCloseTo(0.0238663, 7);
    expect(flowForHeat({ powerW: 1000, deltaTK: 10, densityKgM3: 977.8, specificHeatJkgK: 4190 }) * 3.6e6).toBeCloseTo(87.87, 2);
  });
  it("heatForFlowW inverts flowForHeat", () => {
    const q = flowForHeat({ powerW: 7000, deltaTK: 5, densityKgM3: 992, specificHeatJkgK: 4179 });
    expect(heatForFlowW(q, 5, 992, 4179)).toBeCloseTo(7000, 9);
  });
  it("throws RangeError naming the field", () => {
    expect(() => flowForHeat({ powerW: 1000, deltaTK: 0, densityKgM3: 1000, specificHeatJkgK: 4180 })).toThrow(/deltaTK/);
    expect(() => flowForHeat({ powerW: -1, deltaTK: 5, densityKgM3: 1000, specificHeatJkgK: 4180 })).toThrow(/powerW/);
  });
});
