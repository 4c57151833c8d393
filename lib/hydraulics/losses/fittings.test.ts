import { describe, expect, it } from "vitest";
import { CRANE_FT_TABLE, craneFt } from "./crane";
import { fittingK, REDUCER_K, suddenContractionK, suddenEnlargementK, sumFittingsK } from "./fittings";

// Crane TP-410 Appendix A-26/A-27 (references.md §5.1, confirmed-in-search). K values are
// ±10–30 % engineering data, so these tests check lookup and arithmetic to 1e-9 (as
// references.md §5.3 advises), not physics.
const SCH40_HALF_INCH_MM = 15.8;
const SCH40_ONE_INCH_MM = 26.64;

describe("Crane fT", () => {
  it('½" → 0.027 and 1" → 0.023 (check #23)', () => {
    expect(craneFt(SCH40_HALF_INCH_MM)).toBe(0.027);
    expect(craneFt(SCH40_ONE_INCH_MM)).toBe(0.023);
  });
  it("reproduces the whole table at the Sch 40 bores", () => {
    for (const r of CRANE_FT_TABLE) expect(craneFt(r.sch40InnerDiameterMm)).toBe(r.fT);
    expect(CRANE_FT_TABLE.map((r) => r.fT)).toEqual([
      0.027, 0.025, 0.023, 0.022, 0.021, 0.019, 0.018, 0.018, 0.017, 0.016, 0.015, 0.014, 0.014, 0.013, 0.013, 0.012, 0.012,
    ]);
  });
  it("picks the nearest nominal bore: copper 22 (20.2 mm) → ¾\" 0.025, copper 28 (26.2 mm) → 1\" 0.023", () => {
    expect(craneFt(20.2)).toBe(0.025);
    expect(craneFt(26.2)).toBe(0.023);
  });
  it('below ½": fully rough limit with ε 0.045 mm, never below 0.027 (8.8 mm → 0.0306)', () => {
    expect(craneFt(8.8)).toBeCloseTo(0.25 / Math.log10(0.045 / 8.8 / 3.7) ** 2, 12);
    expect(craneFt(8.8)).toBeGreaterThan(0.03);
    expect(craneFt(15)).toBe(0.027);
    expect(() => craneFt(0)).toThrow(/innerDiameterMm/);
  });
});

describe("fittingK = n·fT", () => {
  it('1": std elbow 30 fT = 0.69 (check #24); tee branch 1.38, tee run 0.46 (check #25); bend r/d 1.5 14 fT = 0.322', () => {
    expect(fittingK("elbow", SCH40_ONE_INCH_MM)).toBeCloseTo(0.69, 9);
    expect(fittingK("teeBranch", SCH40_ONE_INCH_MM)).toBeCloseTo(1.38, 9);
    expect(fittingK("teeRun", SCH40_ONE_INCH_MM)).toBeCloseTo(0.46, 9);
    expect(fittingK("bend", SCH40_ONE_INCH_MM)).toBeCloseTo(0.322, 9);
  });
  it('½": elbow 0.81, tee branch 1.62, tee run 0.54 (references.md §5.1 column "K at ½")', () => {
    expect(fittingK("elbow", SCH40_HALF_INCH_MM)).toBeCloseTo(0.81, 9);
    expect(fittingK("teeBranch", SCH40_HALF_INCH_MM)).toBeCloseTo(1.62, 9);
    expect(fittingK("teeRun", SCH40_HALF_INCH_MM)).toBeCloseTo(0.54, 9);
  });
  it("reducer: sudden contraction at β 0.75 = 0.21875, independent of size", () => {
    expect(REDUCER_K).toBeCloseTo(0.21875, 12);
    expect(fittingK("reducer", 13.6)).toBe(REDUCER_K);
    expect(fittingK("reducer", 51.6)).toBe(REDUCER_K);
  });
  it("sumFittingsK adds count × K and rejects bad counts", () => {
    expect(sumFittingsK({ elbow: 4, teeRun: 1 }, SCH40_ONE_INCH_MM)).toBeCloseTo(4 * 0.69 + 0.46, 9);
    expect(sumFittingsK({}, 20)).toBe(0);
    expect(() => sumFittingsK({ elbow: -1 }, 20)).toThrow(/fittings.elbow/);
  });
});

