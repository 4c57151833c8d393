/**
 * The validity limits of the fluid formulations on both sides, the messages naming the argument,
 * and the citations shown with fluid properties. Limits are the formulations' own stated ranges:
 * IAPWS R7-97 (IF97) region 1, 273.15 K ≤ T ≤ 623.15 K, p ≤ 100 MPa; IAPWS R12-08 viscosity,
 * T > 0 and ρ > 0; the glycol tables (ASHRAE Handbook—Fundamentals 2001, glycol-tables.ts)
 * 0–50 % vol, −10…90 °C, above the freezing point.
 */
import { describe, expect, it } from "vitest";
import { iapws2008ViscosityPas } from "./iapws-2008-viscosity";
import { if97Region1 } from "./iapws-if97-region1";
import { fluidProperties, fluidSource, fluidValidity } from "./index";
import { glycolProperties, glycolValidity } from "./glycol";
import { GLYCOL_SOURCE } from "./glycol-tables";
import { WATER_SOURCE } from "./water";

describe("IF97 region 1: 273.15–623.15 K, 0 < p ≤ 100 MPa (IAPWS R7-97 §5)", () => {
  it("takes both temperature ends and 100 MPa; refuses just outside with the value named", () => {
    expect(if97Region1(273.15, 0.101325).densityKgM3).toBeGreaterThan(999);
    expect(Number.isFinite(if97Region1(623.15, 100).densityKgM3)).toBe(true);
    expect(Number.isFinite(if97Region1(300, 100).densityKgM3)).toBe(true);
    expect(() => if97Region1(623.16, 100)).toThrow(/^temperatureK 623.16 outside IAPWS-IF97 region 1 \(273.15–623.15 K\)$/);
    expect(() => if97Region1(273.14, 1)).toThrow(/^temperatureK 273.14 outside/);
    expect(() => if97Region1(300, 100.01)).toThrow(/^pressureMpa 100.01 outside IAPWS-IF97 region 1 \(0–100 MPa\)$/);
    expect(() => if97Region1(300, -1)).toThrow(/pressureMpa/);
    expect(() => if97Region1(Number.NaN, 1)).toThrow(/temperatureK/);
  });
});

describe("IAPWS 2008 viscosity arguments", () => {
  it("T and ρ must be positive and finite; the message names the argument and the value", () => {
    expect(() => iapws2008ViscosityPas(0, 998)).toThrow(/^temperatureK must be a positive finite number, got 0$/);
    expect(() => iapws2008ViscosityPas(Number.POSITIVE_INFINITY, 998)).toThrow(/temperatureK/);
    expect(() => iapws2008ViscosityPas(Number.NaN, 998)).toThrow(/temperatureK/);
    expect(() => iapws2008ViscosityPas(298.15, -1)).toThrow(/^densityKgM3 must be a positive finite number, got -1$/);
    expect(() => iapws2008ViscosityPas(298.15, Number.POSITIVE_INFINITY)).toThrow(/densityKgM3/);
  });
});

describe("glycol validity on both sides of each limit (glycol tables: 0–50 % vol, −10…90 °C)", () => {
  it("50 % vol and 90 °C are taken; 50.01 % and 90.01 °C are refused with the limit in the message", () => {
    expect(glycolValidity("ethylene-glycol", 50, 20).ok).toBe(true);
    expect(glycolValidity("propylene-glycol", 30, 90).ok).toBe(true);
    expect(glycolValidity("propylene-glycol", 50, -10).ok).toBe(true); // PG 50 % freezes at −33.7 °C (ASHRAE-2001 fit)
    expect(glycolValidity("propylene-glycol", 0, 0.01).ok).toBe(true); // 0 % is water: liquid above 0 °C
    expect(glycolValidity("ethylene-glycol", 50.01, 20)).toEqual({ ok: false, message: "ethylene-glycol 50.01 % vol is outside the tabulated 0–50 % vol" });
    expect(glycolValidity("ethylene-glycol", -0.01, 20).ok).toBe(false);
    expect(glycolValidity("propylene-glycol", 30, 90.01)).toEqual({ ok: false, message: "propylene-glycol properties are tabulated for -10–90 °C, not 90.01 °C" });
    expect(glycolValidity("propylene-glycol", 50, -10.01).ok).toBe(false);
  });
  it("at the freezing point itself the mixture is refused as frozen: PG 20 % vol at −7.38 °C", () => {
    // ASHRAE-2001 fit freezing point of PG 20 % vol: −7.38 °C (references.md §2.1)
    expect(glycolValidity("propylene-glycol", 20, -7.38)).toEqual({ ok: false, message: "-7.38 °C is at or below the freezing point -7.4 °C of propylene-glycol 20 % vol" });
    expect(glycolValidity("propylene-glycol", 20, -7).message).toMatch(/needs table cells below their freezing point/);
  });
});

