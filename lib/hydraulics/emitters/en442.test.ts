import { describe, expect, it } from "vitest";
import { arithmeticExcessK, EN442_NOMINAL_LMTD_K, en442Output, EN442_SOURCE, en442OutputArithmetic, lmtdK } from "./en442";

// references.md §7 (EN 442-2 characteristic equation; worked values computed, ratios printed
// to 4 decimals → 1e-4 absolute on Φ/Φ50).
describe("logarithmic mean excess temperature", () => {
  it("75/65/20 → 10/ln(55/45) = 49.8329 K (check #32; hand calculation of the EN 442-2 definition)", () => {
    expect(lmtdK(75, 65, 20)).toBeCloseTo(49.8329, 4);
    expect(EN442_NOMINAL_LMTD_K).toBeCloseTo(49.8329, 4);
  });
  it.each([[45, 40, 20, 22.407], [45, 35, 20, 19.576], [70, 55, 20, 42.055], [35, 30, 20, 12.332], [40, 35, 21, 16.373]])(
    "%d/%d/%d → %f K (references.md §7, 3 decimals)",
    (f, r, room, dt) => {
      expect(lmtdK(f, r, room)).toBeCloseTo(dt, 3);
    },
  );
  it("equal flow and return → flow − room (the limit), with no NaN", () => {
    expect(lmtdK(50, 50, 20)).toBe(30);
    expect(Math.abs(lmtdK(50, 50 - 1e-7, 20) - 30)).toBeLessThan(1e-6);
  });
  it("throws RangeError naming the argument", () => {
    expect(() => lmtdK(45, 20, 20)).toThrow(/returnC/);
    expect(() => lmtdK(40, 45, 20)).toThrow(/flowC/);
    expect(() => lmtdK(45, 40, Number.NaN)).toThrow(/roomC/);
  });
});

describe("en442Output (logarithmic, vs 49.833 K)", () => {
  it.each([
    [45, 40, 20, 0.3538], [45, 35, 20, 0.2968], [50, 40, 20, 0.4008], [55, 45, 20, 0.5107],
    [55, 50, 20, 0.5722], [70, 55, 20, 0.802], [35, 30, 20, 0.1628], [40, 35, 21, 0.2353],
  ])("%d/%d/%d, n 1.3 → %f × Φ50 (checks #34, #35)", (f, r, room, ratio) => {
    expect(Math.abs(en442Output({ outputAtDt50W: 1, exponentN: 1.3, flowC: f, returnC: r, roomC: room }) - ratio)).toBeLessThan(1e-4);
  });
  it("nominal conditions give exactly Φ50", () => {
    expect(en442Output({ outputAtDt50W: 1460, exponentN: 1.3, flowC: 75, returnC: 65, roomC: 20 })).toBeCloseTo(1460, 9);
  });
  it("rejects exponents outside 1–2 and negative Φ50", () => {
    expect(() => en442Output({ outputAtDt50W: 1000, exponentN: 0.5, flowC: 45, returnC: 40, roomC: 20 })).toThrow(/exponentN/);
    expect(() => en442Output({ outputAtDt50W: -1, exponentN: 1.3, flowC: 45, returnC: 40, roomC: 20 })).toThrow(/outputAtDt50W/);
  });
});

describe("en442OutputArithmetic (catalogue ΔT 50)", () => {
  it.each([
    [45, 40, 20, 1.3, 0.3541], [45, 35, 20, 1.3, 0.3039], [55, 45, 20, 1.3, 0.5148], [70, 55, 20, 1.3, 0.8096],
    [45, 40, 20, 1.2, 0.3836], [45, 40, 20, 1.25, 0.3686], [45, 40, 20, 1.33, 0.3458], [45, 40, 20, 1.35, 0.3403], [45, 40, 20, 1.4, 0.327],
  ])("%d/%d/%d, n %f → %f × Φ50 (check #33)", (f, r, room, n, ratio) => {
    expect(Math.abs(en442OutputArithmetic({ outputAtDt50W: 1, exponentN: n, flowC: f, returnC: r, roomC: room }) - ratio)).toBeLessThan(1e-4);
  });
  it("arithmetic excess (75 + 65)/2 − 20 = 50 K; no output when the mean is not above the room", () => {
    expect(arithmeticExcessK(75, 65, 20)).toBe(50);
    expect(en442OutputArithmetic({ outputAtDt50W: 1000, exponentN: 1.3, flowC: 20, returnC: 18, roomC: 20 })).toBe(0);
  });
});

