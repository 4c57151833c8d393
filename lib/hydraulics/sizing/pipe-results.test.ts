/**
 * Pipes without flow. A vessel or accessory leg solves to round-off
 * (e.g. −7e-13 m³/h), which gave a friction factor of 2.2e9 and a Reynolds
 * number of 2.9e-8. Common practice: a flow below a stated tolerance
 * (PIPE_NO_FLOW_M3H = 1e-9 m³/h) is zero; with no flow there is no Reynolds
 * number or friction factor (contract: a number not computed is null with a
 * finding saying why — one info `pipe.no-flow` naming the pipes), and no size
 * is suggested for a pipe that carries nothing.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { Findings } from "@/lib/hydraulics/findings/finding";
import { COPPER_EPS_MM, COPPER_ID_MM, pipeFlow, WATER } from "@/lib/hydraulics/testing/hand-calc";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";
import { parseSchematic } from "@/lib/schematic/parse";
import { createContext } from "./context";
import { PIPE_NO_FLOW_M3H, pipeResults } from "./pipe-results";

describe("no-flow pipes in design results", () => {
  it("round-off flow −7e-13 m³/h is reported as 0 with null Re, f and suggested size", () => {
    const parsed = parseSchematic(smallSystem());
    if (!parsed.ok) throw new Error("small system must parse");
    const findings = new Findings();
    const ctx = createContext(parsed.doc, findings);
    const q = new Float64Array(ctx.model.links.length);
    const kPev = ctx.model.linkOfPipe.get("pev")!;
    const kP1 = ctx.model.linkOfPipe.get("p1")!;
    q[kPev] = -7e-13;
    q[kP1] = 0.26;
    const rows = new Map(pipeResults(ctx, q, "heating").map((r) => [r.id, r]));
    const pev = rows.get("pev")!;
    expect(pev.flowM3h).toBe(0);
    expect(pev.reynolds).toBeNull();
    expect(pev.frictionFactor).toBeNull();
    expect(pev.suggestedSize).toBeNull();
    expect(pev.velocityMps).toBe(0);
    expect(pev.pressureDropKpa).toBe(0);
    expect(pev.gradientPaPerM).toBe(0);
    // a flowing pipe keeps its numbers: 0.26 m³/h in Cu 22 (d 20.2 mm) with water at the 42.5 °C mean,
    // IAPWS values of references §1.1 taken linearly between 40 and 45 °C (ν to 0.15 %):
    // v 0.2254 m/s, Re ≈ 7,230, Colebrook f ≈ 0.0340 (±0.2 % on Re, ±0.05 % on f)
    const w = { rho: (WATER[40].rho + WATER[45].rho) / 2, cp: 0, nu: (WATER[40].nu + WATER[45].nu) / 2 };
    const hand = pipeFlow(0.26, COPPER_ID_MM["22"], COPPER_EPS_MM, 1, w);
    const p1 = rows.get("p1")!;
    expect(Math.abs(p1.velocityMps! / hand.v - 1)).toBeLessThan(1e-9);
    expect(Math.abs(p1.reynolds! / hand.re - 1)).toBeLessThan(2e-3);
    expect(Math.abs(p1.frictionFactor! / hand.f - 1)).toBeLessThan(5e-4);
    // suggested: the smallest copper size within the small system's 1 m/s and 300 Pa/m — 10 mm (d 8.8 mm,
    // references §4.1) runs at 1.19 m/s; 15 mm at 0.50 m/s and ≈ 280 Pa/m
    expect(pipeFlow(0.26, 8.8, COPPER_EPS_MM, 1, w).v).toBeGreaterThan(1);
    const cu15 = pipeFlow(0.26, COPPER_ID_MM["15"], COPPER_EPS_MM, 1, w);
    expect(cu15.v).toBeLessThan(1);
    expect(cu15.gradientPaPerM).toBeLessThan(300 * 0.97); // clear of the limit by more than the method difference
    expect(p1.suggestedSize).toBe("15");
    // one finding for all of them, naming them
    const nf = findings.list.filter((f) => f.code === "pipe.no-flow");
    expect(nf).toHaveLength(1);
    expect(nf[0]!.severity).toBe("info");
    expect(nf[0]!.refs).toContain("pev");
    expect(nf[0]!.refs).not.toContain("p1");
  });

  it("a flow just above the tolerance is kept", () => {
    const parsed = parseSchematic(smallSystem());
    if (!parsed.ok) throw new Error("small system must parse");
    const ctx = createContext(parsed.doc, new Findings());
    const q = new Float64Array(ctx.model.links.length);
    q[ctx.model.linkOfPipe.get("pev")!] = 10 * PIPE_NO_FLOW_M3H;
    const pev = pipeResults(ctx, q, "heating").find((r) => r.id === "pev")!;
    expect(pev.flowM3h).toBe(10 * PIPE_NO_FLOW_M3H);
    expect(pev.reynolds!).toBeGreaterThan(0);
  });

  it("whole calculation: the vessel and safety-valve legs carry exactly 0, no absurd f or Re anywhere", () => {
    const r = calculate(smallSystem());
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    for (const m of r.results.modes) {
      for (const p of m.pipes) {
        if (p.flowM3h === 0) {
          expect(p.reynolds).toBeNull();
          expect(p.frictionFactor).toBeNull();
          expect(p.suggestedSize).toBeNull();
        } else {
          expect(Math.abs(p.flowM3h!)).toBeGreaterThanOrEqual(PIPE_NO_FLOW_M3H);
          expect(p.frictionFactor!).toBeLessThan(1);
        }
      }
      const pev = m.pipes.find((p) => p.id === "pev")!;
      expect(pev.flowM3h).toBe(0);
    }
    const nf = r.results.findings.find((f) => f.code === "pipe.no-flow")!;
    expect(nf.refs).toEqual(expect.arrayContaining(["pev", "psv"]));
  });
});
