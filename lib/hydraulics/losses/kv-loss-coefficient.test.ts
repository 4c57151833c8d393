/**
 * kvForLossCoefficient, kvInSeries's empty call and the citations of the losses folder. Expected
 * values are hand calculations of the IEC 60534-1 Kv definition (Δp = 1 bar at Q = Kv m³/h, water
 * 1000 kg/m³) with Δp = K·ρv²/2, written out in each test, and the trade conversion
 * ζ = 0.0016·d⁴/Kv² (d in mm; from memory, the coefficient rounded to 2 digits).
 */
import { describe, expect, it } from "vitest";
import { CRANE_SOURCE } from "./crane";
import { KV_SOURCE, kvForLossCoefficient, kvInSeries } from "./kv";

describe("Kv of a fitting from its loss coefficient K", () => {
  it("K 0.075 in 20.2 mm → Kv 59.58 m³/h", () => {
    // A = π·0.0202²/4 = 3.2047e-4 m²; v at 1 bar: √(2·1e5/(1000·0.075)) = 51.640 m/s;
    // Q = 3600 s/h × 3.2047e-4 m² × 51.640 m/s = 59.577 m³/h
    expect(kvForLossCoefficient(0.075, 20.2)).toBeCloseTo(59.577, 3);
  });
  it("K 1 in 26.2 mm (copper 28): Kv = 3600 × 5.3913e-4 × √200 = 27.45 m³/h", () => {
    expect(kvForLossCoefficient(1, 26.2)).toBeCloseTo(27.448, 3);
  });
  it("agrees with the trade form ζ = 0.0016·d⁴/Kv² (exactly 200·(3600·π/4·1e-6)² = 0.0015989; rounded to 0.0016 → 0.07 %)", () => {
    for (const [k, d] of [[0.5, 13.6], [2.5, 32.6], [10, 51.6]] as const) {
      const kv = kvForLossCoefficient(k, d);
      expect(Math.abs((0.0016 * d ** 4) / kv ** 2 / k - 1)).toBeLessThan(1.5e-3);
    }
  });
  it("refuses K and bore ≤ 0 or non-finite, naming the field", () => {
    expect(() => kvForLossCoefficient(0, 20)).toThrow(/^k must be > 0 and finite, got 0$/);
    expect(() => kvForLossCoefficient(1, -20)).toThrow(/^innerDiameterMm must be > 0 and finite, got -20$/);
    expect(() => kvForLossCoefficient(1, Number.POSITIVE_INFINITY)).toThrow(/innerDiameterMm/);
  });
});

describe("kvInSeries with nothing in series", () => {
  it("is refused with a message (no Kv to combine)", () => {
    expect(() => kvInSeries()).toThrow(/^kvInSeries needs at least one Kv$/);
  });
  it("three devices: Kv 2, 2, √2 → 1/√(¼ + ¼ + ½) = 1", () => {
    expect(kvInSeries(2, 2, Math.SQRT2)).toBeCloseTo(1, 12);
  });
});

describe("the citations shown with the working name their sources", () => {
  it("IEC 60534-1 for Kv; Crane Technical Paper No. 410, Appendix A, for fitting K", () => {
    expect(KV_SOURCE).toMatch(/^IEC 60534-1 flow coefficient/);
    expect(CRANE_SOURCE).toMatch(/Crane Co\., Technical Paper No\. 410, Appendix A/);
  });
});