describe("EN 442 arguments: each limit on both sides, the message naming the value", () => {
  const at = (over: Partial<{ outputAtDt50W: number; exponentN: number; flowC: number; returnC: number; roomC: number }>) =>
    en442Output({ outputAtDt50W: 1000, exponentN: 1.3, flowC: 45, returnC: 35, roomC: 20, ...over });
  it("Φ50 ≥ 0 and finite: 0 gives 0 W, −1 and Infinity are refused", () => {
    expect(at({ outputAtDt50W: 0 })).toBe(0);
    expect(() => at({ outputAtDt50W: -1 })).toThrow(/^outputAtDt50W must be ≥ 0, got -1$/);
    expect(() => at({ outputAtDt50W: Number.POSITIVE_INFINITY })).toThrow(/^outputAtDt50W must be ≥ 0, got Infinity$/);
  });
  it("1 ≤ n ≤ 2: both ends taken (45/35/20: 0.39283^1 and ^2 by hand), 0.99 and 2.01 refused", () => {
    const r = (10 / Math.log(25 / 15)) / (10 / Math.log(55 / 45)); // ΔT_ln 19.576 / 49.833
    expect(at({ exponentN: 1 })).toBeCloseTo(1000 * r, 9);
    expect(at({ exponentN: 2 })).toBeCloseTo(1000 * r * r, 9);
    expect(() => at({ exponentN: 0.99 })).toThrow(/^exponentN must be in \[1, 2\], got 0.99$/);
    expect(() => at({ exponentN: 2.01 })).toThrow(/^exponentN must be in \[1, 2\], got 2.01$/);
  });
  it("temperatures must be finite, named in the message", () => {
    expect(() => lmtdK(Number.NaN, 40, 20)).toThrow(/^flowC must be finite, got NaN$/);
    expect(() => lmtdK(45, Number.POSITIVE_INFINITY, 20)).toThrow(/^returnC must be finite, got Infinity$/);
    expect(() => arithmeticExcessK(45, 40, Number.NaN)).toThrow(/^roomC must be finite, got NaN$/);
    expect(() => arithmeticExcessK(Number.NaN, 40, 20)).toThrow(/flowC/);
    expect(() => arithmeticExcessK(45, Number.NaN, 20)).toThrow(/returnC/);
    expect(() => lmtdK(45, 20, 20)).toThrow(/^returnC 20 must be above roomC 20$/);
    expect(() => lmtdK(40, 40.5, 20)).toThrow(/^flowC 40 must be ≥ returnC 40.5$/);
  });
  it("flow and return within 1e-9 of each other: the mean excess, with no rounding noise (the log form loses 1e-7 there)", () => {
    // a − b = 1.5e-8 K at a = 30 K: ln(a/b) ≈ 5e-10 carries ~4e-7 relative rounding, the mean none
    expect(Math.abs(lmtdK(50, 50 - 1.5e-8, 20) - (30 + (30 - 1.5e-8)) / 2)).toBeLessThan(1e-12);
  });
  it("arithmetic form with the mean exactly at the room: 0 W; just above: Φ50·(ΔT/50)^n", () => {
    expect(en442OutputArithmetic({ outputAtDt50W: 1000, exponentN: 1.3, flowC: 22, returnC: 18, roomC: 20 })).toBe(0);
    expect(en442OutputArithmetic({ outputAtDt50W: 1000, exponentN: 1.3, flowC: 24, returnC: 18, roomC: 20 })).toBeCloseTo(1000 * (1 / 50) ** 1.3, 12);
    expect(() => en442OutputArithmetic({ outputAtDt50W: 1000, exponentN: 3, flowC: 45, returnC: 40, roomC: 20 })).toThrow(/exponentN/);
  });
});

describe("the citation shown with the working", () => {
  it("names EN 442-2 and the logarithmic mean", () => {
    expect(EN442_SOURCE).toMatch(/^EN 442-2:2014, characteristic equation/);
    expect(EN442_SOURCE).toMatch(/logarithmic mean excess temperature/);
  });
});
