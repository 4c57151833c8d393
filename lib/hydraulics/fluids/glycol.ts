/**
 * Propylene- and ethylene-glycol/water mixtures, concentration in VOLUME percent
 * of glycol (not mass percent: 20 % vol PG ≈ 20.6 % mass, 20 % vol EG ≈ 22 % mass).
 *
 * Method: tables of glycol-tables.ts (ASHRAE Handbook—Fundamentals 2001 ch. 21,
 * via the ASHRAE-2001 fits APG/AEG), 10–50 % vol, −10…90 °C in 10 K steps,
 * with IAPWS water (water.ts) as the 0 % row. Interpolation: linear in
 * temperature within a row, then linear in concentration between rows; the
 * viscosity is interpolated in ln μ (it varies exponentially with both).
 * Validity (data, see glycolValidity): 0 ≤ % vol ≤ 50, −10 ≤ t ≤ 90 °C, every
 * table cell used must hold liquid (tables start at 0 °C below 30 % vol) and
 * t must be above the mixture's freezing point.
 */
import {
  ethyleneGlycolByVolume,
  GLYCOL_TABLE_PERCENTS,
  GLYCOL_TABLE_TEMPS_C,
  propyleneGlycolByVolume,
  type GlycolDataset,
  type GlycolTable,
} from "./glycol-tables";
import { waterDensityKgM3, waterDynamicViscosityPas, waterSpecificHeatJkgK } from "./water";

export type GlycolKind = "propylene-glycol" | "ethylene-glycol";
export const GLYCOL_MAX_PERCENT_BY_VOLUME = 50;
export const GLYCOL_MIN_C = -10;
export const GLYCOL_MAX_C = 90;

const PERCENT_GRID = [0, ...GLYCOL_TABLE_PERCENTS] as const;

function dataset(kind: GlycolKind): GlycolDataset {
  return kind === "propylene-glycol" ? propyleneGlycolByVolume : ethyleneGlycolByVolume;
}

/** Index i with grid[i] ≤ x < grid[i+1] (last interval for x = last node; grid ascending, x inside). */
function bracket(grid: readonly number[], x: number): number {
  for (let i = 0; i < grid.length - 2; i++) if (x < grid[i + 1]!) return i;
  return grid.length - 2;
}

/** a + w·(b − a), skipping a side whose weight is 0 (so a node needs only its own cell). */
function lerp(a: number | null, b: number | null, w: number): number | null {
  if (w === 0) return a;
  if (w === 1) return b;
  return a == null || b == null ? null : a + w * (b - a);
}

function checkPercent(percentByVolume: number): void {
  if (!(percentByVolume >= 0 && percentByVolume <= GLYCOL_MAX_PERCENT_BY_VOLUME)) {
    throw new RangeError(`percentByVolume ${percentByVolume} outside 0–${GLYCOL_MAX_PERCENT_BY_VOLUME} % vol`);
  }
}

/**
 * Freezing point (°C) of the mixture: linear interpolation in the dataset's
 * freezing-point column (0/10/…/50 % vol). ASHRAE-2001 fits; Lange's Handbook
 * (15th ed., Table 5.13) gives PG 20/30/40 % vol −6.7/−12.8/−20.6 °C, within ~1 K.
 */
export function glycolFreezingPointC(kind: GlycolKind, percentByVolume: number): number {
  checkPercent(percentByVolume);
  const fp = dataset(kind).freezingPointC;
  const i = bracket(PERCENT_GRID, percentByVolume);
  const x0 = PERCENT_GRID[i]!;
  const x1 = PERCENT_GRID[i + 1]!;
  const w = (percentByVolume - x0) / (x1 - x0);
  return fp[i]! + w * (fp[i + 1]! - fp[i]!);
}

type Row = (tC: number) => number | null;

