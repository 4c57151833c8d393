import { describe, expect, it } from "vitest";
import { emitterAtFlow, en442ReturnTemperature } from "./emitter-at-flow";
import { bisect, en442LogW } from "@/lib/hydraulics/testing/hand-calc";
import { en442Output } from "./en442";

const rad = { outputAtDt50W: 2000, exponentN: 1.3, roomC: 20, specificHeatJkgK: 4180 };

describe("emitterAtFlow (heat balance Φ_EN442(t1, t2) = ṁ·cp·(t1 − t2))", () => {
  it("at the design flow for 45/40/20 it returns 40 °C and the EN 442 output (0.3538 × Φ50, references.md §7)", () => {
    const design = en442LogW(2000, 1.3, 45, 40, 20); // hand: 2000·(22.407/49.833)^1.3
    expect(Math.abs(design / 2000 - 0.3538)).toBeLessThan(1e-4);
    const m = design / (4180 * 5);
    const out = emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: m });
    expect(out.returnC).toBeCloseTo(40, 6);
    expect(out.outputW).toBeCloseTo(design, 3);
  });
  it("more flow → warmer return and more output; less flow → colder return and less output", () => {
    const m = 0.0339;
    const a = emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: m / 2 });
    const b = emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: m });
    const c = emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: m * 2 });
    expect(a.returnC).toBeLessThan(b.returnC);
    expect(b.returnC).toBeLessThan(c.returnC);
    expect(a.outputW).toBeLessThan(b.outputW);
    expect(b.outputW).toBeLessThan(c.outputW);
    // huge flow: return → flow, output → Φ at a mean of t1
    const big = emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: 1e3 });
    expect(big.returnC).toBeGreaterThan(44.99);
    expect(Math.abs(big.outputW - en442Output({ ...rad, flowC: 45, returnC: 45 }))).toBeLessThan(1);
  });
  it("55 °C in at 0.02 kg/s: the return where EN 442 output = ṁ·cp·(t1 − t2), found here by bisection", () => {
    const out = emitterAtFlow({ ...rad, flowC: 55, massFlowKgs: 0.02 });
    const t2 = bisect((t) => en442LogW(2000, 1.3, 55, t, 20) - 0.02 * 4180 * (55 - t), 20 + 1e-9, 55 - 1e-9);
    expect(t2).toBeGreaterThan(40);
    expect(t2).toBeLessThan(50);
    expect(Math.abs(out.returnC - t2)).toBeLessThan(1e-7);
    expect(Math.abs(out.outputW - 0.02 * 4180 * (55 - t2))).toBeLessThan(1e-3);
    expect(en442ReturnTemperature({ ...rad, flowC: 55, massFlowKgs: 0.02 })).toBe(out.returnC);
  });
  it("no flow → no output, return at room; flow not above room → no output", () => {
    expect(emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: 0 })).toEqual({ outputW: 0, returnC: 20 });
    expect(emitterAtFlow({ ...rad, flowC: 19, massFlowKgs: 0.02 })).toEqual({ outputW: 0, returnC: 19 });
  });
  it("throws RangeError naming the field", () => {
    expect(() => emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: -1 })).toThrow(/massFlowKgs/);
    expect(() => emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: 0.02, specificHeatJkgK: 0 })).toThrow(/specificHeatJkgK/);
    expect(() => emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: 0.02, exponentN: 3 })).toThrow(/exponentN/);
  });
});

describe("emitterAtFlow arguments and special cases, on both sides", () => {
  it("temperatures finite, ṁ ≥ 0 and finite, cp > 0 and finite — the message names the value", () => {
    expect(() => emitterAtFlow({ ...rad, flowC: Number.NaN, massFlowKgs: 0.02 })).toThrow(/^flowC must be finite, got NaN$/);
    expect(() => emitterAtFlow({ ...rad, roomC: Number.POSITIVE_INFINITY, flowC: 45, massFlowKgs: 0.02 })).toThrow(/^roomC must be finite, got Infinity$/);
    expect(() => emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: Number.POSITIVE_INFINITY })).toThrow(/^massFlowKgs must be ≥ 0, got Infinity$/);
    expect(() => emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: 0.02, specificHeatJkgK: Number.POSITIVE_INFINITY })).toThrow(/^specificHeatJkgK must be > 0, got Infinity$/);
    expect(() => emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: 0.02, specificHeatJkgK: -4180 })).toThrow(/specificHeatJkgK/);
  });
  it("flow exactly at room temperature, or a 0 W radiator: no output, the water leaves as it came", () => {
    expect(emitterAtFlow({ ...rad, flowC: 20, massFlowKgs: 0.02 })).toEqual({ outputW: 0, returnC: 20 });
    expect(emitterAtFlow({ ...rad, outputAtDt50W: 0, flowC: 45, massFlowKgs: 0.02 })).toEqual({ outputW: 0, returnC: 45 });
    // the exponent is still checked on these paths
    expect(() => emitterAtFlow({ ...rad, exponentN: 5, flowC: 19, massFlowKgs: 0.02 })).toThrow(/exponentN/);
    expect(() => emitterAtFlow({ ...rad, outputAtDt50W: -1, flowC: 45, massFlowKgs: 0.02 })).toThrow(/outputAtDt50W/);
  });
  it("a trickle (1e-7 kg/s) cools the water almost to the room: return within 1e-6 K above it, output = ṁ·cp·(t1 − t2)", () => {
    const out = emitterAtFlow({ ...rad, flowC: 45, massFlowKgs: 1e-7 });
    expect(out.returnC).toBeGreaterThan(20);
    expect(out.returnC - 20).toBeLessThan(1e-3);
    expect(out.outputW).toBeCloseTo(1e-7 * 4180 * (45 - out.returnC), 12);
  });
  it("the return solves the balance to 1e-9 K at several flows (hand bisection on the EN 442 equation)", () => {
    for (const m of [0.001, 0.005, 0.05, 0.5]) {
      const out = emitterAtFlow({ ...rad, flowC: 50, massFlowKgs: m });
      const t2 = bisect((t) => en442LogW(2000, 1.3, 50, t, 20) - m * 4180 * (50 - t), 20 + 1e-12, 50 - 1e-12);
      expect(Math.abs(out.returnC - t2), `ṁ ${m}`).toBeLessThan(1e-8);
    }
  });
});
