/**
 * Pump curve as points [flow m³/h, head kPa], piecewise-linear between them.
 * No extrapolation: beyond the last point the pump's head is unknown (null);
 * the maker's curve is the only source and the engine must not invent data.
 */

export type PumpCurve = [flowM3h: number, headKpa: number][];

/** Problems that make a curve unusable or suspect (empty list = fine). */
export function pumpCurveIssues(curve: PumpCurve): string[] {
  const issues: string[] = [];
  if (curve.length < 3) issues.push(`needs at least 3 points, has ${curve.length}`);
  curve.forEach(([q, h], i) => {
    if (!Number.isFinite(q) || !Number.isFinite(h)) issues.push(`point ${i} is not a pair of finite numbers`);
    else if (q < 0 || h < 0) issues.push(`point ${i} has a negative value (${q} m³/h, ${h} kPa)`);
  });
  for (let i = 1; i < curve.length; i++) {
    const [q0, h0] = curve[i - 1]!;
    const [q1, h1] = curve[i]!;
    if (!(q1 > q0)) issues.push(`flows must increase: point ${i} (${q1} m³/h) is not above point ${i - 1} (${q0} m³/h)`);
    if (h1 > h0) issues.push(`head rises with flow between points ${i - 1} and ${i} (${h0} → ${h1} kPa)`);
  }
  return issues;
}

function assertUsable(curve: PumpCurve): void {
  const issues = pumpCurveIssues(curve).filter((m) => !m.startsWith("head rises"));
  if (issues.length > 0) throw new RangeError(`curve: ${issues.join("; ")}`);
}

/**
 * Head (kPa) at flowM3h (m³/h) by linear interpolation between curve points.
 * flow 0 → the shut-off head (first point if it is at 0 flow; otherwise the
 * first point's head is held from 0 up to its flow, a flat start, documented).
 * Beyond the last point → null (no extrapolation). Negative flow → null
 * (reverse flow through a pump is outside its curve).
 * Throws RangeError (argument `curve`) when the curve has fewer than 3 points,
 * non-increasing flows or negative/non-finite values.
 */
export function pumpHeadKpa(curve: PumpCurve, flowM3h: number): number | null {
  assertUsable(curve);
  if (!Number.isFinite(flowM3h)) throw new RangeError(`flowM3h must be finite, got ${flowM3h}`);
  return pumpHeadKpaUnchecked(curve, flowM3h);
}

/**
 * pumpHeadKpa without the curve check, for the network solver, which checks
 * each curve once (sizing/laws.ts usableCurve) and then reads it per
 * iteration. Same interpolation, same value; flowM3h must be finite.
 */
export function pumpHeadKpaUnchecked(curve: PumpCurve, flowM3h: number): number | null {
  if (flowM3h < 0) return null;
  const first = curve[0]!;
  if (flowM3h <= first[0]) return first[1];
  for (let i = 1; i < curve.length; i++) {
    const [q0, h0] = curve[i - 1]!;
    const [q1, h1] = curve[i]!;
    if (flowM3h <= q1) return h0 + ((flowM3h - q0) / (q1 - q0)) * (h1 - h0);
  }
  return null;
}

/**
 * Pumps in series carry one flow and their heads add: H(Q) = Σ Hᵢ(Q) (Karassik et al.,
 * Pump Handbook, 4th ed., McGraw-Hill 2008, series operation). The combined curve has a
 * point at every flow where any of them has one, up to the smallest last flow (beyond it
 * one pump's head is unknown). Pumps of 2, 3 … at the same speed scale as one curve.
 */
export function seriesCurve(curves: readonly PumpCurve[]): PumpCurve {
  if (curves.length === 0) throw new RangeError("curves: needs at least one pump curve");
  curves.forEach(assertUsable);
  const end = Math.min(...curves.map((c) => c[c.length - 1]![0]));
  const flows = [...new Set(curves.flatMap((c) => c.map(([q]) => q)))].filter((q) => q <= end).sort((a, b) => a - b);
  return flows.map((q) => [q, curves.reduce((sum, c) => sum + pumpHeadKpaUnchecked(c, q)!, 0)]);
}

/** The citation shown where a working adds pumps in series. */
export const SERIES_SOURCE = "pumps in series: one flow, heads added (Karassik et al., Pump Handbook, 4th ed., 2008, series operation)";

/** Largest flow on the curve (m³/h): the last point's flow. */
export function maxFlowM3h(curve: PumpCurve): number {
  assertUsable(curve);
  return curve[curve.length - 1]![0];
}

export interface PumpOperatingPoint {
  flowM3h: number;
  headKpa: number;
}

/**
 * Operating point: the flow where pump head equals the system's pressure loss,
 * H_pump(Q) = Δp_sys(Q), found by bisection on [0, maxFlow] of
 * g(Q) = H_pump(Q) − Δp_sys(Q) to |ΔQ| < 1e-9·maxFlow. Returns null when the pump
 * cannot overcome the system at zero flow (g(0) < 0) or the system needs less
 * than the pump gives even at the last curve point (g(max) > 0: the flow would be
 * off the curve). systemDpKpaAtFlow must rise with flow (any static head included).
 */
export function pumpOperatingPoint(curve: PumpCurve, systemDpKpaAtFlow: (qM3h: number) => number): PumpOperatingPoint | null {
  const qMax = maxFlowM3h(curve);
  const g = (q: number): number => {
    const sys = systemDpKpaAtFlow(q);
    if (!Number.isFinite(sys)) throw new RangeError(`systemDpKpaAtFlow returned ${sys} at ${q} m³/h`);
    return pumpHeadKpa(curve, q)! - sys;
  };
  let lo = 0;
  let hi = qMax;
  const gLo = g(lo);
  const gHi = g(hi);
  if (gLo < 0) return null;
  if (gHi > 0) return null;
  if (gLo === 0) return { flowM3h: 0, headKpa: pumpHeadKpa(curve, 0)! };
  for (let k = 0; k < 200 && hi - lo > 1e-9 * qMax; k++) {
    const mid = (lo + hi) / 2;
    if (g(mid) > 0) lo = mid;
    else hi = mid;
  }
  const q = (lo + hi) / 2;
  return { flowM3h: q, headKpa: pumpHeadKpa(curve, q)! };
}

/** How the head available is read off a curve. */
export const PUMP_CURVE_SOURCE = "the maker's curve as drawn, read by linear interpolation between its points (no extrapolation)";
