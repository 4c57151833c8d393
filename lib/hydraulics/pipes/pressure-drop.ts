import { darcyF as darcyFImport, flowRegimeOf, RE_LAMINAR_MAX as laminarMax, type FlowRegime } from "../friction/darcy";

// Used per pipe per solver iteration: bound once at load (friction/darcy.ts says why).
const darcyF = darcyFImport;
const RE_LAMINAR_MAX = laminarMax;

export interface PipePressureDropInput {
  /** Volume flow Q, m³/s; sign = direction (from → to). */
  flowM3s: number;
  /** Inner diameter D, m (> 0). */
  innerDiameterM: number;
  /** Length L, m (≥ 0). */
  lengthM: number;
  /** Absolute roughness ε, m (≥ 0). */
  roughnessM: number;
  /** Density ρ, kg/m³ (> 0). */
  densityKgM3: number;
  /** Kinematic viscosity ν, m²/s (> 0). */
  kinematicViscosityM2s: number;
  /** Sum of minor-loss coefficients ΣK (≥ 0), referred to this pipe's velocity. */
  sumK: number;
}

export interface PipePressureDrop {
  /** Mean velocity v = Q/A, m/s, signed like the flow. */
  velocityMps: number;
  reynolds: number;
  frictionFactor: number;
  regime: FlowRegime;
  /** f·(L/D)·ρv²/2, Pa, signed like the flow. */
  frictionDpPa: number;
  /** ΣK·ρv²/2, Pa, signed like the flow. */
  fittingsDpPa: number;
  /** frictionDpPa + fittingsDpPa, Pa, signed like the flow. */
  dpPa: number;
  /** Friction gradient R = f·ρv²/(2D), Pa/m, always ≥ 0 (straight pipe only, no fittings). */
  gradientPaPerM: number;
}

function positive(name: string, x: number, allowZero: boolean): void {
  const ok = Number.isFinite(x) && (allowZero ? x >= 0 : x > 0);
  if (!ok) throw new RangeError(`${name} must be ${allowZero ? "≥ 0" : "> 0"} and finite, got ${x}`);
}

/**
 * Pressure drop in a straight pipe with fittings, Darcy–Weisbach (Weisbach 1845,
 * Darcy 1857; e.g. White, Fluid Mechanics, eq. 6.10):
 *   Δp = (f·L/D + ΣK)·ρ·v²/2,  v = Q/(πD²/4),  Re = |v|·D/ν,
 * f from darcyFrictionFactor (laminar / transition / Colebrook). Δp carries the
 * sign of Q (Δp = p_from − p_to). Q = 0 gives all zeros. Throws RangeError naming
 * the field for a non-finite flow, D, ν or ρ ≤ 0, or L, ε, ΣK < 0.
 */
export function pipePressureDrop(input: PipePressureDropInput): PipePressureDrop {
  const { flowM3s, innerDiameterM, lengthM, roughnessM, densityKgM3, kinematicViscosityM2s, sumK } = input;
  if (!Number.isFinite(flowM3s)) throw new RangeError(`flowM3s must be finite, got ${flowM3s}`);
  positive("innerDiameterM", innerDiameterM, false);
  positive("lengthM", lengthM, true);
  positive("roughnessM", roughnessM, true);
  positive("densityKgM3", densityKgM3, false);
  positive("kinematicViscosityM2s", kinematicViscosityM2s, false);
  positive("sumK", sumK, true);
  if (!(roughnessM < innerDiameterM)) throw new RangeError(`roughnessM ${roughnessM} must be below innerDiameterM ${innerDiameterM}`);
  const out = dropScratch; // filled and read before returning: no state survives the call
  pipeDropInto(flowM3s, innerDiameterM, (Math.PI * innerDiameterM * innerDiameterM) / 4, lengthM, roughnessM / innerDiameterM, densityKgM3, kinematicViscosityM2s, sumK, out);
  // As darcyFrictionFactor: Re must be finite (a flow near the float limit overflows it).
  if (!Number.isFinite(out[2]!)) throw new RangeError(`re must be ≥ 0 and finite, got ${out[2]}`);
  const frictionDpPa = out[0]!;
  const fittingsDpPa = out[1]!;
  return {
    velocityMps: out[4]!,
    reynolds: out[2]!,
    frictionFactor: out[3]!,
    regime: flowRegimeOf(out[2]!),
    frictionDpPa,
    fittingsDpPa,
    dpPa: frictionDpPa + fittingsDpPa,
    gradientPaPerM: out[5]!,
  };
}

