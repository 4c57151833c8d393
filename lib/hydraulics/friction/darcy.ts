import { colebrook, colebrookUnchecked as colebrookUncheckedImport, laminar } from "./colebrook";

// Hot-path binding, read once at load: run as CommonJS (tsx runs the bench and the CLIs
// so), every use of an imported name is a getter call on the other module's exports —
// per pipe per solver iteration, about a fifth of a network solve.
const colebrookUnchecked = colebrookUncheckedImport;

export type FlowRegime = "laminar" | "transition" | "turbulent";

/** Below this Re the flow is taken as zero (64/Re would overflow near 3.6e-307). */
export const RE_NO_FLOW = 1e-300;
/** Upper end of the laminar range (Re). Common textbook value 2300 (references.md §3.2). */
export const RE_LAMINAR_MAX = 2300;
/** Start of fully turbulent flow for friction purposes (Re), where Colebrook is used. */
export const RE_TURBULENT_MIN = 4000;

/**
 * Darcy friction factor with the regime used, for any Re ≥ 0.
 *
 * Rule chosen (an engineering convention, not a physical law — the transition
 * zone has no unique f):
 * - Re = 0 → f = 0, regime "laminar": no flow, no loss (keeps Δp(Q) continuous
 *   through Q = 0 for the network solver, since Δp = f·(L/D)·ρv²/2 → 0).
 * - 0 < Re < 2300 → laminar f = 64/Re.
 * - 2300 ≤ Re < 4000 → "transition": linear interpolation in Re between
 *   64/2300 and Colebrook(4000, ε/D). Chosen because it is continuous at both
 *   ends (no jump that would stall a Newton solver) and lies between the two
 *   bounding physical laws; the true factor in this zone is intermittent.
 * - Re ≥ 4000 → Colebrook–White.
 * - 0 < Re < 1e-300 (a flow indistinguishable from zero, where 64/Re would
 *   overflow to Infinity) is treated as Re = 0.
 * Throws RangeError for negative or non-finite Re, or ε/D outside [0, 1).
 */
export function darcyFrictionFactor(re: number, relRoughness: number): { f: number; regime: FlowRegime } {
  if (!(re >= 0) || !Number.isFinite(re)) throw new RangeError(`re must be ≥ 0 and finite, got ${re}`);
  if (!(relRoughness >= 0 && relRoughness < 1)) throw new RangeError(`relRoughness must be in [0, 1), got ${relRoughness}`);
  if (re < RE_NO_FLOW) return { f: 0, regime: "laminar" };
  if (re < RE_LAMINAR_MAX) return { f: laminar(re), regime: "laminar" };
  if (re < RE_TURBULENT_MIN) {
    const fLam = laminar(RE_LAMINAR_MAX);
    const fTurb = colebrook(RE_TURBULENT_MIN, relRoughness);
    const w = (re - RE_LAMINAR_MAX) / (RE_TURBULENT_MIN - RE_LAMINAR_MAX);
    return { f: fLam + w * (fTurb - fLam), regime: "transition" };
  }
  return { f: colebrook(re, relRoughness), regime: "turbulent" };
}

/**
 * darcyFrictionFactor's f as a plain number, without argument checks or an
 * object per call — for solvers that call it per link per iteration. The
 * caller guarantees 0 ≤ Re finite and 0 ≤ ε/D < 1; the regime follows from Re
 * alone (flowRegimeOf). Same rule and the same arithmetic as
 * darcyFrictionFactor, so the same value to the last bit — or, given guessX
 * (1/√f of a nearby turbulent point), Colebrook's Newton started there: the
 * same root to ~1e-15. anchorF (optional, > 0) is the transition's turbulent
 * end, transitionAnchorF(relRoughness), kept by a caller that evaluates the
 * same pipe again: the same number, without solving Colebrook each time.
 */
export function darcyF(re: number, relRoughness: number, guessX = 0, anchorF = 0): number {
  if (re < RE_NO_FLOW) return 0;
  if (re < RE_LAMINAR_MAX) return 64 / re;
  if (re < RE_TURBULENT_MIN) {
    const fLam = 64 / RE_LAMINAR_MAX;
    const fTurb = anchorF > 0 ? anchorF : transitionAnchorF(relRoughness);
    const w = (re - RE_LAMINAR_MAX) / (RE_TURBULENT_MIN - RE_LAMINAR_MAX);
    return fLam + w * (fTurb - fLam);
  }
  return colebrookUnchecked(re, relRoughness, guessX);
}

/** Colebrook's f at the top of the transition (Re = 4000), the turbulent end the transition interpolates to. */
export function transitionAnchorF(relRoughness: number): number {
  return colebrookUnchecked(RE_TURBULENT_MIN, relRoughness);
}

/** transitionAnchorF kept in the caller's map by ε/D: pipes of one catalogue size share it, so it is solved once per size. */
export function transitionAnchorIn(cache: Map<number, number>, relRoughness: number): number {
  let anchor = cache.get(relRoughness);
  if (anchor === undefined) cache.set(relRoughness, (anchor = transitionAnchorF(relRoughness)));
  return anchor;
}

/** The regime darcyFrictionFactor reports for this Re (Re ≥ 0). */
export function flowRegimeOf(re: number): FlowRegime {
  return re < RE_LAMINAR_MAX ? "laminar" : re < RE_TURBULENT_MIN ? "transition" : "turbulent";
}
