/**
 * SI conversions used at the edges of the engine (results JSON, UI, CLI).
 * Inside the engine everything is SI: m, m³/s, Pa, kg/m³, Pa·s, J/(kg·K), W.
 * Plain constants by definition of the units (no library).
 */

/** Seconds per hour. */
export const S_PER_H = 3600;
/** Pascal per bar (1 bar = 1e5 Pa, by definition). */
export const PA_PER_BAR = 1e5;
/** Standard acceleration of gravity gn = 9.80665 m/s² (CGPM 1901, exact). */
export const STANDARD_GRAVITY_MPS2 = 9.80665;

export const m3hToM3s = (flowM3h: number): number => flowM3h / S_PER_H;
export const m3sToM3h = (flowM3s: number): number => flowM3s * S_PER_H;
export const lsToM3s = (flowLs: number): number => flowLs / 1000;
export const m3sToLs = (flowM3s: number): number => flowM3s * 1000;
export const lminToM3s = (flowLmin: number): number => flowLmin / 60_000;
export const m3sToLmin = (flowM3s: number): number => flowM3s * 60_000;
export const kpaToPa = (kpa: number): number => kpa * 1000;
export const paToKpa = (pa: number): number => pa / 1000;
export const barToPa = (bar: number): number => bar * PA_PER_BAR;
export const paToBar = (pa: number): number => pa / PA_PER_BAR;
export const lToM3 = (volumeL: number): number => volumeL / 1000;
export const m3ToL = (volumeM3: number): number => volumeM3 * 1000;
export const mmToM = (mm: number): number => mm / 1000;
export const mToMm = (m: number): number => m * 1000;
export const kwToW = (kw: number): number => kw * 1000;
export const wToKw = (w: number): number => w / 1000;
export const celsiusToKelvin = (tC: number): number => tC + 273.15;

/** Head of fluid (m) → pressure (Pa): p = ρ·g·h. */
export const headMToPa = (headM: number, densityKgM3: number): number =>
  headM * densityKgM3 * STANDARD_GRAVITY_MPS2;
/** Pressure (Pa) → head of fluid (m): h = p/(ρ·g). */
export const paToHeadM = (pa: number, densityKgM3: number): number =>
  pa / (densityKgM3 * STANDARD_GRAVITY_MPS2);
