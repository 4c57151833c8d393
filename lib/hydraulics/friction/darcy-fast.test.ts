/**
 * darcyF, the solvers' fast path, against outside values in each regime and against the
 * checked darcyFrictionFactor bit for bit (its doc promises "the same value to the last bit").
 */
import { describe, expect, it } from "vitest";
import { colebrook } from "./colebrook";
import { darcyF, darcyFrictionFactor, transitionAnchorF } from "./darcy";

describe("darcyF in each regime", () => {
  // Hagen–Poiseuille f = 64/Re (White, Fluid Mechanics, ch. 6, laminar pipe flow; the equation number not recalled)
  it("laminar: 64/Re: Re 1000 → 0.064, Re 2000 → 0.032", () => {
    expect(darcyF(1000, 0.001)).toBeCloseTo(0.064, 15);
    expect(darcyF(2000, 0)).toBeCloseTo(0.032, 15);
  });
  it("no flow: 0 at Re 0 and below 1e-300 (where 64/Re would overflow)", () => {
    expect(darcyF(0, 0.001)).toBe(0);
    expect(darcyF(1e-301, 0.001)).toBe(0);
    expect(darcyF(1e-299, 0)).toBeCloseTo(64e299, -290);
  });
  it("transition 2300–4000: the straight line from 64/2300 to Colebrook at 4000 (by hand at its ends and middle)", () => {
    const lo = 64 / 2300, hi = colebrook(4000, 1e-4);
    expect(darcyF(2300, 1e-4)).toBeCloseTo(lo, 15);
    expect(darcyF(3150, 1e-4)).toBeCloseTo((lo + hi) / 2, 15);
    expect(darcyF(3999.999999, 1e-4)).toBeCloseTo(hi, 9);
    expect(darcyF(3150, 1e-4)).toBeGreaterThan(Math.min(lo, hi));
  });
  // Moody chart (Moody 1944, Trans. ASME 66:671): f ≈ 0.0185 at Re 1e5, ε/D 1e-4 — read from memory, to 3 decimals
  it("turbulent: Colebrook, f ≈ 0.0185 at Re 1e5, ε/D 1e-4", () => {
    expect(darcyF(1e5, 1e-4)).toBeCloseTo(0.0185, 3);
    expect(darcyF(1e5, 1e-4)).toBe(colebrook(1e5, 1e-4));
  });
  it("a warm start (x = 1/√f of a nearby flow) reaches the same root to 1e-12", () => {
    const x = 1 / Math.sqrt(darcyF(1.1e5, 1e-4));
    expect(Math.abs(darcyF(1e5, 1e-4, x) - darcyF(1e5, 1e-4)) / darcyF(1e5, 1e-4)).toBeLessThan(1e-12);
  });
  it("a kept transition anchor (Colebrook at Re 4000) gives the same f to the last bit, and is the one the line is drawn to", () => {
    expect(transitionAnchorF(1e-4)).toBe(colebrook(4000, 1e-4));
    for (const re of [2300, 3000, 3999]) expect(darcyF(re, 1e-4, 0, transitionAnchorF(1e-4))).toBe(darcyF(re, 1e-4));
    // the anchor given is the one used: a doubled anchor moves the midpoint by half of it
    const lo = 64 / 2300, hi = colebrook(4000, 1e-4);
    expect(darcyF(3150, 1e-4, 0, 2 * hi)).toBeCloseTo((lo + 2 * hi) / 2, 15);
  });
  it.each([0, 1e-301, 500, 2299.5, 2300, 2301, 3000, 3999, 4000, 4001, 2e4, 1e6, 1e8])("Re %s: the same value as darcyFrictionFactor to the last bit", (re) => {
    for (const rr of [0, 1e-5, 1e-3, 0.05]) expect(darcyF(re, rr)).toBe(darcyFrictionFactor(re, rr).f);
  });
});
