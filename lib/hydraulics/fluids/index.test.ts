import { describe, expect, it } from "vitest";
import { expansionFraction, fluidProperties, fluidValidity, freezingPointC } from "./index";

describe("expansionFraction (water) vs references.md §1.4 (computed, IAPWS-95, from 10 °C)", () => {
  // references.md: ±0.01 percentage points when the engine uses IAPWS densities (check #10
  // allows 0.02 pp); IF97 vs IAPWS-95 density ratios differ by < 0.002 pp here.
  it.each([[30, 0.407], [50, 1.181], [55, 1.421], [70, 2.244], [75, 2.55], [80, 2.872], [90, 3.563], [95, 3.931]])(
    "10 → %d °C: %f pct",
    (t, pct) => {
      expect(Math.abs(expansionFraction({ kind: "water" }, 10, t) * 100 - pct)).toBeLessThan(0.01);
    },
  );
  it("from 4 °C to 80 °C adds ≈ 0.028 pp (references.md §1.4)", () => {
    expect(Math.abs(expansionFraction({ kind: "water" }, 4, 80) * 100 - 2.9)).toBeLessThan(0.01);
  });
  it("a 30 % PG mixture expands more than water (references.md §8.1: glycol ≈ 1.2–1.3×, from memory)", () => {
    const w = expansionFraction({ kind: "water" }, 10, 80);
    const g = expansionFraction({ kind: "propylene-glycol", percentByVolume: 30 }, 10, 80);
    expect(g / w).toBeGreaterThan(1.1);
    expect(g / w).toBeLessThan(1.6);
  });
});

describe("fluidProperties", () => {
  it("water at 42.5 °C: ν = μ/ρ and values inside the §1.1 40/45 °C bracket", () => {
    const p = fluidProperties({ kind: "water" }, 42.5);
    expect(p.temperatureC).toBe(42.5);
    expect(p.kinematicViscosityM2s).toBeCloseTo(p.dynamicViscosityPas / p.densityKgM3, 15);
    expect(p.densityKgM3).toBeLessThan(992.216);
    expect(p.densityKgM3).toBeGreaterThan(990.213);
    expect(p.kinematicViscosityM2s).toBeLessThan(0.6578e-6);
    expect(p.kinematicViscosityM2s).toBeGreaterThan(0.6017e-6);
  });
  it("PG 30 % vol at 20 °C: ASHRAE density 1028.4 kg/m³ within 0.1 % (check #44)", () => {
    const p = fluidProperties({ kind: "propylene-glycol", percentByVolume: 30 }, 20);
    expect(Math.abs(p.densityKgM3 / 1028.4 - 1)).toBeLessThan(1e-3);
  });
  it("throws RangeError naming tC outside validity", () => {
    expect(() => fluidProperties({ kind: "water" }, 120)).toThrow(/tC/);
    expect(() => fluidProperties({ kind: "ethylene-glycol", percentByVolume: 20 }, -20)).toThrow(RangeError);
  });
});

describe("fluidValidity and freezingPointC", () => {
  it("water: 0–100 °C", () => {
    expect(fluidValidity({ kind: "water" }, 0).ok).toBe(true);
    expect(fluidValidity({ kind: "water" }, 100).ok).toBe(true);
    const v = fluidValidity({ kind: "water" }, -1);
    expect(v.ok).toBe(false);
    expect(v.message).toMatch(/0–100/);
  });
  it("freezing points: water 0; PG 30 % vol −13.1 °C (ASHRAE-2001 fit)", () => {
    expect(freezingPointC({ kind: "water" })).toBe(0);
    expect(freezingPointC({ kind: "propylene-glycol", percentByVolume: 30 })).toBeCloseTo(-13.11, 2);
  });
});
