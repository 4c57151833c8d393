import { describe, expect, it } from "vitest";
import { cvToKv, kvDpDerivativePaPerM3h, kvForPressureDrop, kvInSeries, kvPressureDropPa, kvToCv } from "./kv";

// IEC 60534-1 definition of Kv (references.md §6, confirmed-in-search: Smith & Zappe, Valve
// Selection Handbook p. 33). Worked examples are exact arithmetic of the definition → 1e-9.
describe("Kv", () => {
  it("0.5 m³/h through Kv 2.5 → 4.0 kPa (check #30)", () => {
    expect(kvPressureDropPa(0.5, 2.5, 1000)).toBeCloseTo(4000, 6);
  });
  it("0.2 m³/h through Kv 0.63 → 10.08 kPa (printed to 4 digits)", () => {
    expect(kvPressureDropPa(0.2, 0.63, 1000) / 1000).toBeCloseTo(10.08, 2);
  });
  it("required Kv for 0.6 m³/h at 10 kPa → 1.897 (printed to 4 digits)", () => {
    expect(kvForPressureDrop(0.6, 10_000, 1000)).toBeCloseTo(1.897, 3);
  });
  it("published example: 20 m³/h at 4 bar, SG 1 → Kv 10 (confirmed-in-search)", () => {
    expect(kvForPressureDrop(20, 4e5, 1000)).toBeCloseTo(10, 9);
  });
  it("density scales Δp linearly (definition ρ/ρ0) and Δp has the sign of the flow", () => {
    expect(kvPressureDropPa(0.5, 2.5, 980)).toBeCloseTo(4000 * 0.98, 6);
    expect(kvPressureDropPa(-0.5, 2.5, 1000)).toBeCloseTo(-4000, 6);
    expect(kvPressureDropPa(0, 2.5, 1000)).toBe(0);
  });
  it("derivative 2·Δp/Q", () => {
    expect(kvDpDerivativePaPerM3h(0.5, 2.5, 1000)).toBeCloseTo((2 * 4000) / 0.5, 6);
  });
  it("throws RangeError naming the argument", () => {
    expect(() => kvPressureDropPa(0.5, 0, 1000)).toThrow(/kv/);
    expect(() => kvForPressureDrop(0.5, 0, 1000)).toThrow(/dpPa/);
    expect(() => kvPressureDropPa(Number.NaN, 1, 1000)).toThrow(/flowM3h/);
  });
});

describe("Cv ↔ Kv (unit definitions: US gpm, psi)", () => {
  it("Cv = 1.1561·Kv (check #31, 1e-4); Kv 10 → Cv 11.56 (published example)", () => {
    expect(kvToCv(1)).toBeCloseTo(1.1561, 4);
    expect(kvToCv(10)).toBeCloseTo(11.56, 2);
    expect(cvToKv(kvToCv(3.7))).toBeCloseTo(3.7, 12);
    expect(cvToKv(1)).toBeCloseTo(0.865, 3);
  });
});

describe("Kv arguments: each check on both sides, the message naming the field and the value", () => {
  const fns = {
    kvPressureDropPa: (q: number, k: number, rho: number) => kvPressureDropPa(q, k, rho),
    kvForPressureDrop: (q: number, dp: number, rho: number) => kvForPressureDrop(q, dp, rho),
    kvDpDerivativePaPerM3h: (q: number, k: number, rho: number) => kvDpDerivativePaPerM3h(q, k, rho),
  };
  it.each(Object.entries(fns))("%s: flow must be finite; the second argument and ρ > 0 and finite", (name, f) => {
    const second = name === "kvForPressureDrop" ? "dpPa" : "kv";
    expect(() => f(Number.POSITIVE_INFINITY, 1, 1000)).toThrow(/^flowM3h must be finite, got Infinity$/);
    expect(() => f(0.5, 0, 1000)).toThrow(new RegExp(`^${second} must be > 0 and finite, got 0$`));
    expect(() => f(0.5, Number.POSITIVE_INFINITY, 1000)).toThrow(new RegExp(`^${second} must be > 0 and finite, got Infinity$`));
    expect(() => f(0.5, 1, 0)).toThrow(/^densityKgM3 must be > 0 and finite, got 0$/);
    expect(() => f(0.5, 1, -1000)).toThrow(/densityKgM3/);
    expect(() => f(0.5, 1, Number.NaN)).toThrow(/densityKgM3/);
    expect(Number.isFinite(f(0.5, 1e-9, 1e-9))).toBe(true); // just above the limits is taken
  });
  it("kvForPressureDrop ignores the flow's sign; the derivative is even in Q: 0.5 m³/h either way", () => {
    expect(kvForPressureDrop(-0.6, 10_000, 1000)).toBeCloseTo(0.6 / Math.sqrt(0.1), 12);
    expect(kvDpDerivativePaPerM3h(-0.5, 2.5, 1000)).toBeCloseTo(16_000, 9);
    // ρ enters the derivative as ρ/1000: 980 kg/m³ → 0.98 × 16 kPa per m³/h
    expect(kvDpDerivativePaPerM3h(0.5, 2.5, 980)).toBeCloseTo(0.98 * 16_000, 9);
    // and the Kv for a drop as √(ρ/1000): 0.6 m³/h at 10 kPa of a 1018 kg/m³ glycol → 1.897·√1.018
    expect(kvForPressureDrop(0.6, 10_000, 1018)).toBeCloseTo((0.6 / Math.sqrt(0.1)) * Math.sqrt(1.018), 12);
  });
});

describe("Kv in series (Δp of devices carrying one flow add)", () => {
  it("two Kv 1.0 devices → 1/√2 = 0.7071; the series Δp equals the sum of each Δp", () => {
    expect(kvInSeries(1, 1)).toBeCloseTo(Math.SQRT1_2, 12);
    const [a, b, q] = [1.2, 0.8, 0.4];
    const sum = kvPressureDropPa(q, a, 1000) + kvPressureDropPa(q, b, 1000);
    expect(kvPressureDropPa(q, kvInSeries(a, b), 1000)).toBeCloseTo(sum, 9);
  });
  it("one device is itself; a non-positive Kv throws naming its place", () => {
    expect(kvInSeries(2.5)).toBe(2.5);
    expect(() => kvInSeries(1, 0)).toThrow(/kvs\[1\]/);
  });
});
