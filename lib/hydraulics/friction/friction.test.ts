import { describe, expect, it } from "vitest";
import { colebrookUnchecked } from "./colebrook";
import { colebrook, darcyFrictionFactor, FRICTION_VALIDITY, frictionFormulaValid, fullyRoughFrictionFactor, haaland, laminar, reynolds, swameeJain } from "./index";

const rel = (a: number, e: number) => Math.abs(a / e - 1);

describe("Colebrook–White", () => {
  it("Re 1e5, ε/D 1e-4 → 0.018513866 (fluids doctest, confirmed-in-search; 8 digits printed → 1e-7)", () => {
    expect(rel(colebrook(1e5, 1e-4), 0.018513866)).toBeLessThan(1e-7);
  });
  it("White §6.5 (Moody 1944 example): Re 274 900, ε/D 0.0008 → 0.0198 (printed to 3 digits → 0.5 %)", () => {
    expect(rel(colebrook(274_900, 0.0008), 0.0198)).toBeLessThan(5e-3);
  });
  it("White Ex. 6.7: Re 128 000, ε/D 0.0013 → 0.0225 read from the Moody chart (chart reading → 2 %)", () => {
    expect(rel(colebrook(128_000, 0.0013), 0.0225)).toBeLessThan(2e-2);
  });
  // references.md §3.2 rows 4–6: computed from the defining equation, printed to 5 digits → 1e-4.
  it.each([
    [1e5, 0, 0.01799],
    [1e4, 0, 0.030883],
    [1e6, 1e-3, 0.019943],
  ])("Re %f, ε/D %f → %f (computed, references.md §3.2)", (re, rr, f) => {
    expect(rel(colebrook(re, rr), f)).toBeLessThan(1e-4);
  });
  it("satisfies its own equation to 1e-10 in 1/√f (convergence criterion) across the Moody range", () => {
    for (const re of [4e3, 1e4, 1e5, 1e6, 1e8]) {
      for (const rr of [0, 1e-6, 1e-4, 1e-3, 1e-2, 5e-2]) {
        const f = colebrook(re, rr);
        const x = 1 / Math.sqrt(f);
        expect(Math.abs(x + 2 * Math.log10(rr / 3.7 + 2.51 / (re * Math.sqrt(f))))).toBeLessThan(1e-9);
      }
    }
  });
  it("tends to the fully rough limit 0.25/[log10(ε/3.7D)]²: ε/D 1e-3 → 0.019635 (references.md §3.2 row 6)", () => {
    expect(rel(fullyRoughFrictionFactor(1e-3), 0.019635)).toBeLessThan(1e-4);
    expect(rel(colebrook(1e10, 1e-3), fullyRoughFrictionFactor(1e-3))).toBeLessThan(1e-4);
  });
  it("smooth-pipe Blasius 0.3164·Re^-0.25 = 0.017792 at 1e5 is ~1.1 % below Colebrook (different law)", () => {
    const blasius = 0.3164 * 1e5 ** -0.25;
    expect(rel(blasius, 0.017792)).toBeLessThan(1e-4);
    expect(colebrook(1e5, 0)).toBeGreaterThan(blasius);
  });
  it("throws RangeError naming the argument", () => {
    expect(() => colebrook(0, 1e-4)).toThrow(/re/);
    expect(() => colebrook(1e5, -1e-4)).toThrow(/relRoughness/);
    expect(() => colebrook(Number.NaN, 1e-4)).toThrow(RangeError);
  });
});

