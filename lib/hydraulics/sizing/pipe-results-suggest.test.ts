/**
 * The suggested pipe size: the smallest catalogue size of the pipe's material whose velocity is
 * ≤ design.maxVelocityMps and whose friction gradient is ≤ design.targetGradientPaPerM (CIBSE Guide
 * B-style limits, references §9) — both limits inclusive. Expected sizes come from hand calculations
 * (Darcy–Weisbach with Colebrook, testing/hand-calc.ts) on the bores of the standards, and each limit
 * is tested on both sides and exactly at the edge.
 */
import { describe, expect, it, vi } from "vitest";
import { COPPER_EPS_MM, COPPER_ID_MM, pipeFlow, WATER } from "@/lib/hydraulics/testing/hand-calc";
import { contextOf } from "@/lib/hydraulics/testing/context-of";
import { smallSystem, type SmallSystem } from "@/lib/hydraulics/testing/small-system";
import { pipeResults, suggestSize } from "./pipe-results";

/** Water at the small system's 42.5 °C mean, references §1.1, linearly between 40 and 45 °C (ν to 0.15 %). */
const W = { rho: (WATER[40].rho + WATER[45].rho) / 2, cp: 0, nu: (WATER[40].nu + WATER[45].nu) / 2 };
/** EN 10255 medium series OD × wall: DN15 21.3 × 2.6 → d 16.1 mm, DN20 26.9 × 2.6 → d 21.7 mm; ε 0.045 mm new steel (references §3.3). */
const STEEL = { DN15: 16.1, DN20: 21.7, EPS: 0.045 };

function edited(edit: (d: SmallSystem) => void = () => {}) {
  const d = smallSystem();
  edit(d);
  return contextOf(d);
}

/** p1 (index 0 of the small system) as a steel pipe. */
const steelP1 = (d: SmallSystem) => {
  d.pipes[0]!.material = "steel";
  d.pipes[0]!.size = "DN20";
};

describe("suggested size against the velocity limit", () => {
  // 0.26 m³/h in copper 15 (d 13.6 mm, EN 1057): v = 0.26/3600/(π·0.0136²/4) = 0.497 m/s; 10 mm (d 8.8 mm) 1.19 m/s
  it("15 mm when the limit is 2 % above its velocity, 22 mm when 2 % below", () => {
    const v15 = pipeFlow(0.26, COPPER_ID_MM["15"], COPPER_EPS_MM, 1, W).v;
    expect(v15).toBeCloseTo(0.497, 3);
    const { ctx } = edited();
    ctx.doc.design.targetGradientPaPerM = 5000;
    ctx.doc.design.maxVelocityMps = 1.02 * v15;
    expect(suggestSize(ctx, 0, 0.26)).toBe("15");
    ctx.doc.design.maxVelocityMps = 0.98 * v15;
    expect(suggestSize(ctx, 0, 0.26)).toBe("22");
    // the sign of the flow is its direction only
    expect(suggestSize(ctx, 0, -0.26)).toBe("22");
  });

  it("a velocity exactly at the limit passes (≤)", () => {
    // the engine's own velocity in a 15 mm pipe at 0.26 m³/h, read from a first run, is made the limit
    const { ctx } = edited((d) => (d.pipes[0]!.size = "15"));
    const q = new Float64Array(ctx.model.links.length);
    q[ctx.model.pipeLink[0]!] = 0.26;
    const v = pipeResults(ctx, q, "heating")[0]!.velocityMps!;
    expect(v).toBeCloseTo(0.497, 3);
    ctx.doc.design.targetGradientPaPerM = 5000;
    ctx.doc.design.maxVelocityMps = v;
    expect(suggestSize(ctx, 0, 0.26)).toBe("15");
  });
});