/** Length of the array pipeDropInto writes. */
export const PIPE_DROP_SLOTS = 6;
const dropScratch = new Float64Array(PIPE_DROP_SLOTS);

/**
 * The arithmetic of pipePressureDrop without its argument checks and without
 * allocating: for the network solver and the per-pipe results, which validate
 * each pipe's geometry once per calculation (sizing/context.ts) and call this
 * per link per iteration. Writes into out:
 *   [0] frictionDpPa, [1] fittingsDpPa, [2] Re, [3] f, [4] velocity m/s, [5] gradient Pa/m
 * (regime = flowRegimeOf(Re)). Same formulas, same operation order as
 * pipePressureDrop — Darcy–Weisbach Δp = (f·L/D + ΣK)·ρ·v²/2, v = Q/A,
 * Re = |v|·D/ν, laminar R = 32·ρ·ν·|v|/D² (Hagen–Poiseuille) — so the same
 * numbers to the last bit. areaM2 = πD²/4 and relRoughness = ε/D are the
 * caller's per-pipe constants; guessX (optional, > 0) starts Colebrook's
 * Newton at a previous 1/√f of the same pipe, anchorF (optional, > 0) is the
 * pipe's transitionAnchorF (darcyF).
 */
export function pipeDropInto(
  flowM3s: number,
  innerDiameterM: number,
  areaM2: number,
  lengthM: number,
  relRoughness: number,
  densityKgM3: number,
  kinematicViscosityM2s: number,
  sumK: number,
  out: Float64Array,
  guessX = 0,
  anchorF = 0,
): void {
  const velocityMps = flowM3s / areaM2;
  const re = (Math.abs(velocityMps) * innerDiameterM) / kinematicViscosityM2s;
  const f = darcyF(re, relRoughness, guessX, anchorF);
  const dynamicPressurePa = (densityKgM3 * velocityMps * velocityMps) / 2;
  const sign = Math.sign(flowM3s);
  // Laminar: Hagen–Poiseuille R = 32·ρ·ν·|v|/D² — the same as f·ρv²/(2D) with f = 64/Re, but
  // free of the Infinity·0 that 64/Re · v² would give for a vanishing flow.
  const gradientPaPerM =
    re < RE_LAMINAR_MAX
      ? (32 * densityKgM3 * kinematicViscosityM2s * Math.abs(velocityMps)) / (innerDiameterM * innerDiameterM)
      : (f * dynamicPressurePa) / innerDiameterM;
  out[0] = sign * gradientPaPerM * lengthM;
  out[1] = sign * sumK * dynamicPressurePa;
  out[2] = re;
  out[3] = f;
  out[4] = velocityMps;
  out[5] = gradientPaPerM;
}

/**
 * d(Δp)/dQ (Pa per m³/s) of pipePressureDrop at input.flowM3s, for a Newton
 * network solver. Numerical central difference with step h = max(1e-6·|Q|, 1e-12 m³/s).
 * Δp(Q) is odd and increasing, so the result is ≥ 0; at Q = 0 it tends to the
 * laminar slope 128·μ·L/(π·D⁴) (Hagen–Poiseuille), which is 0 for L = 0 — a
 * solver must then regularise (e.g. a small floor on the derivative).
 */
export function pipeDpDerivative(input: PipePressureDropInput): number {
  const q = input.flowM3s;
  const h = Math.max(1e-6 * Math.abs(q), 1e-12);
  const up = pipePressureDrop({ ...input, flowM3s: q + h }).dpPa;
  const down = pipePressureDrop({ ...input, flowM3s: q - h }).dpPa;
  return Math.max(0, (up - down) / (2 * h));
}

/** The citation shown with this formula's working. */
export const DARCY_WEISBACH_SOURCE = "Darcy–Weisbach equation Δp = (f·L/d + ΣK)·ρv²/2 (e.g. F. M. White, Fluid Mechanics, ch. 6)";
