import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { emitterAtFlow } from "../emitters";
import { pipePressureDrop } from "../pipes";
import { colebrook, darcyFrictionFactor } from "./index";

// Invariants of the physics (no published value involved): finite, monotonic, bounded.
describe("friction and pressure-drop invariants (property-based)", () => {
  it("Colebrook f falls with Re and rises with ε/D, always finite and in (0.005, 0.11)", () => {
    fc.assert(
      fc.property(fc.double({ min: 4000, max: 1e8, noNaN: true }), fc.double({ min: 0, max: 0.05, noNaN: true }), (re, rr) => {
        const f = colebrook(re, rr);
        expect(Number.isFinite(f)).toBe(true);
        expect(f).toBeGreaterThan(0.005);
        expect(f).toBeLessThan(0.11);
        expect(colebrook(re * 1.1, rr)).toBeLessThanOrEqual(f * (1 + 1e-12));
        expect(colebrook(re, rr + 1e-4)).toBeGreaterThan(f);
      }),
    );
  });
  it("darcyFrictionFactor is finite for every Re ≥ 0", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e9, noNaN: true }), fc.double({ min: 0, max: 0.05, noNaN: true }), (re, rr) => {
        expect(Number.isFinite(darcyFrictionFactor(re, rr).f)).toBe(true);
      }),
    );
  });
  it("pipe Δp rises strictly with |Q| and is odd in Q", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-7, max: 5e-3, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true }), (q, sumK) => {
        const input = { flowM3s: q, innerDiameterM: 0.0202, lengthM: 10, roughnessM: 1.5e-6, densityKgM3: 990, kinematicViscosityM2s: 6e-7, sumK };
        const a = pipePressureDrop(input).dpPa;
        const b = pipePressureDrop({ ...input, flowM3s: q * 1.01 }).dpPa;
        expect(b).toBeGreaterThan(a);
        expect(pipePressureDrop({ ...input, flowM3s: -q }).dpPa).toBeCloseTo(-a, 9);
      }),
    );
  });
  it("an emitter's return lies in (room, flow] and its output never exceeds ṁ·cp·(t1 − t_r)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 25, max: 90, noNaN: true }),
        fc.double({ min: 1e-4, max: 1, noNaN: true }),
        fc.double({ min: 100, max: 5000, noNaN: true }),
        (flowC, m, phi50) => {
          const r = emitterAtFlow({ outputAtDt50W: phi50, exponentN: 1.3, flowC, roomC: 20, massFlowKgs: m, specificHeatJkgK: 4180 });
          expect(r.returnC).toBeGreaterThan(20);
          expect(r.returnC).toBeLessThanOrEqual(flowC);
          expect(r.outputW).toBeLessThanOrEqual(m * 4180 * (flowC - 20) + 1e-6);
        },
      ),
    );
  });
});
