/**
 * The EN 442-2 characteristic Φ = Φ50·(ΔT_ln/ΔT_n)^n solved the other way
 * round, in closed form (no stepping, no iteration):
 *
 * - the rating an emitter needs: Φ50 = Φ / (ΔT_ln/ΔT_n)^n;
 * - the lowest flow temperature t1 at which a rated emitter gives Φ when the
 *   return is t2 = t1 − Δt (a fixed design temperature drop Δt). The needed
 *   log-mean excess is ΔT* = ΔT_n·(Φ/Φ50)^(1/n); with a = t1 − t_r and
 *   b = a − Δt, ΔT_ln = Δt / ln(a/b) = ΔT* gives a/b = e^(Δt/ΔT*), so
 *       a = Δt / (1 − e^(−Δt/ΔT*)),   t1 = t_r + a
 *   (→ t_r + ΔT* as Δt → 0, the limit of the log mean). ΔT_ln rises
 *   monotonically with t1 at fixed Δt, so this is the one root.
 *
 * Source: EN 442-2:2014 characteristic equation and logarithmic mean excess
 * temperature, as in ./en442.ts (ΔT_n = 49.833 K at 75/65/20 °C).
 */
import { EN442_NOMINAL_LMTD_K, lmtdK } from "./en442";

function positive(name: string, x: number): void {
  if (!(x > 0) || !Number.isFinite(x)) throw new RangeError(`${name} must be > 0, got ${x}`);
}
function exponent(n: number): void {
  if (!(n >= 1 && n <= 2)) throw new RangeError(`exponentN must be in [1, 2], got ${n}`);
}

/**
 * Nominal output Φ50 (W, at 75/65/20 °C) an emitter needs to give `outputW` at
 * flow/return/room °C. RangeError (from lmtdK) when the return is not above the room.
 */
export function en442RatingForOutput(input: { outputW: number; exponentN: number; flowC: number; returnC: number; roomC: number }): number {
  positive("outputW", input.outputW);
  exponent(input.exponentN);
  const dt = lmtdK(input.flowC, input.returnC, input.roomC);
  return input.outputW / (dt / EN442_NOMINAL_LMTD_K) ** input.exponentN;
}

/**
 * Lowest flow temperature t1 (°C) at which an emitter rated Φ50 gives
 * `outputW` with the return at t1 − deltaTK, in a room at roomC (closed form above).
 */
export function en442FlowTemperatureForOutput(input: {
  outputW: number;
  outputAtDt50W: number;
  exponentN: number;
  deltaTK: number;
  roomC: number;
}): number {
  positive("outputW", input.outputW);
  positive("outputAtDt50W", input.outputAtDt50W);
  positive("deltaTK", input.deltaTK);
  exponent(input.exponentN);
  if (!Number.isFinite(input.roomC)) throw new RangeError(`roomC must be finite, got ${input.roomC}`);
  const needK = EN442_NOMINAL_LMTD_K * (input.outputW / input.outputAtDt50W) ** (1 / input.exponentN);
  // a = Δt/(1 − e^(−Δt/ΔT*)); expm1 keeps it exact when Δt ≪ ΔT*.
  const a = input.deltaTK / -Math.expm1(-input.deltaTK / needK);
  return input.roomC + a;
}
