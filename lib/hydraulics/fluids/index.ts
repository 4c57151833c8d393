/**
 * Fluids: properties of the heating medium — liquid water (IAPWS-IF97 region 1
 * for ρ and cp, IAPWS 2008 for μ, at 1 atm, 0–100 °C) and propylene/ethylene
 * glycol mixtures by volume percent (ASHRAE Fundamentals tables, interpolated).
 * Validity ranges are data (`fluidValidity`); property functions throw a
 * RangeError naming the argument outside them, never return NaN.
 */
import { glycolFreezingPointC, glycolProperties, glycolValidity } from "./glycol";
import { WATER_MAX_C, WATER_MIN_C, WATER_SOURCE, waterDensityKgM3, waterDynamicViscosityPas, waterSpecificHeatJkgK } from "./water";
import { GLYCOL_SOURCE } from "./glycol-tables";

export * from "./water";
export * from "./glycol";
export { GLYCOL_SOURCE } from "./glycol-tables";
export { iapws2008ViscosityPas } from "./iapws-2008-viscosity";
export { if97Region1 } from "./iapws-if97-region1";

export type FluidSpec =
  | { kind: "water" }
  | { kind: "propylene-glycol" | "ethylene-glycol"; percentByVolume: number };

export interface FluidProperties {
  temperatureC: number;
  densityKgM3: number;
  dynamicViscosityPas: number;
  kinematicViscosityM2s: number;
  specificHeatJkgK: number;
}

/** Whether properties of `fluid` at tC (°C) are inside the validity of the data. */
export function fluidValidity(fluid: FluidSpec, tC: number): { ok: boolean; message?: string } {
  if (fluid.kind === "water") {
    if (tC >= WATER_MIN_C && tC <= WATER_MAX_C) return { ok: true };
    return { ok: false, message: `water properties are valid for ${WATER_MIN_C}–${WATER_MAX_C} °C liquid, not ${tC} °C` };
  }
  return glycolValidity(fluid.kind, fluid.percentByVolume, tC);
}

/**
 * Properties of `fluid` at tC (°C). Throws RangeError outside `fluidValidity`
 * (the caller turns that into a finding). ν = μ/ρ.
 */
export function fluidProperties(fluid: FluidSpec, tC: number): FluidProperties {
  const v = fluidValidity(fluid, tC);
  if (!v.ok) throw new RangeError(`tC: ${v.message ?? "outside validity"}`);
  if (fluid.kind === "water") {
    const densityKgM3 = waterDensityKgM3(tC);
    const dynamicViscosityPas = waterDynamicViscosityPas(tC);
    return {
      temperatureC: tC,
      densityKgM3,
      dynamicViscosityPas,
      kinematicViscosityM2s: dynamicViscosityPas / densityKgM3,
      specificHeatJkgK: waterSpecificHeatJkgK(tC),
    };
  }
  const p = glycolProperties(fluid.kind, fluid.percentByVolume, tC);
  return { temperatureC: tC, ...p, kinematicViscosityM2s: p.dynamicViscosityPas / p.densityKgM3 };
}

/**
 * Volumetric expansion fraction e = ρ(fillC)/ρ(maxC) − 1 (dimensionless) when the
 * fluid is heated from fillC to maxC (°C) at constant mass — mass conservation,
 * V ∝ 1/ρ. Used as "e" in EN 12828 Annex D (V_e = e·V_s). Water 10 → 80 °C ≈ 0.02872.
 * Negative if maxC < fillC (contraction). Throws RangeError outside validity.
 */
export function expansionFraction(fluid: FluidSpec, fillC: number, maxC: number): number {
  const rhoFill = fluidProperties(fluid, fillC).densityKgM3;
  const rhoMax = fluidProperties(fluid, maxC).densityKgM3;
  return rhoFill / rhoMax - 1;
}

/** Freezing point (°C) of the fluid at ~1 atm: water 0; glycols by volume %, see glycolFreezingPointC. */
export function freezingPointC(fluid: FluidSpec): number {
  if (fluid.kind === "water") return 0;
  return glycolFreezingPointC(fluid.kind, fluid.percentByVolume);
}

/** Where the properties of this fluid come from: the glycol tables for a mixture, not water's. */
export function fluidSource(fluid: FluidSpec): string {
  return fluid.kind === "water" ? WATER_SOURCE : GLYCOL_SOURCE;
}
