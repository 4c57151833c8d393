/**
 * Minor-loss coefficients K of the fittings a schematic pipe can count, by the
 * Crane TP-410 "K = n·fT" method (Appendix A, pp. ). K is referred to
 * the velocity in the pipe that carries the count.
 */
import { craneFt } from "./crane";

export type FittingType = "elbow" | "bend" | "teeRun" | "teeBranch" | "reducer";
export const fittingTypes: readonly FittingType[] = ["elbow", "bend", "teeRun", "teeBranch", "reducer"];

/**
 * Multiplier n in K = n·fT per fitting type (Crane TP-410 ):
 * - elbow: standard 90° (threaded) elbow, 30 fT.
 * - bend: 90° pipe bend / long-radius elbow r/d = 1.5, 14 fT (bend table, A-27).
 * - teeRun: standard tee, flow through run, 20 fT.
 * - teeBranch: standard tee, flow through branch, 60 fT.
 * The reducer is not an n·fT fitting: see REDUCER_K.
 */
export const CRANE_N: Readonly<Record<Exclude<FittingType, "reducer">, number>> = {
  elbow: 30,
  bend: 14,
  teeRun: 20,
  teeBranch: 60,
};

/** Assumed diameter ratio β = d_small/d_large of a reducer: one trade size step (e.g. 22/28 copper: 20.2/26.2 = 0.77). */
export const REDUCER_BETA = 0.75;

/**
 * Sudden contraction, Crane TP-410 A-26 (formula for θ = 180°), referred to the
 * small-pipe velocity: K = 0.5·(1 − β²). β = 0.5 → 0.375.
 */
export function suddenContractionK(beta: number): number {
  if (!(beta > 0 && beta <= 1)) throw new RangeError(`beta must be in (0, 1], got ${beta}`);
  return 0.5 * (1 - beta * beta);
}

/**
 * Sudden enlargement, Borda–Carnot, referred to the small (upstream) velocity:
 * K = (1 − β²)². β = 0.5 → 0.5625.
 */
export function suddenEnlargementK(beta: number): number {
  if (!(beta > 0 && beta <= 1)) throw new RangeError(`beta must be in (0, 1], got ${beta}`);
  return (1 - beta * beta) ** 2;
}

/**
 * K of a reducer: sudden contraction at β = REDUCER_BETA, 0.5·(1 − 0.75²) = 0.21875.
 * Chosen as an upper bound for a concentric reducer (a cone of ≤ 45° loses less:
 * Crane 0.8·sin(θ/2)·(1 − β²)); the Borda–Carnot enlargement at the same β, 0.1914,
 * is smaller, so the value also covers flow in the expanding direction.
 */
export const REDUCER_K = suddenContractionK(REDUCER_BETA);

/** K (dimensionless) of one fitting of `type` in a pipe of inner diameter `innerDiameterMm` (mm). */
export function fittingK(type: FittingType, innerDiameterMm: number): number {
  if (type === "reducer") {
    if (!(innerDiameterMm > 0)) throw new RangeError(`innerDiameterMm must be > 0, got ${innerDiameterMm}`);
    return REDUCER_K;
  }
  const n = CRANE_N[type];
  if (n === undefined) throw new RangeError(`type: unknown fitting type ${String(type)}`);
  return n * craneFt(innerDiameterMm);
}

/**
 * ΣK of a pipe's fitting counts, e.g. { elbow: 4, teeRun: 1 }. Counts must be
 * non-negative finite numbers (RangeError naming the fitting otherwise).
 */
export function sumFittingsK(fittings: Partial<Record<FittingType, number>>, innerDiameterMm: number): number {
  let sum = 0;
  // for…in rather than Object.entries: no array per pipe (thousands of pipes per calculation)
  for (const key in fittings) {
    const type = key as FittingType;
    const count = fittings[type];
    if (count === undefined || count === 0) continue;
    if (!(count > 0) || !Number.isFinite(count)) throw new RangeError(`fittings.${type} must be ≥ 0, got ${count}`);
    sum += count * fittingK(type, innerDiameterMm);
  }
  return sum;
}
