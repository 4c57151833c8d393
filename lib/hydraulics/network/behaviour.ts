/**
 * Head-loss laws h(q) of network links for the gradient method, in the
 * solver's units: q in m³/h, h in kPa (loss from → to; a pump's is negative).
 * Each law writes h and its slope g = dh/dq into `out`. Laws that are not
 * smooth (check valve, dp-bypass opening, closed valve) are regularised by a
 * steep linear branch — the EPANET way of keeping a closed link in the matrix
 * (Rossman, EPANET 2.2 manual §12.2: closed links get a very large resistance).
 */
import { kvPressureDropPa } from "@/lib/hydraulics/losses";
import { pipePressureDrop } from "@/lib/hydraulics/pipes";
import { maxFlowM3h, pumpHeadKpa, type PumpCurve } from "@/lib/hydraulics/pumps/curve";
import type { Evaluate } from "./gga";

/** Resistance of an open "loss-free" link, kPa per m³/h: 1e-4 kPa at 1 m³/h, negligible. */
export const OPEN_R = 1e-4;
/** Resistance of a closed link, kPa per m³/h: leaks 1e-6 m³/h at 100 kPa — reported as 0. */
export const CLOSED_R = 1e8;
/** Flows below this are "no flow" when reporting, m³/h. */
export const NO_FLOW_M3H = 1e-5;

export const zeroLoss: Evaluate = (q, out) => {
  out[0] = OPEN_R * q;
  out[1] = OPEN_R;
};

export const closed: Evaluate = (q, out) => {
  out[0] = CLOSED_R * q;
  out[1] = CLOSED_R;
};

/** Kv device: Δp = 100·(q/Kv)²·ρ/1000 kPa (IEC 60534-1 definition of Kv). */
export function kvLaw(kv: number | null, densityKgM3: number): Evaluate {
  if (kv === null) return zeroLoss;
  const c = kvPressureDropPa(1, kv, densityKgM3) / 1000;
  return (q, out) => {
    const a = Math.abs(q);
    out[0] = c * q * a + OPEN_R * q;
    out[1] = 2 * c * a + OPEN_R;
  };
}

export interface PipeGeometry {
  innerDiameterM: number;
  roughnessM: number;
  lengthM: number;
  sumK: number;
}

/**
 * Darcy–Weisbach pipe with fittings (pipes/pressure-drop.ts). The slope uses
 * the local exponent of each part of the loss: friction ∝ q in laminar flow
 * (Hagen–Poiseuille), ≈ q^1.75…2 turbulent (Blasius … fully rough; 1.9 taken),
 * 2 in the interpolated transition zone; fittings ∝ q². An approximate slope
 * only slows Newton slightly; the heads and flows still satisfy the exact law.
 * The last evaluation is cached: on a tree, design flows repeat exactly.
 */
export function pipeLaw(geom: PipeGeometry, densityKgM3: number, kinematicViscosityM2s: number): Evaluate {
  // Below 1e-6 m³/h the flow is laminar in any catalogue pipe: h is linear there.
  const qTiny = 1e-6;
  const input = { ...geom, densityKgM3, kinematicViscosityM2s, flowM3s: 0 };
  let lastA = -1;
  let lastH = 0;
  let lastG = 0;
  return (q, out) => {
    const a = Math.max(Math.abs(q), qTiny);
    if (a !== lastA) {
      input.flowM3s = a / 3600;
      const r = pipePressureDrop(input);
      const fr = r.frictionDpPa / 1000;
      const fit = r.fittingsDpPa / 1000;
      const n = r.regime === "laminar" ? 1 : r.regime === "turbulent" ? 1.9 : 2;
      lastA = a;
      lastH = fr + fit;
      lastG = (n * fr + 2 * fit) / a + OPEN_R;
    }
    out[0] = Math.abs(q) < qTiny ? (lastH / qTiny) * q + OPEN_R * q : Math.sign(q) * lastH + OPEN_R * q;
    out[1] = lastG;
  };
}

/**
 * Pump on its curve (pumps/curve.ts, linear between points) in series with an
 * optional device law (a heat source's own exchanger). Off the curve the head
 * falls steeply past the last point and rises steeply for reverse flow — only
 * so the solver can come back; such a point is reported (pump.curve-short).
 */
export function pumpLaw(curve: PumpCurve, series: Evaluate = zeroLoss): Evaluate {
  const qMax = maxFlowM3h(curve);
  const h0 = pumpHeadKpa(curve, 0) ?? 0;
  const hMax = pumpHeadKpa(curve, qMax) ?? 0;
  const delta = Math.max(qMax * 1e-4, 1e-9);
  const steep = Math.max(h0 / Math.max(qMax, 1e-9), 1) * 10;
  const inner = new Float64Array(2);
  return (q, out) => {
    let head: number;
    let slope: number;
    if (q < 0) {
      head = h0 - steep * q;
      slope = -steep;
    } else if (q > qMax) {
      head = hMax - steep * (q - qMax);
      slope = -steep;
    } else {
      head = pumpHeadKpa(curve, q) ?? 0;
      const lo = Math.max(0, q - delta);
      const hi = Math.min(qMax, q + delta);
      slope = hi > lo ? ((pumpHeadKpa(curve, hi) ?? 0) - (pumpHeadKpa(curve, lo) ?? 0)) / (hi - lo) : 0;
    }
    series(q, inner);
    out[0] = -head + inner[0]!;
    out[1] = Math.max(-slope, 0) + inner[1]!;
  };
}

/** One-way: the inner law forward, closed against reverse flow (check valve). */
export function oneWay(inner: Evaluate): Evaluate {
  return (q, out) => {
    if (q >= 0) inner(q, out);
    else closed(q, out);
  };
}

/**
 * Differential-pressure bypass valve: shut below its opening Δp, then passing
 * flow while Δp rises only by its Kvs loss above the opening:
 *   shut:  h = CLOSED_R·q;   open: h = ±opening + Δp_Kvs(q), flow one way.
 * Handled like EPANET's pressure-regulating valves (Rossman, EPANET 2.2 manual
 * §12.2, valve status checks): the law keeps a status for this one solve and
 * switches it from the iterate — a shut valve whose leak flow implies
 * |Δp| > opening opens in that direction; an open one whose flow reverses
 * shuts. After a few switches the status is frozen so it cannot cycle.
 * Symmetric, so the drawn direction does not matter. Build one per solve.
 */
export function bypassLaw(openingKpa: number, kvs: number, densityKgM3: number): Evaluate {
  const c = kvPressureDropPa(1, kvs, densityKgM3) / 1000;
  let dir = 0; // 0 shut, ±1 open in that direction
  let switches = 0;
  return (q, out) => {
    if (switches < 8) {
      if (dir === 0 && Math.abs(q) * CLOSED_R > openingKpa) {
        dir = Math.sign(q);
        switches++;
      } else if (dir !== 0 && q * dir < 0) {
        dir = 0;
        switches++;
      }
    }
    if (dir === 0) {
      out[0] = CLOSED_R * q;
      out[1] = CLOSED_R;
      return;
    }
    const a = Math.abs(q);
    out[0] = dir * openingKpa + c * q * a + OPEN_R * q;
    out[1] = 2 * c * a + OPEN_R;
  };
}
