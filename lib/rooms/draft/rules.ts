/**
 * The rules a first draft is drawn by. None of these is a calculation result:
 * they are starting values a designer replaces with measured ones, each marked
 * as common practice (a trade rule of thumb, no single authoritative source).
 *
 * Pipe lengths (m), the stated estimate:
 * - heat source to its isolation valves: 3 m each way (an outdoor unit or a
 *   boiler on the other side of a wall);
 * - between parts on a plant-room main: 0.5 m; accessory legs (air vent,
 *   safety valve, drain cock): 0.3 m; the expansion-vessel leg: 1 m;
 * - between zone take-offs on the mains, and plant to the first zone: 1 m;
 * - zone valve to the zone's first emitter: 5 m (the run out to the rooms);
 * - between two emitters of a zone: √(floor area of the room before) + 1 m,
 *   about the room's width plus a wall; 4 m when the floor area is not known;
 * - each emitter's tails: 1.5 m; run end to its air vent or drain cock: 0.5 m;
 * - hot-water cylinder coil: 2.5 m each way.
 * Return pipes mirror their flow pipes.
 *
 * Underfloor loops: length = floor area / 0.15 m spacing + 2 × 5 m leads,
 * at most 100 m per loop (16 mm pipe), so a larger floor gets more loops.
 */
export const LENGTH = {
  sourceLeg: 3,
  plant: 0.5,
  accessory: 0.3,
  vesselLeg: 1,
  main: 1,
  zoneRun: 5,
  defaultRoomRun: 4,
  tail: 1.5,
  runEnd: 0.5,
  coil: 2.5,
} as const;

export const roomRunM = (floorAreaM2: number | null) => (floorAreaM2 ? Math.round((Math.sqrt(floorAreaM2) + 1) * 10) / 10 : LENGTH.defaultRoomRun);

export const UFH = { spacingM: 0.15, leadM: 5, maxLoopM: 100 } as const;

/** Loops a floor needs and each loop's length (rule above). */
export function ufhLoops(floorAreaM2: number): { count: number; loopLengthM: number } {
  const total = floorAreaM2 / UFH.spacingM;
  const count = Math.max(1, Math.ceil(total / (UFH.maxLoopM - 2 * UFH.leadM)));
  return { count, loopLengthM: Math.round((total / count + 2 * UFH.leadM) * 10) / 10 };
}

/** Kv/Kvs steps valves are sold in (the Renard-like series of valve makers' lists). */
export const KV_SERIES = [0.63, 1, 1.6, 2.5, 4, 6.3, 10, 16, 25, 40, 63, 100, 160, 250] as const;

/**
 * The smallest Kv of the series whose pressure drop at flow q (m³/h) stays
 * within maxKpa: Δp = (q/Kv)² bar (IEC 60534 Kv definition) → Kv ≥ q·√(100/maxKpa).
 * Limits used: isolation valves 1 kPa, filter 3 kPa, zone and diverter valves
 * 5 kPa, cylinder coil and bypass 10 kPa.
 */
export function kvFor(flowM3h: number, maxKpa: number): number {
  const need = Math.max(flowM3h, 0.05) * Math.sqrt(100 / maxKpa);
  return KV_SERIES.find((k) => k >= need) ?? KV_SERIES[KV_SERIES.length - 1]!;
}
export const DP_LIMIT_KPA = { isolation: 1, filter: 3, zoneValve: 5, diverter: 5, coil: 10, bypass: 10 } as const;

/** Nominal sizes of expansion vessels as sold, L. */
export const VESSEL_SERIES_L = [8, 12, 18, 25, 35, 50, 80, 100, 140, 200, 300, 500, 800, 1000] as const;
/** Buffer vessel sizes, L. */
export const BUFFER_SERIES_L = [25, 40, 50, 80, 100, 150, 200, 300, 500, 800, 1000] as const;
/** Buffer volume: 10 L per kW of heat source (run time and defrost), or the source's stated minimum. */
export const BUFFER_L_PER_KW = 10;

export const nextInSeries = (series: readonly number[], need: number) => series.find((s) => s >= need) ?? series[series.length - 1]!;

/**
 * A circulator curve for a duty: H(q) = H0·(1 − (q/q_max)²) with the duty at
 * most half way along (q_max = 2·q) and 20 % head margin there
 * (H0 = 1.6·required, since H(q_max/2) = 0.75·H0). Points [m³/h, kPa].
 */
export function pumpCurveFor(flowM3h: number, requiredKpa: number): [number, number][] {
  const qMax = Math.max(0.5, Math.ceil(2 * flowM3h * 10) / 10);
  const h0 = Math.max(20, Math.ceil((1.6 * requiredKpa) / 5) * 5);
  return [0, 0.25, 0.5, 0.75, 1].map((f) => [Math.round(f * qMax * 1000) / 1000, Math.round(h0 * (1 - f * f) * 10) / 10]);
}

/** Highest flow temperature for hot water (vessel sizing, reheat): heat pump 65 °C, boiler 75 °C. */
export const HOT_WATER_FLOW_C = { "heat-pump": 65, boiler: 75 } as const;
/** Cold fill: pre-charge + 0.3 bar (references.md §8.1, German practice). */
export const FILL_ABOVE_PRECHARGE_BAR = 0.3;
