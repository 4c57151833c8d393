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
