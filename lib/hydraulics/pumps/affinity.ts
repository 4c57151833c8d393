/**
 * Pump affinity laws for one impeller at speed ratio n = N2/N1:
 *   Q2 = n·Q1,  H2 = n²·H1  (P2 = n³·P1)
 * — the pump affinity laws as given in L. Bachus & A. Custodio, "Know and
 * Understand Centrifugal Pumps" (Elsevier, 2003), p. 114 (references.md §11,
 * confirmed in search; also Çengel & Cimbala, Fluid Mechanics, ch. 14, from
 * memory). So the curve drawn
 * at full speed, H(Q), becomes H_n(Q) = n²·H(Q/n) at speed n.
 *
 * In a closed heating circuit the system curve passes through the origin
 * (Δp ∝ Q², no static head), so a pump slowed until its curve passes through
 * the design point (Q_d, H_req) delivers exactly the design flow.
 */
import { pumpHeadKpa, type PumpCurve } from "./curve";

/**
 * A pump whose available head exceeds the required by more than this fraction
 * is oversized (sizing/pumps.ts): common practice, not a standard value.
 */
export const PUMP_OVERSIZE_MARGIN = 0.25;

/** Head (kPa) of the curve drawn when run at speed fraction n: n²·H(q/n); null off the curve. */
export function headAtSpeedKpa(curve: PumpCurve, speedFraction: number, flowM3h: number): number | null {
  if (!(speedFraction > 0)) throw new RangeError(`speedFraction must be > 0, got ${speedFraction}`);
  const h = pumpHeadKpa(curve, flowM3h / speedFraction);
  return h === null ? null : speedFraction * speedFraction * h;
}

/**
 * The speed fraction n ∈ (0, 1] at which the curve drawn passes through
 * (flowM3h, headKpa): n²·H(Q/n) = H_req, by bisection (n²·H(Q/n) rises with n
 * for a curve whose head does not rise with flow). Null when the full-speed
 * curve gives less than headKpa there (the pump is too small, not too big) or
 * the slowed curve would leave the points drawn before meeting the duty.
 */
export function affinitySpeedFraction(curve: PumpCurve, flowM3h: number, headKpa: number): number | null {
  if (!(flowM3h >= 0) || !(headKpa > 0) || !Number.isFinite(flowM3h) || !Number.isFinite(headKpa)) return null;
  const full = pumpHeadKpa(curve, flowM3h);
  if (full === null || full < headKpa) return null;
  const qMax = curve[curve.length - 1]![0];
  // At flow 0 the law reduces to n²·H(0) = H_req.
  if (flowM3h === 0) return Math.sqrt(headKpa / full);
  let lo = flowM3h / qMax; // slower than this the duty flow is beyond the last point drawn
  const atLo = headAtSpeedKpa(curve, lo, flowM3h);
  if (atLo === null || atLo > headKpa) return null;
  let hi = 1;
  for (let i = 0; i < 100 && hi - lo > 1e-12; i++) {
    const mid = (lo + hi) / 2;
    if (headAtSpeedKpa(curve, mid, flowM3h)! < headKpa) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/** The citation shown with the pump-setting working. */
export const AFFINITY_SOURCE = "pump affinity laws Q ∝ n, H ∝ n² (Bachus & Custodio, Know and Understand Centrifugal Pumps, 2003, p. 114)";