describe("explicit approximations", () => {
  it("Swamee–Jain(1e5, 1e-4) = 0.018452424 (fluids doctest; 1e-5, see why)", () => {
    // fluids writes the constant as (6.97/Re)^0.9 = 5.7389/Re^0.9; Swamee & Jain (1976) print
    // 5.74/Re^0.9, which this engine uses. The two differ by 1.2e-6 relative here, so 1e-5.
    expect(rel(swameeJain(1e5, 1e-4), 0.018452424)).toBeLessThan(1e-5);
    expect(rel(swameeJain(1e5, 1e-4), 0.018452424)).toBeGreaterThan(1e-7);
  });
  it("Haaland(1e5, 1e-4) = 0.018265053 (fluids doctest, same equation; 8 digits → 1e-7)", () => {
    expect(rel(haaland(1e5, 1e-4), 0.018265053)).toBeLessThan(1e-7);
  });
  it("hydronic range Re 1e4–1e6, ε/D ≤ 1e-3: SJ within 0.9 %, Haaland within 1.45 % of Colebrook (references.md §3.1 scan, check #17)", () => {
    let maxSj = 0;
    let maxH = 0;
    for (let lg = 4; lg <= 6.0001; lg += 0.125) {
      for (const rr of [0, 1e-6, 1e-5, 1e-4, 3e-4, 1e-3]) {
        const re = 10 ** lg;
        const c = colebrook(re, rr);
        maxSj = Math.max(maxSj, rel(swameeJain(re, rr), c));
        maxH = Math.max(maxH, rel(haaland(re, rr), c));
      }
    }
    expect(maxSj).toBeLessThan(0.009);
    expect(maxH).toBeLessThan(0.0145);
    expect(maxSj).toBeGreaterThan(0.001); // they are approximations: a zero here would mean the test compares a function with itself
  });
  it("laminar 64/Re: Re 1000 → 0.064 exactly (defining equation, check #16)", () => {
    expect(laminar(1000)).toBe(0.064);
    expect(() => laminar(-1)).toThrow(RangeError);
  });
});

describe("darcyFrictionFactor (regime rule)", () => {
  it("Re 0 → f 0, laminar (no flow, no loss)", () => {
    expect(darcyFrictionFactor(0, 1e-4)).toEqual({ f: 0, regime: "laminar" });
  });
  it("laminar below 2300, transition 2300–4000, Colebrook from 4000", () => {
    expect(darcyFrictionFactor(2000, 1e-4)).toEqual({ f: 0.032, regime: "laminar" });
    expect(darcyFrictionFactor(3000, 1e-4).regime).toBe("transition");
    expect(darcyFrictionFactor(1e5, 1e-4)).toEqual({ f: colebrook(1e5, 1e-4), regime: "turbulent" });
  });
  it("is continuous at 2300 and 4000 (no jump for a Newton solver)", () => {
    const e = 1e-9;
    expect(Math.abs(darcyFrictionFactor(2300 - e, 1e-3).f - darcyFrictionFactor(2300, 1e-3).f)).toBeLessThan(1e-9);
    expect(Math.abs(darcyFrictionFactor(4000 - e, 1e-3).f - darcyFrictionFactor(4000, 1e-3).f)).toBeLessThan(1e-9);
    const mid = darcyFrictionFactor(3150, 1e-3).f;
    expect(mid).toBeCloseTo((64 / 2300 + colebrook(4000, 1e-3)) / 2, 12);
  });
  it("rejects negative or non-finite Re", () => {
    expect(() => darcyFrictionFactor(-1, 0)).toThrow(/re/);
    expect(() => darcyFrictionFactor(Number.POSITIVE_INFINITY, 0)).toThrow(RangeError);
  });
});

describe("reynolds", () => {
  it("water 15 °C (μ 1.138e-3, ρ 999.1), D 5 cm, 6 L/s → V 3.056 m/s, Re 134 140 (references.md §3.2 row 8, computed; 5 digits → 1e-4)", () => {
    const v = 0.006 / ((Math.PI * 0.05 ** 2) / 4);
    expect(rel(v, 3.0558)).toBeLessThan(1e-4);
    expect(rel(reynolds(v, 0.05, 1.138e-3 / 999.1), 134_140)).toBeLessThan(1e-4);
  });
  it("ignores the sign of the velocity and rejects D, ν ≤ 0", () => {
    expect(reynolds(-1, 0.02, 1e-6)).toBeCloseTo(20_000, 9);
    expect(() => reynolds(1, 0, 1e-6)).toThrow(/innerDiameterM/);
    expect(() => reynolds(1, 0.02, 0)).toThrow(/kinematicViscosityM2s/);
  });
});

describe("validity as data", () => {
  it("Swamee–Jain is stated for Re ≥ 5000 and 1e-6 ≤ ε/D ≤ 1e-2 (Swamee & Jain 1976)", () => {
    expect(frictionFormulaValid("swameeJain", 1e5, 1e-4)).toBe(true);
    expect(frictionFormulaValid("swameeJain", 3000, 1e-4)).toBe(false);
    expect(frictionFormulaValid("swameeJain", 1e5, 0)).toBe(false);
    expect(frictionFormulaValid("colebrook", 1e5, 0)).toBe(true);
  });
});

