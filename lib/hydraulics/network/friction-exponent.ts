/**
 * Local exponent n = d ln h_f / d ln q of Darcy–Weisbach friction, h_f = f·(L/D)·ρv²/2,
 * so dh_f/dq = n·h_f/q — the gradient method's slope (Todini & Pilati 1988 take the
 * exact derivative). With Re ∝ q: n = 2 + d ln f / d ln Re.
 */
import { RE_LAMINAR_MAX, RE_TURBULENT_MIN } from "@/lib/hydraulics/friction/darcy";

/**
 * Turbulent (Colebrook–White, Colebrook 1939): x = 1/√f = −2·log10(ε/(3.7D) + 2.51·x/Re).
 * Implicit differentiation in ln Re, with b = 2.51/Re, arg = ε/(3.7D) + b·x and
 * c = 2b/(ln10·arg): d ln x / d ln Re = c/(1 + c), so d ln f / d ln Re = −2c/(1 + c).
 * Smooth pipe at Re 1e5: n ≈ 1.8 (Blasius gives 1.75); fully rough (b → 0): n = 2.
 */
export function turbulentExponent(re: number, relRoughness: number, x: number): number {
  const b = 2.51 / re;
  const c = (2 * b) / (Math.LN10 * (relRoughness / 3.7 + b * x));
  return 2 - (2 * c) / (1 + c);
}

/**
 * The engine's transition (friction/darcy.ts darcyF): f linear in Re between 64/2300 and
 * Colebrook's f at Re 4000 (anchorF), so d ln f / d ln Re = Re·(anchorF − 64/2300)/(4000 − 2300)/f.
 */
export function transitionExponent(re: number, f: number, anchorF: number): number {
  const slope = (anchorF - 64 / RE_LAMINAR_MAX) / (RE_TURBULENT_MIN - RE_LAMINAR_MAX);
  return 2 + (re * slope) / f;
}
