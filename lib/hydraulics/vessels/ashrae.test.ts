import { describe, expect, it } from "vitest";
import { expansionFraction } from "../fluids";
import { ASHRAE_ALPHA_PER_K, ashraeDiaphragmTank, ashraePlainTank } from "./ashrae";

const PSI_BAR = 0.0689476;

// references.md §8.2: ASHRAE equations confirmed-in-search; worked examples C and D computed
// there (no ASHRAE worked example was found). 0.5 % (check #38): results printed to 3–4 digits.
describe("ASHRAE expansion tank — example C (1000 gal, 40 → 200 °F, steel, 12 → 27 psig)", () => {
  const input = {
    systemVolumeL: 1000, // gallons in, gallons out
    expansionFraction: 0.038349, // v2/v1 − 1, IAPWS-95 (references.md)
    linearExpansionPerK: ASHRAE_ALPHA_PER_K.steel,
    deltaTK: 160 / 1.8,
    fillPressureAbsBar: 26.7 * PSI_BAR,
    maxPressureAbsBar: 41.7 * PSI_BAR,
  };
  it("3αΔt = 0.00312; diaphragm tank 97.9 gal", () => {
    expect(3 * input.linearExpansionPerK * input.deltaTK).toBeCloseTo(0.00312, 6);
    expect(Math.abs(ashraeDiaphragmTank(input) / 97.9 - 1)).toBeLessThan(5e-3);
  });
  it("plain steel tank (P_a 14.7 psia) 177.9 gal", () => {
    expect(Math.abs(ashraePlainTank({ ...input, atmosphereAbsBar: 14.7 * PSI_BAR }) / 177.9 - 1)).toBeLessThan(5e-3);
  });
});

describe("ASHRAE diaphragm tank — example D (SI, 200 L, 10 → 55 °C, copper, 1.0 → 2.5 bar g)", () => {
  it("V_t 5.58 L (no water reserve — not the EN 12828 form)", () => {
    const e = expansionFraction({ kind: "water" }, 10, 55);
    const vt = ashraeDiaphragmTank({
      systemVolumeL: 200, expansionFraction: e, linearExpansionPerK: ASHRAE_ALPHA_PER_K.copper, deltaTK: 45,
      fillPressureAbsBar: 2.01325, maxPressureAbsBar: 3.51325,
    });
    expect(Math.abs(vt / 5.58 - 1)).toBeLessThan(5e-3);
  });
  it("throws RangeError when the max pressure is not above the fill pressure", () => {
    expect(() =>
      ashraeDiaphragmTank({ systemVolumeL: 200, expansionFraction: 0.02, linearExpansionPerK: 0, deltaTK: 45, fillPressureAbsBar: 2, maxPressureAbsBar: 2 }),
    ).toThrow(/maxPressureAbsBar/);
  });
});

describe("ASHRAE tank inputs: a bad number is a RangeError naming the field, at the boundary too", () => {
  const ok = { systemVolumeL: 200, expansionFraction: 0.02, linearExpansionPerK: 0, deltaTK: 45, fillPressureAbsBar: 2, maxPressureAbsBar: 3.5 };
  it.each(["systemVolumeL", "fillPressureAbsBar", "maxPressureAbsBar"] as const)("%s 0, −1 or NaN → '%s must be > 0, got …'", (k) => {
    for (const bad of [0, -1, Number.NaN]) {
      expect(() => ashraeDiaphragmTank({ ...ok, [k]: bad })).toThrow(new RegExp(`^${k} must be > 0, got ${bad}$`));
    }
  });
  it.each(["expansionFraction", "linearExpansionPerK", "deltaTK"] as const)("%s non-finite → '%s must be finite'", (k) => {
    expect(() => ashraeDiaphragmTank({ ...ok, [k]: Number.POSITIVE_INFINITY })).toThrow(new RegExp(`^${k} must be finite, got Infinity$`));
    // any finite value, negative included (a tank sized for a cooling system), is taken
    expect(Number.isFinite(ashraeDiaphragmTank({ ...ok, [k]: -0.001 }))).toBe(true);
  });
  it("a tiny but positive pressure or volume is taken (the limit is > 0, not ≥ a larger number)", () => {
    expect(ashraeDiaphragmTank({ ...ok, systemVolumeL: 1e-9 })).toBeCloseTo((1e-9 * 0.02) / (1 - 2 / 3.5), 20);
  });
  it("plain tank: atmosphere 0 or below → RangeError naming atmosphereAbsBar; 1.01325 bar → the formula", () => {
    expect(() => ashraePlainTank({ ...ok, atmosphereAbsBar: 0 })).toThrow(/^atmosphereAbsBar must be > 0, got 0$/);
    expect(() => ashraePlainTank({ ...ok, atmosphereAbsBar: -1 })).toThrow(/atmosphereAbsBar/);
    // V_t = 200·0.02/(1.01325/2 − 1.01325/3.5) = 18.42 L
    expect(ashraePlainTank({ ...ok, atmosphereAbsBar: 1.01325 })).toBeCloseTo(4 / (1.01325 / 2 - 1.01325 / 3.5), 9);
  });
});
