import { en442Output } from "./en442";

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
 * bisection to |Δt2| < 1e-9 K. Special cases: t1 ≤ t_r or Φ50 = 0 → no output, t2 = t1;
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
  const g = (t2: number) => en442Output({ outputAtDt50W, exponentN, flowC, returnC: t2, roomC }) - capacity * (flowC - t2);
  let lo = roomC; // g → −ṁcp(t1 − t_r) < 0 as t2 → t_r
  let hi = flowC; // g = Φ(t1, t1) > 0
  for (let k = 0; k < 200 && hi - lo > 1e-9; k++) {
    const mid = (lo + hi) / 2;
    if (mid <= roomC) break;
    if (g(mid) > 0) hi = mid;
    else lo = mid;
  }
  const returnC = hi;
  return { outputW: capacity * (flowC - returnC), returnC };
}

/** Return temperature (°C) of an EN 442 emitter at a given flow — emitterAtFlow(input).returnC. */
export function en442ReturnTemperature(input: EmitterAtFlowInput): number {
  return emitterAtFlow(input).returnC;
}
