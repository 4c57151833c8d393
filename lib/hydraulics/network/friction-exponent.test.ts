/**
 * The gradient method's pipe slope exponent n = d ln h_f / d ln q against a central
 * difference of darcyF itself (n = 2 + d ln f / d ln Re, Re ∝ q), and against its limits:
 * Blasius f ∝ Re^−0.25 (Blasius 1913; White, Fluid Mechanics, ch. 6) gives n = 1.75 on a
 * smooth pipe near Re 1e4–1e5; a fully rough pipe (von Kármán–Nikuradse) gives n = 2.
 */
import { describe, expect, it } from "vitest";
import { darcyF, transitionAnchorF } from "@/lib/hydraulics/friction/darcy";
import { transitionExponent, turbulentExponent } from "./friction-exponent";

/** 2 + d ln f / d ln Re by a central difference in ln Re (step 1e-5). */
function numeric(re: number, rel: number): number {
  const h = 1e-5;
  return 2 + (Math.log(darcyF(re * Math.exp(h), rel)) - Math.log(darcyF(re * Math.exp(-h), rel))) / (2 * h);
}

describe("friction exponent n = d ln h / d ln q", () => {
  it.each([
    [5e3, 0],
    [1e5, 1e-4],
    [3e6, 0.01],
    [1e4, 0.05],
  ])("turbulent Re %d, ε/D %d: Colebrook's implicit derivative equals the difference quotient", (re, rel) => {
    const x = 1 / Math.sqrt(darcyF(re, rel));
    expect(turbulentExponent(re, rel, x)).toBeCloseTo(numeric(re, rel), 7);
  });
  it("smooth pipe at Re 2e4: within 0.05 of Blasius' 1.75; fully rough (ε/D 0.05, Re 1e8): 2 to 3 decimals", () => {
    expect(Math.abs(turbulentExponent(2e4, 0, 1 / Math.sqrt(darcyF(2e4, 0))) - 1.75)).toBeLessThan(0.05);
    expect(turbulentExponent(1e8, 0.05, 1 / Math.sqrt(darcyF(1e8, 0.05)))).toBeCloseTo(2, 3);
  });
  it.each([2400, 3150, 3900])("transition Re %d: the straight line's exponent equals the difference quotient", (re) => {
    const rel = 1e-3;
    expect(transitionExponent(re, darcyF(re, rel), transitionAnchorF(rel))).toBeCloseTo(numeric(re, rel), 7);
  });
});