describe("area changes (references.md §5.3, confirmed-in-search via fluids doctests)", () => {
  it("sudden enlargement β 0.5 → 0.5625 (Borda–Carnot, check #28); contraction β 0.5 → 0.375 (Crane, check #29)", () => {
    expect(suddenEnlargementK(0.5)).toBe(0.5625);
    expect(suddenContractionK(0.5)).toBe(0.375);
  });
  it("Crane contraction d 3 → 2: 0.278 (fluids doctest, printed to 3 digits)", () => {
    expect(suddenContractionK(2 / 3)).toBeCloseTo(0.278, 3);
  });
  it("rejects β outside (0, 1]", () => {
    expect(() => suddenContractionK(0)).toThrow(/beta/);
    expect(() => suddenEnlargementK(1.2)).toThrow(/beta/);
  });
});

describe("the Crane table's bores and names, and the limits of each function on both sides", () => {
  it("Sch 40 bores are ASME B36.10M inside diameters (inches, from memory; × 25.4 to the table's 0.01 mm)", () => {
    const inches = [0.622, 0.824, 1.049, 1.38, 1.61, 2.067, 2.469, 3.068, 4.026, 5.047, 6.065, 7.981, 10.02, 11.938, 15.0, 16.876, 22.624];
    CRANE_FT_TABLE.forEach((r, i) => expect(Math.abs(r.sch40InnerDiameterMm - inches[i]! * 25.4), r.nominal).toBeLessThan(0.006));
    expect(CRANE_FT_TABLE.map((r) => r.nominal)).toEqual([
      '1/2"', '3/4"', '1"', '1-1/4"', '1-1/2"', '2"', '2-1/2"', '3"', '4"', '5"', '6"', '8"', '10"', '12"', '16"', '18"', '24"',
    ]);
  });
  it("between two bores the nearer in ratio wins: 18.0 mm → ½\" (0.027), 18.4 mm → ¾\" (0.025); √(15.8·20.93) = 18.185", () => {
    expect(craneFt(18.0)).toBe(0.027);
    expect(craneFt(18.4)).toBe(0.025);
    expect(craneFt(1000)).toBe(0.012); // beyond the table: the largest size
  });
  it("craneFt refuses 0, negative and non-finite bores with the message naming the value", () => {
    expect(() => craneFt(0)).toThrow(/^innerDiameterMm must be > 0, got 0$/);
    expect(() => craneFt(-5)).toThrow(/innerDiameterMm/);
    expect(() => craneFt(Number.POSITIVE_INFINITY)).toThrow(/innerDiameterMm/);
    expect(craneFt(0.5)).toBeCloseTo(0.25 / Math.log10(0.045 / 0.5 / 3.7) ** 2, 12); // tiny bore, fully rough
  });
  it("fittingK: a reducer needs a bore > 0; an unknown type is refused by name", () => {
    expect(() => fittingK("reducer", 0)).toThrow(/^innerDiameterMm must be > 0, got 0$/);
    expect(() => fittingK("valve" as never, 20)).toThrow(/^type: unknown fitting type valve$/);
  });
  it("sumFittingsK: 0 and missing counts add nothing; NaN, Infinity and negatives are refused by name", () => {
    expect(sumFittingsK({ elbow: 0, teeRun: undefined }, SCH40_ONE_INCH_MM)).toBe(0);
    expect(sumFittingsK({ bend: 2, reducer: 1 }, SCH40_ONE_INCH_MM)).toBeCloseTo(2 * 0.322 + 0.21875, 9);
    expect(() => sumFittingsK({ elbow: Number.NaN }, 20)).toThrow(/^fittings.elbow must be ≥ 0, got NaN$/);
    expect(() => sumFittingsK({ teeRun: Number.POSITIVE_INFINITY }, 20)).toThrow(/fittings.teeRun/);
  });
  it("area changes: β = 1 is no change (K 0), above 1 or at 0 is refused; a tiny β is taken", () => {
    expect(suddenContractionK(1)).toBe(0);
    expect(suddenEnlargementK(1)).toBe(0);
    expect(() => suddenContractionK(1.0001)).toThrow(/^beta must be in \(0, 1\], got 1.0001$/);
    expect(() => suddenEnlargementK(0)).toThrow(/^beta must be in \(0, 1\], got 0$/);
    expect(() => suddenContractionK(-0.5)).toThrow(/beta/);
    expect(suddenContractionK(1e-6)).toBeCloseTo(0.5, 9);
    expect(suddenEnlargementK(1e-6)).toBeCloseTo(1, 9);
  });
});
