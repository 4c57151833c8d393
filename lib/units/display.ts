/**
 * Display units chosen per user. The document and results stay SI-ish as the
 * contract stores them (flow m³/h, pressure kPa); only what is shown changes.
 * Conversions go through mathjs units so each factor comes from the unit
 * definitions, not from hand-typed constants:
 * - 1 bar = 100 kPa exactly (BIPM, The International System of Units, 9th ed.
 *   2019, Table 8: non-SI units, bar = 0.1 MPa).
 * - metres of head: h = p / (ρ·g) with ρ the circulating fluid's density from
 *   results.fluid and g = gn = 9.80665 m/s², the standard acceleration of gravity
 *   (3rd CGPM 1901; SI Brochure 9th ed., 2019). Without a density we fall back to
 *   1000 kg/m³, the conventional water column (mathjs `cmH2O` = 98.0665 Pa).
 */
// Only the unit machinery of mathjs (its factory API), not the whole library: this
// module runs in the browser too, on every board and report.
import { create, divideDependencies, multiplyDependencies, unitDependencies, type Unit } from "mathjs";
import { z } from "zod";
import { STANDARD_GRAVITY_MPS2 } from "@/lib/hydraulics/units";

export const flowUnits = ["m3/h", "l/s", "l/min"] as const;
export const pressureUnits = ["kPa", "bar", "m"] as const;
export type FlowUnit = (typeof flowUnits)[number];
export type PressureUnit = (typeof pressureUnits)[number];

export const unitPrefsSchema = z.object({
  flow: z.enum(flowUnits).default("m3/h"),
  pressure: z.enum(pressureUnits).default("kPa"),
});
export type UnitPrefs = z.output<typeof unitPrefsSchema>;
export const defaultUnitPrefs: UnitPrefs = { flow: "m3/h", pressure: "kPa" };

/** Labels as written for people (the option values above are ASCII for storage). */
export const unitLabels: Record<FlowUnit | PressureUnit, string> = {
  "m3/h": "m³/h", "l/s": "l/s", "l/min": "l/min", kPa: "kPa", bar: "bar", m: "m head",
};

const { unit, divide, multiply } = create({ unitDependencies: unitDependencies!, multiplyDependencies: multiplyDependencies!, divideDependencies: divideDependencies! });

const mathjsFlow: Record<FlowUnit, string> = { "m3/h": "m^3/h", "l/s": "L/s", "l/min": "L/min" };
const CONVENTIONAL_WATER_DENSITY = 1000; // kg/m³

export function convertFlow(flowM3h: number, to: FlowUnit): number {
  return unit(flowM3h, "m^3/h").toNumber(mathjsFlow[to]);
}

export function convertPressure(pressureKpa: number, to: PressureUnit, densityKgM3?: number | null): number {
  if (to !== "m") return unit(pressureKpa, "kPa").toNumber(to);
  const rho = unit(densityKgM3 ?? CONVENTIONAL_WATER_DENSITY, "kg/m^3");
  const weight = multiply(rho, unit(STANDARD_GRAVITY_MPS2, "m/s^2"));
  return (divide(unit(pressureKpa, "kPa"), weight) as unknown as Unit).toNumber("m");
}

/** A flow read in `from` back to m³/h (the inverse of convertFlow). */
export function flowToM3h(value: number, from: FlowUnit): number {
  return unit(value, mathjsFlow[from]).toNumber("m^3/h");
}

/** A pressure read in `from` back to kPa (the inverse of convertPressure; metres of head through ρ·g). */
export function pressureToKpa(value: number, from: PressureUnit, densityKgM3?: number | null): number {
  if (from !== "m") return unit(value, from).toNumber("kPa");
  const rho = unit(densityKgM3 ?? CONVENTIONAL_WATER_DENSITY, "kg/m^3");
  return (multiply(multiply(rho, unit(STANDARD_GRAVITY_MPS2, "m/s^2")), unit(value, "m")) as unknown as Unit).toNumber("kPa");
}

// Decimals sized to what a designer can read off a gauge or a meter, per unit.
const decimals: Record<FlowUnit | PressureUnit, number> = { "m3/h": 3, "l/s": 3, "l/min": 1, kPa: 2, bar: 3, m: 2 };

export interface Shown { value: string; unit: string; text: string }

function show(n: number | null | undefined, u: FlowUnit | PressureUnit, convert: (v: number) => number): Shown {
  const label = unitLabels[u];
  if (n === null || n === undefined || !Number.isFinite(n)) return { value: "—", unit: label, text: "—" };
  // "-0.000" reads as a reverse flow; a value that rounds to zero is shown as plain zero.
  const value = convert(n).toFixed(decimals[u]).replace(/^-(?=0(\.0*)?$)/, "");
  return { value, unit: label, text: `${value} ${label}` };
}

export const showFlow = (flowM3h: number | null | undefined, prefs: UnitPrefs): Shown =>
  show(flowM3h, prefs.flow, (v) => convertFlow(v, prefs.flow));

export const showPressure = (kpa: number | null | undefined, prefs: UnitPrefs, densityKgM3?: number | null): Shown =>
  show(kpa, prefs.pressure, (v) => convertPressure(v, prefs.pressure, densityKgM3));

/** Read a users.preferences jsonb value; anything unknown falls back to SI defaults. */
export function unitPrefsFrom(preferences: unknown): UnitPrefs {
  const units = (preferences as { units?: unknown } | null)?.units;
  const parsed = unitPrefsSchema.safeParse(units ?? {});
  return parsed.success ? parsed.data : defaultUnitPrefs;
}
