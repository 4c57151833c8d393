/**
 * The regime boundaries of darcyFrictionFactor / darcyF / flowRegimeOf, each on both sides, and the
 * argument limits. The convention (COLEBROOK_SOURCE): laminar f = 64/Re below Re 2300, Colebrook
 * (1939) from Re 4000, a straight line between; no flow (f = 0) below Re 1e-300, where 64/Re overflows.
 */
import { describe, expect, it } from "vitest";
import { colebrook, COLEBROOK_SOURCE } from "./colebrook";
import { darcyF, darcyFrictionFactor, flowRegimeOf } from "./darcy";
import { REYNOLDS_SOURCE } from "./reynolds";

describe("regime boundaries, each side", () => {
  it("Re 2300 is the start of the transition (f still 64/2300 = 0.027826 there); just below it is laminar", () => {
    expect(darcyFrictionFactor(2300, 1e-4)).toEqual({ f: 64 / 2300, regime: "transition" });
    expect(darcyFrictionFactor(2299.999, 1e-4).regime).toBe("laminar");
    expect([flowRegimeOf(2299.999), flowRegimeOf(2300)]).toEqual(["laminar", "transition"]);
  });
  it("Re 4000 is turbulent (Colebrook itself); just below it is the transition line", () => {
    expect(darcyFrictionFactor(4000, 1e-4)).toEqual({ f: colebrook(4000, 1e-4), regime: "turbulent" });
    expect(darcyFrictionFactor(3999.999, 1e-4).regime).toBe("transition");
    expect([flowRegimeOf(3999.999), flowRegimeOf(4000)]).toEqual(["transition", "turbulent"]);
  });
  it("Re 1e-300 still has a laminar f = 64/1e-300 = 6.4e301; below it no flow, f = 0", () => {
    expect(darcyFrictionFactor(1e-300, 0).regime).toBe("laminar");
    expect(darcyFrictionFactor(1e-300, 0).f / 6.4e301).toBeCloseTo(1, 12); // 64/1e-300, to rounding
    expect(darcyF(1e-300, 0) / 6.4e301).toBeCloseTo(1, 12);
    expect(darcyFrictionFactor(5e-301, 0)).toEqual({ f: 0, regime: "laminar" });
  });
});

describe("relative roughness 0 ≤ ε/D < 1", () => {
  it("0 and 0.999 are taken; −1e-9 and 1 are refused by name", () => {
    expect(darcyFrictionFactor(1e5, 0).f).toBeGreaterThan(0);
    expect(darcyFrictionFactor(1e5, 0.999).f).toBeGreaterThan(0);
    expect(() => darcyFrictionFactor(1e5, -1e-9)).toThrow(/^relRoughness must be in \[0, 1\), got -1e-9$/);
    expect(() => darcyFrictionFactor(1e5, 1)).toThrow(/^relRoughness must be in \[0, 1\), got 1$/);
  });
  it("checked in the laminar range too, where Colebrook (which checks it again) is not reached", () => {
    expect(darcyFrictionFactor(1000, 0.999).f).toBeCloseTo(0.064, 15); // 64/1000
    expect(() => darcyFrictionFactor(1000, -1e-9)).toThrow(/^relRoughness must be in \[0, 1\), got -1e-9$/);
    expect(() => darcyFrictionFactor(1000, 1)).toThrow(/^relRoughness must be in \[0, 1\), got 1$/);
  });
});

describe("the citations shown with the working", () => {
  it("name Colebrook (1939) and Reynolds (1883)", () => {
    expect(COLEBROOK_SOURCE).toMatch(/^C\. F\. Colebrook \(1939\), J\. Inst\. Civ\. Eng\. 11, 133–156/);
    expect(REYNOLDS_SOURCE).toBe("Reynolds number Re = v·d/ν, defining equation (O. Reynolds, 1883)");
  });
});
