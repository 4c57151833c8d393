/**
 * The regime rule at its exact limits (Re 1e-300, 2300, 4000), the ε/D check of the laminar
 * branch, and the citations the working shows. Expected values are hand calculations of the
 * defining equations written out here: Hagen–Poiseuille f = 64/Re (White, Fluid Mechanics,
 * ch. 6), and the rule documented in darcy.ts (2300 ≤ Re < 4000 transition, common textbook limits,
 * references.md §3.2).
 */
import { describe, expect, it } from "vitest";
import { COLEBROOK_SOURCE } from "./colebrook";
import { darcyF, darcyFrictionFactor, flowRegimeOf } from "./darcy";
import { REYNOLDS_SOURCE } from "./reynolds";

describe("regimes at their exact limits", () => {
  it("Re exactly 1e-300 is a flow, not zero: 64/1e-300 = 6.4e301 (laminar)", () => {
    const r = darcyFrictionFactor(1e-300, 0);
    expect(r.regime).toBe("laminar");
    expect(r.f / 6.4e301).toBeCloseTo(1, 12); // 1e-300 is not exact in binary: compared in ratio
    expect(darcyF(1e-300, 0) / 6.4e301).toBeCloseTo(1, 12);
  });
  it("Re 2300 opens the transition (2300 ≤ Re < 4000), with f still 64/2300 = 0.0278261", () => {
    const r = darcyFrictionFactor(2300, 1e-3);
    expect(r.regime).toBe("transition");
    expect(r.f).toBeCloseTo(0.0278261, 7); // 64/2300 = 0.027826087
    expect(darcyFrictionFactor(2299.999, 1e-3).regime).toBe("laminar");
  });
  it("Re 4000 is turbulent (Colebrook from 4000); just below it is still transition", () => {
    expect(darcyFrictionFactor(4000, 1e-3).regime).toBe("turbulent");
    expect(darcyFrictionFactor(3999.999, 1e-3).regime).toBe("transition");
  });
  it("flowRegimeOf: laminar below 2300, transition 2300 ≤ Re < 4000, turbulent from 4000", () => {
    expect(flowRegimeOf(0)).toBe("laminar");
    expect(flowRegimeOf(2299.999)).toBe("laminar");
    expect(flowRegimeOf(2300)).toBe("transition");
    expect(flowRegimeOf(3000)).toBe("transition");
    expect(flowRegimeOf(3999.999)).toBe("transition");
    expect(flowRegimeOf(4000)).toBe("turbulent");
    expect(flowRegimeOf(1e6)).toBe("turbulent");
  });
});

describe("darcyFrictionFactor checks ε/D in the laminar range too (where Colebrook is not called)", () => {
  it("ε/D must be in [0, 1): 1 and −0.1 refused at Re 1000 with the value named; 0 and 0.999 taken (f = 64/1000)", () => {
    expect(() => darcyFrictionFactor(1000, 1)).toThrow(/^relRoughness must be in \[0, 1\), got 1$/);
    expect(() => darcyFrictionFactor(1000, -0.1)).toThrow(/^relRoughness must be in \[0, 1\), got -0.1$/);
    expect(() => darcyFrictionFactor(0, Number.NaN)).toThrow(/relRoughness/);
    expect(darcyFrictionFactor(1000, 0).f).toBe(0.064);
    expect(darcyFrictionFactor(1000, 0.999).f).toBe(0.064);
  });
});

describe("the citations shown with the working name their sources", () => {
  it("Colebrook 1939 (J. Inst. Civ. Eng. 11) and the laminar/transition rule; Reynolds 1883", () => {
    expect(COLEBROOK_SOURCE).toMatch(/Colebrook \(1939\), J\. Inst\. Civ\. Eng\. 11/);
    expect(COLEBROOK_SOURCE).toMatch(/64\/Re below 2300/);
    expect(REYNOLDS_SOURCE).toMatch(/Reynolds, 1883/);
  });
});
