/**
 * Numbers of side by side as people read them: flows and pressures in the user's display
 * units (lib/units/display.ts), the rest with a fixed unit; differences signed.
 */
import { convertFlow, convertPressure, showFlow, showPressure, unitLabels, type UnitPrefs } from "@/lib/units/display";
import type { Quantity } from "@/lib/compare/rows";

const fixed: Record<Exclude<Quantity, "flow" | "pressure">, { unit: string; decimals: number }> = {
  volume: { unit: "L", decimals: 1 }, velocity: { unit: "m/s", decimals: 2 }, power: { unit: "W", decimals: 0 },
  length: { unit: "m", decimals: 1 }, count: { unit: "", decimals: 0 },
};

const withUnit = (value: string, unit: string) => (unit ? `${value} ${unit}` : value);

export function formatValue(q: Quantity, v: number | null, prefs: UnitPrefs, densityKgM3: number | null): string {
  if (v === null) return "—";
  if (q === "flow") return showFlow(v, prefs).text;
  if (q === "pressure") return showPressure(v, prefs, densityKgM3).text;
  const f = fixed[q];
  return withUnit(v.toLocaleString("en-GB", { minimumFractionDigits: f.decimals, maximumFractionDigits: f.decimals }), f.unit);
}

/** b − a, signed ("+4.2 L", "−0.35 kPa", "0 W" when equal at the shown precision). */
export function formatDiff(q: Quantity, d: number | null, prefs: UnitPrefs, densityKgM3: number | null): string {
  if (d === null) return "—";
  let value: number;
  let unit: string;
  let decimals: number;
  if (q === "flow") [value, unit, decimals] = [convertFlow(d, prefs.flow), unitLabels[prefs.flow], prefs.flow === "l/min" ? 1 : 3];
  else if (q === "pressure") [value, unit, decimals] = [convertPressure(d, prefs.pressure, densityKgM3), unitLabels[prefs.pressure], prefs.pressure === "bar" ? 3 : 2];
  else [value, unit, decimals] = [d, fixed[q].unit, fixed[q].decimals];
  const shown = Math.abs(value).toLocaleString("en-GB", { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
  const zero = Number(shown.replace(/,/g, "")) === 0;
  return withUnit(`${zero ? "" : value > 0 ? "+" : "−"}${shown}`, unit);
}
