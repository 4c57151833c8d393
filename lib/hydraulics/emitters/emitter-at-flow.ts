import { EN442_NOMINAL_LMTD_K, en442Output } from "./en442";

export interface EmitterAtFlowInput {
  outputAtDt50W: number;
  exponentN: number;
  /** Inlet temperature t1, °C. */
  flowC: number;
  roomC: number;
  /** Mass flow ṁ through the emitter, kg/s (≥ 0). */
  massFlowKgs: number;
  /** cp of the fluid, J/(kg·K) (> 0). */
  specificHeatJkgK: number;
}

/**
 * Output and return temperature of an EN 442 emitter at a given flow: the t2 in
 * (t_r, t1] that satisfies the heat balance
 *   Φ50·(ΔT_ln(t1, t2, t_r)/49.833)^n = ṁ·cp·(t1 − t2)
 * (defining equation Q = ṁ·cp·ΔT against the EN 442-2 characteristic). The left
 * side rises and the right side falls with t2, so the root is unique; found by
 * Newton's method safeguarded by bisection, to |Δt2| < 1e-9 K. Special cases: t1 ≤ t_r or Φ50 = 0 → no output, t2 = t1;
 * ṁ = 0 → no output, t2 = t_r (standing water cools to the room).
 * RangeError naming the field for negative ṁ, cp ≤ 0 or non-finite temperatures.
 */
export function emitterAtFlow(input: EmitterAtFlowInput): { outputW: number; returnC: number } {
  const { outputAtDt50W, exponentN, flowC, roomC, massFlowKgs, specificHeatJkgK } = input;
  if (!Number.isFinite(flowC)) throw new RangeError(`flowC must be finite, got ${flowC}`);
  if (!Number.isFinite(roomC)) throw new RangeError(`roomC must be finite, got ${roomC}`);
  if (!(massFlowKgs >= 0) || !Number.isFinite(massFlowKgs)) throw new RangeError(`massFlowKgs must be ≥ 0, got ${massFlowKgs}`);
  if (!(specificHeatJkgK > 0) || !Number.isFinite(specificHeatJkgK)) {
    throw new RangeError(`specificHeatJkgK must be > 0, got ${specificHeatJkgK}`);
  }
  if (flowC <= roomC || outputAtDt50W === 0) {
    en442Output({ outputAtDt50W, exponentN, flowC: 75, returnC: 65, roomC: 20 }); // validates Φ50 and n
    return { outputW: 0, returnC: flowC };
  }
  if (massFlowKgs === 0) return { outputW: 0, returnC: roomC };
  const capacity = massFlowKgs * specificHeatJkgK;
  // g(t2) = Φ(t1, t2) − ṁcp(t1 − t2) rises with t2. Newton (on ln(t2 − t_r)), kept inside
  // the bracket [lo, hi] that holds the root (bisection whenever a Newton step
  // would leave it), so it converges whatever the start; Φ50 and n are checked
  // once (en442Output's RangeErrors). Same root as plain bisection, ~5 steps.
  const a = flowC - roomC;
  let lo = roomC; // g → −ṁcp(t1 − t_r) < 0 as t2 → t_r
  let hi = flowC; // g = Φ(t1, t1) > 0
  let t = (lo + hi) / 2;
  if (t > roomC) en442Output({ outputAtDt50W, exponentN, flowC, returnC: t, roomC }); // validates Φ50 and n
  for (let k = 0; k < 200 && hi - lo > 1e-9; k++) {
    if (!(t > roomC)) break;
    // EN 442-2: ΔT_ln = (a − b)/ln(a/b), a = t1 − t_r, b = t2 − t_r (→ (a + b)/2 as b → a); Φ = Φ50·(ΔT_ln/49.833)^n
    const b = t - roomC;
    const near = a - b < 1e-9 * a;
    const ln = near ? 0 : Math.log(a / b);
    const dt = near ? (a + b) / 2 : (a - b) / ln;
    const phi = outputAtDt50W * (dt / EN442_NOMINAL_LMTD_K) ** exponentN;
    const gv = phi - capacity * (flowC - t);
    if (gv > 0) hi = t;
    else lo = t;
    // dΦ/dt2 = n·Φ/ΔT_ln · dΔT_ln/db, dΔT_ln/db = (ΔT_ln/b − 1)/ln(a/b) (½ in the limit)
    const dDt = near ? 0.5 : (dt / b - 1) / ln;
    const slope = (dt > 0 ? (exponentN * phi * dDt) / dt : 0) + capacity;
    // Below the root (g < 0) plain Newton on t2 goes straight in; above it,
    // towards t_r, g turns steep in b (ΔT_ln → 0 like 1/ln(a/b)) but stays
    // smooth in ln b, so the step is taken on ln b there (b stays > 0).
    let next = gv > 0 ? roomC + b * Math.exp(-gv / (slope * b)) : t - gv / slope;
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    const step = Math.abs(next - t);
    t = next;
    if (step < 1e-11) break;
  }
  // A trickle can put the root within rounding of t_r: t then lands on t_r
  // itself, and hi (> t_r, within 1e-9 K of the root) is the answer.
  const returnC = t > roomC ? t : hi;
  return { outputW: capacity * (flowC - returnC), returnC };
}

/** Return temperature (°C) of an EN 442 emitter at a given flow — emitterAtFlow(input).returnC. */
export function en442ReturnTemperature(input: EmitterAtFlowInput): number {
  return emitterAtFlow(input).returnC;
}