describe("stated validity ranges, each bound on both sides", () => {
  // Colebrook and Haaland: turbulent Re 4e3…1e8, ε/D 0…0.05 (the Moody chart range, White Fig. 6.13);
  // Swamee–Jain: Re 5e3…1e8, ε/D 1e-6…1e-2 (Swamee & Jain 1976); laminar: Re below 2300 (references §3.2).
  const table: [keyof typeof FRICTION_VALIDITY, number, number, number, number][] = [
    ["laminar", 0, 2300, 0, 1],
    ["colebrook", 4000, 1e8, 0, 0.05],
    ["swameeJain", 5000, 1e8, 1e-6, 1e-2],
    ["haaland", 4000, 1e8, 0, 0.05],
  ];
  it.each(table)("%s: Re %d…%d, ε/D %d…%d", (method, reMin, reMax, rrMin, rrMax) => {
    expect(FRICTION_VALIDITY[method]).toEqual({ reMin, reMax, relRoughnessMin: rrMin, relRoughnessMax: rrMax });
    const rr = (rrMin + rrMax) / 2;
    const re = (reMin + reMax) / 2;
    expect(frictionFormulaValid(method, reMin, rr)).toBe(true);
    expect(frictionFormulaValid(method, reMax, rr)).toBe(true);
    expect(frictionFormulaValid(method, reMin * 0.99 - 1e-9, rr)).toBe(false);
    expect(frictionFormulaValid(method, reMax * 1.01, rr)).toBe(false);
    expect(frictionFormulaValid(method, re, rrMin)).toBe(true);
    expect(frictionFormulaValid(method, re, rrMax)).toBe(true);
    expect(frictionFormulaValid(method, re, rrMin * 0.99 - 1e-9)).toBe(false);
    expect(frictionFormulaValid(method, re, rrMax * 1.01)).toBe(false);
  });
});

describe("argument checks of every formula, on both sides of each limit", () => {
  it.each([["colebrook", colebrook], ["swameeJain", swameeJain], ["haaland", haaland]] as const)("%s: Re > 0 and finite, 0 ≤ ε/D < 1", (_n, f) => {
    expect(() => f(0, 1e-4)).toThrow(/^re must be > 0 and finite, got 0$/);
    expect(() => f(Number.POSITIVE_INFINITY, 1e-4)).toThrow(/^re must be > 0 and finite, got Infinity$/);
    expect(() => f(1e5, -1e-9)).toThrow(/^relRoughness must be in \[0, 1\), got -1e-9$/);
    expect(() => f(1e5, 1)).toThrow(/^relRoughness must be in \[0, 1\), got 1$/);
    expect(Number.isFinite(f(1e5, 0))).toBe(true);
    expect(Number.isFinite(f(1e5, 0.5))).toBe(true);
  });
  it("laminar: Re > 0 and finite; fully rough: 0 < ε/D < 1", () => {
    expect(() => laminar(0)).toThrow(/^re must be > 0 and finite, got 0$/);
    expect(() => laminar(Number.POSITIVE_INFINITY)).toThrow(/re must be/);
    expect(laminar(1e-3)).toBeCloseTo(64_000, 6);
    expect(() => fullyRoughFrictionFactor(0)).toThrow(/^relRoughness must be in \(0, 1\), got 0$/);
    expect(() => fullyRoughFrictionFactor(1)).toThrow(/relRoughness/);
    expect(fullyRoughFrictionFactor(0.5)).toBeCloseTo(0.25 / Math.log10(0.5 / 3.7) ** 2, 12);
  });
  it("reynolds: v finite, D and ν > 0 and finite, the messages name the value", () => {
    expect(() => reynolds(Number.NaN, 0.02, 1e-6)).toThrow(/^velocityMps must be finite, got NaN$/);
    expect(() => reynolds(1, Number.POSITIVE_INFINITY, 1e-6)).toThrow(/^innerDiameterM must be > 0, got Infinity$/);
    expect(() => reynolds(1, 0.02, -1e-6)).toThrow(/^kinematicViscosityM2s must be > 0, got -0.000001$/);
    expect(reynolds(0, 0.02, 1e-6)).toBe(0);
  });
});

describe("Colebrook from a warm start converges to the same root", () => {
  it("a caller's guess of 1/√f (far or near) gives Colebrook(1e5, 1e-4) = 0.018513866 to 1e-12", () => {
    const f = colebrook(1e5, 1e-4);
    for (const guess of [1, 5, 7.349, 20]) expect(Math.abs(colebrookUnchecked(1e5, 1e-4, guess) / f - 1)).toBeLessThan(1e-12);
    expect(Math.abs(f / 0.018513866 - 1)).toBeLessThan(1e-7);
  });
});
