/**
 * Darcy friction factor formulas for full pipes.
 * All take Re (dimensionless, > 0) and relative roughness ε/D (dimensionless, ≥ 0)
 * and throw RangeError naming the argument otherwise.
 */

/** Stated validity of each formula (data, for findings): Re and ε/D ranges. */
export const FRICTION_VALIDITY = {
  laminar: { reMin: 0, reMax: 2300, relRoughnessMin: 0, relRoughnessMax: 1 },
  colebrook: { reMin: 4000, reMax: 1e8, relRoughnessMin: 0, relRoughnessMax: 0.05 },
  swameeJain: { reMin: 5000, reMax: 1e8, relRoughnessMin: 1e-6, relRoughnessMax: 1e-2 },
  haaland: { reMin: 4000, reMax: 1e8, relRoughnessMin: 0, relRoughnessMax: 0.05 },
} as const;

/** Whether (re, relRoughness) lies in the stated validity of `method`. */
export function frictionFormulaValid(method: keyof typeof FRICTION_VALIDITY, re: number, relRoughness: number): boolean {
  const v = FRICTION_VALIDITY[method];
  return re >= v.reMin && re <= v.reMax && relRoughness >= v.relRoughnessMin && relRoughness <= v.relRoughnessMax;
}

function checkArgs(re: number, relRoughness: number): void {
  if (!(re > 0) || !Number.isFinite(re)) throw new RangeError(`re must be > 0 and finite, got ${re}`);
  if (!(relRoughness >= 0 && relRoughness < 1)) {
    throw new RangeError(`relRoughness must be in [0, 1), got ${relRoughness}`);
  }
}

/** Laminar (Hagen–Poiseuille) Darcy factor f = 64/Re. Valid Re < ~2300. */
export function laminar(re: number): number {
  if (!(re > 0) || !Number.isFinite(re)) throw new RangeError(`re must be > 0 and finite, got ${re}`);
  return 64 / re;
}

/**
 * Colebrook–White (Colebrook 1939, J. ICE 11:133):
 *   1/√f = −2·log10( (ε/D)/3.7 + 2.51/(Re·√f) )
 * Solved by Newton's method on x = 1/√f, started from Haaland, iterated until
 * |Δx| < 1e-10 or Newton's estimated error after the step is below 1e-12 in x
 * (at most 50 steps; converges in 2–3). Validity: turbulent flow,
 * Re ≳ 4000, 0 ≤ ε/D ≤ 0.05 (the Moody chart range).
 */
export function colebrook(re: number, relRoughness: number): number {
  checkArgs(re, relRoughness);
  return colebrookUnchecked(re, relRoughness);
}

/** Haaland's (ε/D/3.7)^1.11 (Haaland 1983): the part of its 1/√f that depends on the pipe alone, kept per pipe by a solver. */
export function haalandRoughTerm(relRoughness: number): number {
  return (relRoughness / 3.7) ** 1.11;
}

/** Haaland's 1/√f = |−1.8·log10(roughTerm + 6.9/Re)| (Haaland 1983), Colebrook's Newton start. */
export function haalandStartX(re: number, roughTerm: number): number {
  const h = -1.8 * Math.log10(roughTerm + 6.9 / re); // Haaland, as haaland()
  return 1 / Math.sqrt(1 / (h * h));
}

/**
 * colebrook() without the argument checks, for hot loops whose caller has
 * already validated Re > 0 and 0 ≤ ε/D < 1 (same iteration, same result to
 * the last bit). Haaland start (Haaland 1983) + Newton on x = 1/√f, or
 * Newton from guessX (> 0) when the caller has a better start.
 */
export function colebrookUnchecked(re: number, relRoughness: number, guessX = 0): number {
  const a = relRoughness / 3.7;
  const b = 2.51 / re;
  let x: number;
  if (guessX > 0) {
    // Warm start: a network solver passes the x = 1/√f this pipe had at its
    // previous flow; Newton then needs one or two steps to the same 1e-10.
    x = guessX;
  } else x = haalandStartX(re, haalandRoughTerm(relRoughness));
  for (let k = 0; k < 50; k++) {
    const arg = a + b * x;
    const g = x + 2 * Math.log10(arg);
    const c = (2 * b) / (arg * Math.LN10);
    const dg = 1 + c;
    const dx = g / dg;
    x -= dx;
    // Newton's error after this step is ≈ |g''/(2g')|·dx² (quadratic convergence, e.g. Press et al.,
    // Numerical Recipes, 3rd ed., §9.4), with g'' = −b·c/arg: below 1e-12 in x (≈ 1e-13 of it)
    // the step that would only confirm the root is skipped.
    if (Math.abs(dx) < 1e-10 || ((b * c) / (2 * arg * dg)) * dx * dx < 1e-12) break;
  }
  return 1 / (x * x);
}

/**
 * Swamee–Jain (Swamee & Jain 1976, J. Hydraul. Div. ASCE 102(5):657):
 *   f = 0.25 / [log10( (ε/D)/3.7 + 5.74/Re^0.9 )]²
 * Stated validity 5e3 ≤ Re ≤ 1e8, 1e-6 ≤ ε/D ≤ 1e-2 (≈ 1 % from Colebrook there;
 * up to 3.1 % near Re 4000 and ε/D 0.01, references.md §3.1).
 */
export function swameeJain(re: number, relRoughness: number): number {
  checkArgs(re, relRoughness);
  const l = Math.log10(relRoughness / 3.7 + 5.74 / re ** 0.9);
  return 0.25 / (l * l);
}

/**
 * Haaland (Haaland 1983, J. Fluids Eng. 105:89; White, Fluid Mechanics, eq. 6.49):
 *   1/√f = −1.8·log10[ ((ε/D)/3.7)^1.11 + 6.9/Re ]
 * Validity 4e3 ≤ Re ≤ 1e8, within ~1.5 % of Colebrook.
 */
export function haaland(re: number, relRoughness: number): number {
  checkArgs(re, relRoughness);
  const x = -1.8 * Math.log10((relRoughness / 3.7) ** 1.11 + 6.9 / re);
  return 1 / (x * x);
}

/**
 * Fully rough (Re → ∞) limit of Colebrook, von Kármán–Nikuradse:
 *   f = 0.25 / [log10((ε/D)/3.7)]²  — Crane TP-410's "fT". ε/D must be > 0.
 */
export function fullyRoughFrictionFactor(relRoughness: number): number {
  if (!(relRoughness > 0 && relRoughness < 1)) throw new RangeError(`relRoughness must be in (0, 1), got ${relRoughness}`);
  const l = Math.log10(relRoughness / 3.7);
  return 0.25 / (l * l);
}

/** The citation shown with the friction factor's working (regimes: friction/darcy.ts). */
export const COLEBROOK_SOURCE =
  "C. F. Colebrook (1939), J. Inst. Civ. Eng. 11, 133–156 (Re ≥ 4000); laminar f = 64/Re below 2300; linear between (the engine's convention)";
