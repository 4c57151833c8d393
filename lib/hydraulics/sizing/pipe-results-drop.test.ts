/**
 * A pipe's drop in the design results: Darcy–Weisbach Δp = (f·L/D + ΣK)·ρv²/2 (White, Fluid
 * Mechanics, eq. 6.10), checked by hand; and a pipe or fluid that Darcy–Weisbach cannot take is
 * refused with pipePressureDrop's RangeError naming the field, never turned into numbers.
 */
import { describe, expect, it } from "vitest";
import { Findings } from "@/lib/hydraulics/findings/finding";
import { COPPER_EPS_MM, COPPER_ID_MM, pipeFlow, WATER } from "@/lib/hydraulics/testing/hand-calc";
import { smallSystem, type SmallSystem } from "@/lib/hydraulics/testing/small-system";
import { parseSchematic } from "@/lib/schematic/parse";
import { createContext } from "./context";
import { pipeResults } from "./pipe-results";

/** Water at the small system's 42.5 °C mean, references §1.1, linearly between 40 and 45 °C. */
const W = { rho: (WATER[40].rho + WATER[45].rho) / 2, cp: 0, nu: (WATER[40].nu + WATER[45].nu) / 2 };

function setUp(edit: (d: SmallSystem) => void = () => {}) {
  const d = smallSystem();
  edit(d);
  const parsed = parseSchematic(d);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  const ctx = createContext(parsed.doc, new Findings());
  const q = new Float64Array(ctx.model.links.length);
  q[ctx.model.pipeLink[0]!] = 0.26;
  return { ctx, q };
}

describe("drop with fittings", () => {
  it("p1 (copper 22, 5 m) with ΣK = 2 at 0.26 m³/h: friction plus fittings", () => {
    const { ctx, q } = setUp();
    ctx.pipeGeom[0] = { ...ctx.pipeGeom[0]!, sumK: 2 };
    const hand = pipeFlow(0.26, COPPER_ID_MM["22"], COPPER_EPS_MM, 5, W);
    // R·L ≈ 36 Pa/m × 5 m ≈ 0.18 kPa; ΣK·ρv²/2 = 2 × 991.2 × 0.2254²/2 ≈ 0.050 kPa
    const fittingsKpa = (2 * W.rho * hand.v * hand.v) / 2 / 1000;
    const row = pipeResults(ctx, q, "heating")[0]!;
    expect(row.pressureDropKpa! / (hand.dpKpa + fittingsKpa)).toBeCloseTo(1, 2); // ν interpolated to 0.15 %
    expect(row.gradientPaPerM! / hand.gradientPaPerM).toBeCloseTo(1, 2); // the gradient is straight pipe only
  });
});

describe("inputs Darcy–Weisbach cannot take", () => {
  const refuse = (change: (s: ReturnType<typeof setUp>) => void, message: string) => {
    const s = setUp();
    change(s);
    expect(() => pipeResults(s.ctx, s.q, "heating")).toThrow(new RangeError(message));
  };
  const geom = (s: ReturnType<typeof setUp>, g: Partial<NonNullable<ReturnType<typeof setUp>["ctx"]["pipeGeom"][number]>>) => {
    s.ctx.pipeGeom[0] = { ...s.ctx.pipeGeom[0]!, ...g };
  };

  it("a flow that is not finite", () => {
    refuse((s) => (s.q[s.ctx.model.pipeLink[0]!] = Number.NaN), "flowM3s must be finite, got NaN");
  });

  it("a flow whose velocity overflows", () => {
    // 1e308 m³/h through 20.2 mm: v = Q/A overflows to Infinity, and with it Re
    refuse((s) => (s.q[s.ctx.model.pipeLink[0]!] = 1e308), "re must be ≥ 0 and finite, got Infinity");
  });

  it("a bore that is not positive and finite", () => {
    refuse((s) => geom(s, { innerDiameterM: Number.POSITIVE_INFINITY }), "innerDiameterM must be > 0 and finite, got Infinity");
    refuse((s) => geom(s, { innerDiameterM: 0 }), "innerDiameterM must be > 0 and finite, got 0");
  });

  it("a length, roughness or ΣK below 0 or not finite", () => {
    for (const bad of [-1, Number.POSITIVE_INFINITY]) {
      refuse((s) => geom(s, { lengthM: bad }), `lengthM must be ≥ 0 and finite, got ${bad}`);
      refuse((s) => geom(s, { sumK: bad }), `sumK must be ≥ 0 and finite, got ${bad}`);
    }
    refuse((s) => geom(s, { roughnessM: -1e-6 }), "roughnessM must be ≥ 0 and finite, got -0.000001");
    // all three at once: the first named is the length, as pipePressureDrop checks it first
    refuse((s) => geom(s, { lengthM: -1, roughnessM: -1e-6, sumK: -1 }), "lengthM must be ≥ 0 and finite, got -1");
  });

  it("a length, roughness and ΣK of 0 are fine", () => {
    const s = setUp();
    geom(s, { lengthM: 0, roughnessM: 0, sumK: 0 });
    const row = pipeResults(s.ctx, s.q, "heating")[0]!;
    expect(row.pressureDropKpa).toBe(0); // no length, no fittings: no drop
    // smooth pipe at Re ≈ 7,230: the gradient of a hydraulically smooth 20.2 mm bore
    expect(row.gradientPaPerM! / pipeFlow(0.26, COPPER_ID_MM["22"], 0, 1, W).gradientPaPerM).toBeCloseTo(1, 2);
  });

  it("a fluid density or viscosity that is not positive and finite", () => {
    for (const bad of [0, -1, Number.POSITIVE_INFINITY]) {
      refuse((s) => (s.ctx.fluid = { ...s.ctx.fluid!, densityKgM3: bad }), `densityKgM3 must be > 0 and finite, got ${bad}`);
      refuse((s) => (s.ctx.fluid = { ...s.ctx.fluid!, kinematicViscosityM2s: bad }), `kinematicViscosityM2s must be > 0 and finite, got ${bad}`);
    }
  });

  it("a typed roughness at or above the typed bore", () => {
    // the schema allows ε up to 10 mm and a bore from 1 mm: ε ≥ D has no relative roughness below 1, so the
    // context refuses the pipe (input.pipe-roughness, findings.test.ts); given one anyway, Darcy–Weisbach throws
    for (const eps of [5, 6]) {
      const s = setUp((d) => Object.assign(d.pipes[0]!, { innerDiameterMm: 5, roughnessMm: eps }));
      expect(s.ctx.pipeGeom[0]).toBeNull();
      s.ctx.pipeGeom[0] = { innerDiameterM: 0.005, roughnessM: eps / 1000, lengthM: 5, sumK: 0 };
      expect(() => pipeResults(s.ctx, s.q, "heating")).toThrow(new RangeError(`roughnessM ${eps / 1000} must be below innerDiameterM 0.005`));
    }
  });
});
