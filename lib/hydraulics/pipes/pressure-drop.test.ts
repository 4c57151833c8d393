import { describe, expect, it } from "vitest";
import { fluidProperties } from "../fluids";
import { pipeDpDerivative, pipePressureDrop, type PipePressureDropInput } from "./pressure-drop";

const rel = (a: number, e: number) => Math.abs(a / e - 1);

describe("Darcy–Weisbach vs hydronic reference cases (references.md §3.4, computed: Colebrook + IAPWS water)", () => {
  // Printed to 3–5 significant digits: v and R to 3 digits (≤ 0.15 % rounding), Re to 5, f to 4.
  // Our water properties match IAPWS-95 to ≤ 0.1 %, hence: v 0.2 %, Re 0.2 %, f 0.2 %, R 0.3 %.
  it.each([
    ["Cu 15×0.7", 13.6, 0.0015, 0.1, 50, 0.688, 16_925, 0.0272, 468],
    ["Cu 22×0.9", 20.2, 0.0015, 0.25, 50, 0.78, 28_488, 0.02397, 357],
    ["Cu 28×0.9", 26.2, 0.0015, 0.5, 50, 0.927, 43_929, 0.0217, 352],
    ["PE-X 16×2", 12.0, 0.007, 0.05, 35, 0.442, 7_333, 0.03434, 278],
    ["PE-X 20×2", 16.0, 0.007, 0.1, 35, 0.497, 11_000, 0.03082, 237],
    ["steel DN25", 27.3, 0.045, 0.5, 50, 0.854, 42_159, 0.02619, 346],
    ["steel DN25 aged ε 0.2", 27.3, 0.2, 0.5, 50, 0.854, 42_159, 0.03589, 474],
  ])("%s: d %f mm, ε %f mm, %f L/s at %d °C", (_name, dMm, epsMm, qLs, t, v, re, f, r) => {
    const w = fluidProperties({ kind: "water" }, t);
    const out = pipePressureDrop({
      flowM3s: qLs / 1000, innerDiameterM: dMm / 1000, lengthM: 10, roughnessM: epsMm / 1000,
      densityKgM3: w.densityKgM3, kinematicViscosityM2s: w.kinematicViscosityM2s, sumK: 0,
    });
    expect(rel(out.velocityMps, v)).toBeLessThan(2e-3);
    expect(rel(out.reynolds, re)).toBeLessThan(2e-3);
    expect(rel(out.frictionFactor, f)).toBeLessThan(2e-3);
    expect(rel(out.gradientPaPerM, r)).toBeLessThan(3e-3);
    expect(out.regime).toBe("turbulent");
    expect(out.frictionDpPa).toBeCloseTo(out.gradientPaPerM * 10, 9);
  });

  it("stainless pipe, water 15 °C, D 5 cm, 6 L/s, 60 m → f 0.01719, Δp ≈ 96.2 kPa (references.md §3.2 row 8, computed)", () => {
    // Printed to 4 / 3 digits → 0.1 % / 0.2 %.
    const out = pipePressureDrop({
      flowM3s: 0.006, innerDiameterM: 0.05, lengthM: 60, roughnessM: 0.002e-3,
      densityKgM3: 999.1, kinematicViscosityM2s: 1.138e-3 / 999.1, sumK: 0,
    });
    expect(rel(out.frictionFactor, 0.01719)).toBeLessThan(1e-3);
    expect(rel(out.dpPa, 96_200)).toBeLessThan(2e-3);
  });
});

const base: PipePressureDropInput = {
  flowM3s: 0.25e-3, innerDiameterM: 0.0202, lengthM: 12, roughnessM: 1.5e-6,
  densityKgM3: 988.0, kinematicViscosityM2s: 0.553e-6, sumK: 2.5,
};

describe("pipePressureDrop behaviour", () => {
  it("fittings Δp = ΣK·ρv²/2 and Δp = friction + fittings", () => {
    const out = pipePressureDrop(base);
    expect(out.fittingsDpPa).toBeCloseTo((2.5 * 988 * out.velocityMps ** 2) / 2, 9);
    expect(out.dpPa).toBeCloseTo(out.frictionDpPa + out.fittingsDpPa, 9);
  });
  it("Δp has the sign of the flow; zero flow gives zeros (no NaN)", () => {
    const fwd = pipePressureDrop(base);
    const rev = pipePressureDrop({ ...base, flowM3s: -base.flowM3s });
    expect(rev.dpPa).toBeCloseTo(-fwd.dpPa, 9);
    expect(rev.velocityMps).toBeLessThan(0);
    expect(rev.gradientPaPerM).toBeCloseTo(fwd.gradientPaPerM, 9);
    const zero = pipePressureDrop({ ...base, flowM3s: 0 });
    expect([zero.dpPa, zero.frictionDpPa, zero.fittingsDpPa, zero.reynolds, zero.frictionFactor]).toEqual([0, 0, 0, 0, 0]);
  });
  it("a vanishing flow (Q = 1e-320 m³/s) gives finite, tiny results, not NaN", () => {
    const out = pipePressureDrop({ ...base, flowM3s: 1e-320 });
    for (const v of Object.values(out)) if (typeof v === "number") expect(Number.isFinite(v)).toBe(true);
    expect(Math.abs(out.dpPa)).toBeLessThan(1e-300);
  });
  it("laminar flow follows Hagen–Poiseuille Δp = 128·μ·L·Q/(π·D⁴)", () => {
    const q = 1e-6; // Re ≈ 114
    const out = pipePressureDrop({ ...base, flowM3s: q, sumK: 0 });
    const mu = base.kinematicViscosityM2s * base.densityKgM3;
    expect(out.regime).toBe("laminar");
    expect(rel(out.dpPa, (128 * mu * base.lengthM * q) / (Math.PI * base.innerDiameterM ** 4))).toBeLessThan(1e-12);
  });
  it.each([
    ["innerDiameterM", { innerDiameterM: 0 }], ["lengthM", { lengthM: -1 }], ["densityKgM3", { densityKgM3: 0 }],
    ["kinematicViscosityM2s", { kinematicViscosityM2s: Number.NaN }], ["sumK", { sumK: -0.1 }], ["roughnessM", { roughnessM: 0.03 }], ["flowM3s", { flowM3s: Number.NaN }],
  ])("throws RangeError naming %s", (name, patch) => {
    expect(() => pipePressureDrop({ ...base, ...patch })).toThrow(new RegExp(name));
  });
});

describe("pipeDpDerivative", () => {
  it("at Q = 0 equals the laminar slope 128·μ·L/(π·D⁴)", () => {
    const mu = base.kinematicViscosityM2s * base.densityKgM3;
    const slope = (128 * mu * base.lengthM) / (Math.PI * base.innerDiameterM ** 4);
    expect(rel(pipeDpDerivative({ ...base, flowM3s: 0 }), slope)).toBeLessThan(1e-6);
  });
  it("turbulent: between 1.75·Δp/Q (Blasius, smooth) and 2·Δp/Q (fully rough / fittings)", () => {
    const out = pipePressureDrop(base);
    const d = pipeDpDerivative(base);
    expect(d).toBeGreaterThan((1.75 * out.dpPa) / base.flowM3s);
    expect(d).toBeLessThan((2 * out.dpPa) / base.flowM3s);
  });
  it("is the same for reverse flow (Δp odd in Q)", () => {
    expect(rel(pipeDpDerivative({ ...base, flowM3s: -base.flowM3s }), pipeDpDerivative(base))).toBeLessThan(1e-6);
  });
});
