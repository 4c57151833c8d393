/**
 * Radiator (emitter) output versus water temperatures, EN 442-2:2014
 * characteristic equation Φ = K_M·ΔT^n, used relative to the nominal output:
 *   Φ = Φ50·(ΔT/ΔT_n)^n
 * with ΔT the logarithmic mean excess temperature and ΔT_n = ΔT_ln(75/65/20)
 * = 49.833 K (standard conditions t1 = 75 °C, t2 = 65 °C, t_r = 20 °C, whose
 * arithmetic excess is the "ΔT 50" of catalogues).
 */

/** ΔT_ln at the EN 442-2 standard conditions 75/65/20 °C, K. */
export const EN442_NOMINAL_LMTD_K = 10 / Math.log(55 / 45);

function finite(name: string, x: number): void {
  if (!Number.isFinite(x)) throw new RangeError(`${name} must be finite, got ${x}`);
}

/**
 * Logarithmic mean excess temperature (K), EN 442-2:
 *   ΔT_ln = (t1 − t2) / ln((t1 − t_r)/(t2 − t_r));  → t1 − t_r when t1 = t2.
 * @param flowC t1, inlet (flow) °C; @param returnC t2, outlet °C; @param roomC t_r °C.
 * Requires t1 ≥ t2 > t_r, else RangeError naming the argument.
 */
export function lmtdK(flowC: number, returnC: number, roomC: number): number {
  finite("flowC", flowC);
  finite("returnC", returnC);
  finite("roomC", roomC);
  if (!(returnC > roomC)) throw new RangeError(`returnC ${returnC} must be above roomC ${roomC}`);
  if (!(flowC >= returnC)) throw new RangeError(`flowC ${flowC} must be ≥ returnC ${returnC}`);
  const a = flowC - roomC;
  const b = returnC - roomC;
  if (a - b < 1e-9 * a) return (a + b) / 2; // limit t1 → t2 (series error < 1e-18 K)
  return (a - b) / Math.log(a / b);
}

/** Arithmetic mean excess temperature (t1 + t2)/2 − t_r, K (the catalogue "ΔT"). */
export function arithmeticExcessK(flowC: number, returnC: number, roomC: number): number {
  finite("flowC", flowC);
  finite("returnC", returnC);
  finite("roomC", roomC);
  return (flowC + returnC) / 2 - roomC;
}

export interface En442Input {
  /** Nominal output Φ50 at 75/65/20 °C, W (≥ 0). */
  outputAtDt50W: number;
  /** Radiator exponent n (EN 442 test; ≈ 1.3 panels, 1.4 convectors), 1 ≤ n ≤ 2. */
  exponentN: number;
  flowC: number;
  returnC: number;
  roomC: number;
}

function checkEmitter(outputAtDt50W: number, exponentN: number): void {
  if (!(outputAtDt50W >= 0) || !Number.isFinite(outputAtDt50W)) {
    throw new RangeError(`outputAtDt50W must be ≥ 0, got ${outputAtDt50W}`);
  }
  if (!(exponentN >= 1 && exponentN <= 2)) throw new RangeError(`exponentN must be in [1, 2], got ${exponentN}`);
}

/**
 * Output Φ (W) at flow/return/room temperatures, logarithmic method:
 *   Φ = Φ50·(ΔT_ln/49.833)^n   (EN 442-2:2014, characteristic equation).
 * 45/40/20, n 1.3 → 0.3538·Φ50. RangeError as lmtdK for t2 ≤ t_r or t1 < t2.
 */
export function en442Output(input: En442Input): number {
  checkEmitter(input.outputAtDt50W, input.exponentN);
  const dt = lmtdK(input.flowC, input.returnC, input.roomC);
  return input.outputAtDt50W * (dt / EN442_NOMINAL_LMTD_K) ** input.exponentN;
}

/** Output Φ (W), arithmetic method Φ = Φ50·(ΔT_arith/50)^n (0 when ΔT_arith ≤ 0). 45/40/20, n 1.3 → 0.3541·Φ50. */
export function en442OutputArithmetic(input: En442Input): number {
  checkEmitter(input.outputAtDt50W, input.exponentN);
  const dt = arithmeticExcessK(input.flowC, input.returnC, input.roomC);
  return dt <= 0 ? 0 : input.outputAtDt50W * (dt / 50) ** input.exponentN;
}

/** The citation shown with this formula's working. */
export const EN442_SOURCE = "EN 442-2:2014, characteristic equation Φ = Φ50·(ΔT_ln/ΔT_n)^n with the logarithmic mean excess temperature";