function tableRow(table: GlycolTable, rowIndex: number): Row {
  const row = table[rowIndex]!;
  return (tC) => {
    const j = bracket(GLYCOL_TABLE_TEMPS_C, tC);
    const t0 = GLYCOL_TABLE_TEMPS_C[j]!;
    const w = (tC - t0) / (GLYCOL_TABLE_TEMPS_C[j + 1]! - t0);
    return lerp(row[j] ?? null, row[j + 1] ?? null, w);
  };
}

const inWaterRange = (f: (tC: number) => number): Row => (tC) => (tC >= 0 ? f(tC) : null);

function interpolate(rows: (pctIndex: number) => Row, percent: number, tC: number, log: boolean): number | null {
  const i = bracket(PERCENT_GRID, percent);
  const x0 = PERCENT_GRID[i]!;
  const w = (percent - x0) / (PERCENT_GRID[i + 1]! - x0);
  const a = w === 1 ? null : rows(i)(tC);
  const b = w === 0 ? null : rows(i + 1)(tC);
  if (!log) return lerp(a, b, w);
  const r = lerp(a == null ? null : Math.log(a), b == null ? null : Math.log(b), w);
  return r == null ? null : Math.exp(r);
}

export interface GlycolProperties {
  densityKgM3: number;
  specificHeatJkgK: number;
  dynamicViscosityPas: number;
}

function evaluate(kind: GlycolKind, percent: number, tC: number): GlycolProperties | null {
  const d = dataset(kind);
  const rho = interpolate((i) => (i === 0 ? inWaterRange(waterDensityKgM3) : tableRow(d.densityKgM3, i - 1)), percent, tC, false);
  const cp = interpolate((i) => (i === 0 ? inWaterRange(waterSpecificHeatJkgK) : tableRow(d.specificHeatJkgK, i - 1)), percent, tC, false);
  const mu = interpolate(
    (i) => (i === 0 ? inWaterRange((t) => waterDynamicViscosityPas(t) * 1000) : tableRow(d.viscosityMpas, i - 1)),
    percent,
    tC,
    true,
  );
  if (rho == null || cp == null || mu == null) return null;
  return { densityKgM3: rho, specificHeatJkgK: cp, dynamicViscosityPas: mu / 1000 };
}

/** Whether the tables cover (kind, percentByVolume, tC); message says why not. */
export function glycolValidity(kind: GlycolKind, percentByVolume: number, tC: number): { ok: boolean; message?: string } {
  if (!(percentByVolume >= 0 && percentByVolume <= GLYCOL_MAX_PERCENT_BY_VOLUME)) {
    return { ok: false, message: `${kind} ${percentByVolume} % vol is outside the tabulated 0–${GLYCOL_MAX_PERCENT_BY_VOLUME} % vol` };
  }
  if (!(tC >= GLYCOL_MIN_C && tC <= GLYCOL_MAX_C)) {
    return { ok: false, message: `${kind} properties are tabulated for ${GLYCOL_MIN_C}–${GLYCOL_MAX_C} °C, not ${tC} °C` };
  }
  const fp = glycolFreezingPointC(kind, percentByVolume);
  if (tC <= fp) return { ok: false, message: `${tC} °C is at or below the freezing point ${fp.toFixed(1)} °C of ${kind} ${percentByVolume} % vol` };
  if (evaluate(kind, percentByVolume, tC) == null) {
    return { ok: false, message: `${kind} ${percentByVolume} % vol at ${tC} °C needs table cells below their freezing point (tables start at 0 °C below 30 % vol)` };
  }
  return { ok: true };
}

/** ρ (kg/m³), cp (J/(kg·K)), μ (Pa·s) of the mixture; RangeError (with the validity message) outside validity. */
export function glycolProperties(kind: GlycolKind, percentByVolume: number, tC: number): GlycolProperties {
  const v = glycolValidity(kind, percentByVolume, tC);
  const p = v.ok ? evaluate(kind, percentByVolume, tC) : null;
  if (p == null) throw new RangeError(v.message ?? `tC ${tC} outside glycol table`);
  return p;
}
