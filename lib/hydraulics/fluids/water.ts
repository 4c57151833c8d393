/**
 * Liquid water properties at about 1 atm, 0–100 °C.
 *
 * - Density and isobaric heat capacity: IAPWS-IF97 region 1 (IAPWS R7-97) at
 *   p = 0.101325 MPa. Deviation from IAPWS-95 (the scientific formulation),
 *   checked every 5 K over 0–100 °C: ρ ≤ 0.0015 %, cp ≤ 0.053 %, μ ≤ 0.003 %.
 * - Viscosity: IAPWS 2008 (R12-08) evaluated at the IF97 density.
 * Pressure effect: 2 bar instead of 1 atm changes ρ by ~0.04 kg/m³ — ignored.
 * At 99.97–100 °C the state at 1 atm is metastable liquid; the formulation is
 * smooth there and the values are used as is (sealed systems run pressurised).
 */
import { iapws2008ViscosityPas } from "./iapws-2008-viscosity";
import { if97Region1 } from "./iapws-if97-region1";

export const WATER_MIN_C = 0;
export const WATER_MAX_C = 100;
/** Standard atmosphere, MPa. */
const P_ATM_MPA = 0.101325;

function checkTemperature(tC: number): void {
  if (!(tC >= WATER_MIN_C && tC <= WATER_MAX_C)) {
    throw new RangeError(`tC ${tC} °C outside liquid-water validity ${WATER_MIN_C}–${WATER_MAX_C} °C`);
  }
}

/** Density ρ (kg/m³) of liquid water at tC (°C, 0–100), 1 atm. IAPWS-IF97 region 1. */
export function waterDensityKgM3(tC: number): number {
  checkTemperature(tC);
  return if97Region1(tC + 273.15, P_ATM_MPA).densityKgM3;
}

/** Isobaric specific heat cp (J/(kg·K)) of liquid water at tC (°C, 0–100), 1 atm. IAPWS-IF97 region 1. */
export function waterSpecificHeatJkgK(tC: number): number {
  checkTemperature(tC);
  return if97Region1(tC + 273.15, P_ATM_MPA).specificHeatJkgK;
}

/** Dynamic viscosity μ (Pa·s) of liquid water at tC (°C, 0–100), 1 atm. IAPWS 2008 at the IF97 density. */
export function waterDynamicViscosityPas(tC: number): number {
  const rho = waterDensityKgM3(tC);
  return iapws2008ViscosityPas(tC + 273.15, rho);
}

/** Kinematic viscosity ν = μ/ρ (m²/s) of liquid water at tC (°C, 0–100). */
export function waterKinematicViscosityM2s(tC: number): number {
  return waterDynamicViscosityPas(tC) / waterDensityKgM3(tC);
}

/** The citation shown with water properties. */
export const WATER_SOURCE = "IAPWS-IF97 region 1 (IAPWS R7-97) for density and specific heat; IAPWS 2008 (R12-08) for viscosity";