describe("below 10 % vol the 0 % row is water, liquid from 0 °C only", () => {
  // PG 5 % vol freezes at −1.7 °C (halfway between water 0 °C and the ASHRAE-2001 fit's −3.43 °C at
  // 10 % vol): at 0 °C both rows hold liquid; at −1 °C (above freezing) the water row holds none.
  it("PG 5 % vol at 0 °C is taken, its ρ between water's 999.84 kg/m³ (IAPWS, 0 °C) and the 10 % mixture's", () => {
    expect(glycolValidity("propylene-glycol", 5, 0)).toEqual({ ok: true });
    const rho = glycolProperties("propylene-glycol", 5, 0).densityKgM3;
    expect(rho).toBeGreaterThan(999.84);
    expect(rho).toBeLessThan(glycolProperties("propylene-glycol", 10, 0).densityKgM3);
  });
  it("PG 5 % vol at −1 °C is refused (not thrown): no water-row cell below 0 °C", () => {
    expect(glycolValidity("propylene-glycol", 5, -1).message).toMatch(/^propylene-glycol 5 % vol at -1 °C needs table cells below their freezing point/);
    expect(() => glycolProperties("propylene-glycol", 5, -1)).toThrow(/^propylene-glycol 5 % vol at -1 °C needs table cells/);
  });
  it("glycolProperties throws the validity message itself", () => {
    expect(() => glycolProperties("ethylene-glycol", 30, 95)).toThrow(/^ethylene-glycol properties are tabulated for -10–90 °C, not 95 °C$/);
  });
});

describe("kinematic viscosity of a mixture", () => {
  it("PG 30 % vol at 20 °C: ν = μ/ρ = 3.07e-3 Pa·s / 1028.4 kg/m³ = 2.985 mm²/s (references.md §2.2)", () => {
    // μ 3.07 mPa·s is the ASHRAE-2001 fit printed to 3 digits (±1 %, as glycol.test.ts allows); ρ 1028.4 ASHRAE table
    const p = fluidProperties({ kind: "propylene-glycol", percentByVolume: 30 }, 20);
    expect(Math.abs(p.kinematicViscosityM2s / 2.985e-6 - 1)).toBeLessThan(1e-2);
  });
});

describe("water validity: 0–100 °C liquid", () => {
  it("0 and 100 °C are taken; −0.01 and 100.01 °C refused with the range named", () => {
    expect(fluidValidity({ kind: "water" }, 0)).toEqual({ ok: true });
    expect(fluidValidity({ kind: "water" }, 100)).toEqual({ ok: true });
    expect(fluidValidity({ kind: "water" }, 100.01)).toEqual({ ok: false, message: "water properties are valid for 0–100 °C liquid, not 100.01 °C" });
    expect(fluidValidity({ kind: "water" }, -0.01).ok).toBe(false);
  });
  it("fluidProperties refuses with the validity message after the field name", () => {
    expect(() => fluidProperties({ kind: "water" }, 120)).toThrow(/^tC: water properties are valid for 0–100 °C liquid, not 120 °C$/);
    expect(() => fluidProperties({ kind: "ethylene-glycol", percentByVolume: 60 }, 20)).toThrow(/^tC: ethylene-glycol 60 % vol is outside/);
  });
});

describe("the citations shown with fluid properties", () => {
  it("water: IAPWS-IF97 region 1 and IAPWS 2008; glycols: the ASHRAE Fundamentals tables", () => {
    expect(WATER_SOURCE).toMatch(/IAPWS-IF97 region 1 \(IAPWS R7-97\).*IAPWS 2008 \(R12-08\)/);
    expect(GLYCOL_SOURCE).toMatch(/^ASHRAE Handbook—Fundamentals 2001/);
    expect(fluidSource({ kind: "water" })).toBe(WATER_SOURCE);
    expect(fluidSource({ kind: "propylene-glycol", percentByVolume: 30 })).toBe(GLYCOL_SOURCE);
    expect(fluidSource({ kind: "ethylene-glycol", percentByVolume: 20 })).toBe(GLYCOL_SOURCE);
  });
});