describe("suggested size against the gradient target", () => {
  // 1.5 m³/h in steel DN15 (d 16.1 mm): v 2.05 m/s, Re ≈ 53,000, Colebrook with ε/d = 0.045/16.1
  // gives R ≈ 3.9 kPa/m — about 30 % above the smooth-pipe value, so the roughness decides the size
  it("DN15 when the target is 3 % above its gradient, DN20 when 3 % below", () => {
    const r15 = pipeFlow(1.5, STEEL.DN15, STEEL.EPS, 1, W).gradientPaPerM;
    const smooth = pipeFlow(1.5, STEEL.DN15, 0, 1, W).gradientPaPerM;
    expect(r15 / smooth).toBeGreaterThan(1.2);
    const { ctx } = edited(steelP1);
    ctx.doc.design.maxVelocityMps = 5;
    ctx.doc.design.targetGradientPaPerM = 1.03 * r15;
    expect(suggestSize(ctx, 0, 1.5)).toBe("DN15");
    ctx.doc.design.targetGradientPaPerM = 0.97 * r15;
    expect(suggestSize(ctx, 0, 1.5)).toBe("DN20");
    // DN20 (d 21.7 mm) is well inside: R ≈ 0.9 kPa/m
    expect(pipeFlow(1.5, STEEL.DN20, STEEL.EPS, 1, W).gradientPaPerM).toBeLessThan(0.5 * r15);
  });

  it("a gradient exactly at the target passes (≤)", () => {
    const { ctx } = edited((d) => {
      steelP1(d);
      d.pipes[0]!.size = "DN15";
    });
    const q = new Float64Array(ctx.model.links.length);
    q[ctx.model.pipeLink[0]!] = 1.5;
    const g = pipeResults(ctx, q, "heating")[0]!.gradientPaPerM!;
    expect(g / pipeFlow(1.5, STEEL.DN15, STEEL.EPS, 1, W).gradientPaPerM).toBeCloseTo(1, 2);
    ctx.doc.design.maxVelocityMps = 5;
    ctx.doc.design.targetGradientPaPerM = g;
    expect(suggestSize(ctx, 0, 1.5)).toBe("DN15");
  });

  it("the catalogue's bores and roughness, built afresh, give the same sizes", async () => {
    // suggestSize builds each material's columns once per module: a fresh module builds them in this test
    vi.resetModules();
    const fresh = await import("./pipe-results");
    const r15 = pipeFlow(1.5, STEEL.DN15, STEEL.EPS, 1, W).gradientPaPerM;
    const { ctx } = edited(steelP1);
    ctx.doc.design.maxVelocityMps = 5;
    ctx.doc.design.targetGradientPaPerM = 0.97 * r15;
    expect(fresh.suggestSize(ctx, 0, 1.5)).toBe("DN20");
    ctx.doc.design.targetGradientPaPerM = 1.03 * r15;
    expect(fresh.suggestSize(ctx, 0, 1.5)).toBe("DN15");
    // copper: 15 mm at 0.26 m³/h (v 0.497 m/s) under a 0.6 m/s limit; 10 mm (1.19 m/s) is over it
    const cu = edited().ctx;
    cu.doc.design.maxVelocityMps = 0.6;
    cu.doc.design.targetGradientPaPerM = 5000;
    expect(fresh.suggestSize(cu, 0, 0.26)).toBe("15");
    expect(fresh.suggestSize(cu, 0, 0.26)).toBe("15"); // the second call reads the built columns
  });
});

describe("no size", () => {
  it("no flow, no suggestion", () => {
    const { ctx } = edited();
    expect(suggestSize(ctx, 0, 0)).toBeNull();
    expect(suggestSize(ctx, 0, 5e-10)).toBeNull();
  });

  it("a flow of exactly the 1e-9 m³/h tolerance is sized (≥)", () => {
    // 1e-9 m³/h: v ≈ 1e-9 m/s, laminar, far inside both limits — the smallest copper size, 10 mm
    const { ctx } = edited();
    expect(suggestSize(ctx, 0, 1e-9)).toBe("10");
  });

  it("null when no size of the material meets the limits", () => {
    // 0.26 m³/h in copper 54 (d 51.6 mm): v = 0.0345 m/s, above a 0.03 m/s limit
    const { ctx } = edited();
    ctx.doc.design.maxVelocityMps = 0.03;
    expect(pipeFlow(0.26, 51.6, COPPER_EPS_MM, 1, W).v).toBeGreaterThan(0.03);
    expect(suggestSize(ctx, 0, 0.26)).toBeNull();
  });

  it("null, not an error, for a flow too large for any size's Reynolds number to be computed", () => {
    // 1e308 m³/h: v = Q/A is 1e307 m/s or more in every bore (Re = v·d/ν overflows): above the limit, so no size is tried
    const { ctx } = edited();
    expect(suggestSize(ctx, 0, 1e308)).toBeNull();
  });
});

describe("fluid checks", () => {
  it("refuses a density or viscosity that is not positive and finite, naming it", () => {
    const { ctx } = edited();
    const fluid = ctx.fluid!;
    const with_ = (densityKgM3: number, kinematicViscosityM2s: number) => {
      ctx.fluid = { ...fluid, densityKgM3, kinematicViscosityM2s };
      return () => suggestSize(ctx, 0, 0.26);
    };
    for (const bad of [0, -990, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(with_(bad, fluid.kinematicViscosityM2s)).toThrow(new RangeError(`densityKgM3 must be > 0 and finite, got ${bad}`));
      expect(with_(fluid.densityKgM3, bad)).toThrow(new RangeError(`kinematicViscosityM2s must be > 0 and finite, got ${bad}`));
    }
    expect(with_(fluid.densityKgM3, fluid.kinematicViscosityM2s)()).toBe("15");
    // a viscosity so small (1e-320 m²/s, positive and finite) that Re = v·d/ν overflows
    expect(with_(fluid.densityKgM3, 1e-320)).toThrow(new RangeError("re must be ≥ 0 and finite, got Infinity"));
    // sizes over the velocity limit are ruled out before any Reynolds number is computed: with every
    // size over a 0.01 m/s limit (54 mm runs at 0.0345 m/s) the same fluid gives no size, not an error
    ctx.doc.design.maxVelocityMps = 0.01;
    expect(with_(fluid.densityKgM3, 1e-320)()).toBeNull(); // 0.50 m/s, ≈ 280 Pa/m within 1 m/s, 300 Pa/m
  });
});
