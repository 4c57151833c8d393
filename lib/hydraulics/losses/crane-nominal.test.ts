/**
 * craneFt against Crane TP-410's own table, written out here (not read from crane.ts): fT by nominal
 * size, Crane TP-410 Appendix A-26 "K factor table" sheet 1 (references.md §5.1, confirmed-in-search:
 * ½" 0.027, ¾" 0.025, 1" 0.023, 1¼" 0.022, 1½" 0.021, 2" 0.019, 2½–3" 0.018, 4" 0.017, 5" 0.016,
 * 6" 0.015, 8–10" 0.014, 12–16" 0.013, 18–24" 0.012), at Schedule 40 inside diameters in inches
 * (ASME B36.10M, from memory), and the nearest-size rule on each side of the split between two
 * neighbouring sizes (their geometric mean, worked out by hand below).
 */
import { describe, expect, it } from "vitest";
import { craneFt } from "./crane";
import { fittingK, fittingTypes } from "./fittings";

const CRANE: [nominal: string, sch40Inches: number, fT: number][] = [
  ['1/2"', 0.622, 0.027], ['3/4"', 0.824, 0.025], ['1"', 1.049, 0.023], ['1-1/4"', 1.38, 0.022],
  ['1-1/2"', 1.61, 0.021], ['2"', 2.067, 0.019], ['2-1/2"', 2.469, 0.018], ['3"', 3.068, 0.018],
  ['4"', 4.026, 0.017], ['5"', 5.047, 0.016], ['6"', 6.065, 0.015], ['8"', 7.981, 0.014],
  ['10"', 10.02, 0.014], ['12"', 11.938, 0.013], ['16"', 15.0, 0.013], ['18"', 16.876, 0.012], ['24"', 22.624, 0.012],
];

describe("Crane TP-410 fT at the Schedule 40 bores", () => {
  it.each(CRANE)("%s (Sch 40 ID %f in) → fT %f", (_n, inches, fT) => {
    expect(craneFt(inches * 25.4)).toBe(fT);
  });
  it("the K of a 2\" standard elbow is 30 × 0.019 = 0.57 and of a 6\" tee branch 60 × 0.015 = 0.90 (Crane A-26/A-27)", () => {
    expect(fittingK("elbow", 2.067 * 25.4)).toBeCloseTo(0.57, 12);
    expect(fittingK("teeBranch", 6.065 * 25.4)).toBeCloseTo(0.9, 12);
  });
});

describe("nearest nominal size in ratio: 1 % each side of the geometric mean of two neighbours", () => {
  // e.g. 1" (26.645 mm) and 1¼" (35.052 mm): √(26.645 × 35.052) = 30.561 mm; 30.26 mm is nearer 1"
  // in ratio (30.26/26.645 = 1.136 < 35.052/30.26 = 1.158), 30.87 mm nearer 1¼" (1.159 > 1.136)
  const pairs = CRANE.slice(1).map((b, i) => [CRANE[i]!, b] as const).filter(([a, b]) => a[2] !== b[2]);
  it.each(pairs.map(([a, b]) => [a[0], b[0], a, b] as const))("between %s and %s", (_a, _b, a, b) => {
    const split = Math.sqrt(a[1] * 25.4 * b[1] * 25.4);
    expect(craneFt(split * 0.99)).toBe(a[2]);
    expect(craneFt(split * 1.01)).toBe(b[2]);
  });
  it("1\" | 1¼\" split by hand: 30.26 mm → 0.023, 30.87 mm → 0.022; copper 35 (32.6 mm) → 1¼\" 0.022", () => {
    expect(craneFt(30.26)).toBe(0.023);
    expect(craneFt(30.87)).toBe(0.022);
    expect(craneFt(32.6)).toBe(0.022); // 35.052/32.6 = 1.075 < 32.6/26.645 = 1.223
  });
  it("a bore far past 24\" keeps the last size's 0.012; one just above ½\" keeps 0.027", () => {
    expect(craneFt(2000)).toBe(0.012);
    expect(craneFt(15.81)).toBe(0.027);
  });
});

describe("the fitting types of the schematic contract", () => {
  // schematic-format.md: a pipe's `fittings` holds counts of elbow, bend, teeRun, teeBranch, reducer;
  // K of each in a 1" Sch 40 pipe (26.645 mm): Crane 30/14/20/60 × 0.023, reducer 0.5·(1 − 0.75²)
  it("are the five the contract names, each with its K at 1\"", () => {
    expect(fittingTypes).toEqual(["elbow", "bend", "teeRun", "teeBranch", "reducer"]);
    const k = fittingTypes.map((t) => fittingK(t, 1.049 * 25.4));
    [0.69, 0.322, 0.46, 1.38, 0.21875].forEach((x, i) => expect(k[i]).toBeCloseTo(x, 12));
  });
});
