/**
 * Pipe verdicts on each side of their limits: `pipe.velocity-high` when the design
 * velocity is above design.maxVelocityMps, `pipe.gradient-high` when the friction
 * gradient is above design.targetGradientPaPerM, and the suggested size — the
 * smallest catalogue size of the material meeting both. Velocity v = Q/(πd²/4)
 * and the gradient R = f/d·ρv²/2 (Darcy–Weisbach, Colebrook) are worked out here
 * for 7 kW at 45/35 °C (IAPWS water at 40 °C) in EN 1057 copper.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { COPPER_EPS_MM, COPPER_ID_MM, flowM3h, pipeFlow, WATER } from "@/lib/hydraulics/testing/hand-calc";

const W = WATER[40];
const q = flowM3h(7000, 10, W); // 0.60769 m³/h
const at = (size: keyof typeof COPPER_ID_MM) => pipeFlow(q, COPPER_ID_MM[size], COPPER_EPS_MM, 1, W);

function run(maxVelocityMps: number, targetGradientPaPerM: number, size = "22") {
  const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size, lengthM });
  const out = calculate({
    format: "loopwright/schematic", version: 1, name: "pipe limits", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps, targetGradientPaPerM },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 8, kv: 6, waterVolumeL: 2, pumpCurve: [[0, 80], [1, 60], [2, 0]] } },
      { id: "hl", type: "heat-load", props: { heatLoadW: 7000, kv: 3, waterVolumeL: 2 } },
    ],
    pipes: [cu("f", "hp.flow", "hl.flow", 5), cu("r", "hl.return", "hp.return", 5)],
  });
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  const r = out.results;
  const f = r.modes.find((m) => m.mode === "heating")!.pipes.find((p) => p.id === "f")!;
  const named = (code: string) => r.findings.filter((x) => x.code === code).flatMap((x) => x.refs);
  return { f, velocityHigh: named("pipe.velocity-high"), gradientHigh: named("pipe.gradient-high"), noSize: named("pipe.no-size") };
}

describe("velocity and gradient limits, suggested size (7 kW at ΔT 10 K: 0.60769 m³/h)", () => {
  const v22 = at("22").v, r22 = at("22").gradientPaPerM;

  it("hand numbers: Cu 15 1.162 m/s; Cu 22 0.5267 m/s, Re 16 176, R ≈ 185 Pa/m; Cu 28 0.3131 m/s", () => {
    expect(q).toBeCloseTo(0.60769, 5);
    expect(at("15").v).toBeCloseTo(1.162, 3);
    expect(v22).toBeCloseTo(0.5267, 4);
    expect(at("22").re).toBeCloseTo(16176, -1);
    expect(r22).toBeGreaterThan(180);
    expect(r22).toBeLessThan(190);
    expect(at("28").v).toBeCloseTo(0.3131, 4);
  });

  // v: same bore → the flow's ρ·cp (≤ 0.05 %); R: Colebrook both sides, ν to 0.3 % moves f ≤ 0.1 % → 0.3 % in all.
  it("the Cu 22 pipe's velocity and gradient are the hand values", () => {
    const { f } = run(1, 300);
    expect(Math.abs(f.velocityMps! / v22 - 1)).toBeLessThan(1e-3);
    expect(Math.abs(f.gradientPaPerM! / r22 - 1)).toBeLessThan(3e-3);
  });

  it("velocity limit 2 % above v: no velocity finding, 22 suggested; 2 % below: pipe.velocity-high naming f and r, 28 suggested", () => {
    const above = run(1.02 * v22, 5000);
    expect(above.velocityHigh).toEqual([]);
    expect(above.f.suggestedSize).toBe("22");
    const below = run(0.98 * v22, 5000);
    expect(below.velocityHigh).toEqual(["f", "r"]);
    expect(below.f.suggestedSize).toBe("28");
  });

  it("gradient target 2 % above R: no gradient finding, 22 suggested; 2 % below: pipe.gradient-high naming f and r, 28 suggested", () => {
    const above = run(5, 1.02 * r22);
    expect(above.gradientHigh).toEqual([]);
    expect(above.f.suggestedSize).toBe("22");
    const below = run(5, 0.98 * r22);
    expect(below.gradientHigh).toEqual(["f", "r"]);
    expect(below.f.suggestedSize).toBe("28");
  });

  it("the suggestion does not depend on the size drawn: a Cu 15 run at the same flow also gets 22", () => {
    const { f, velocityHigh } = run(1.02 * v22, 1.02 * r22, "15");
    expect(f.suggestedSize).toBe("22");
    expect(velocityHigh).toEqual(["f", "r"]); // 1.162 m/s in Cu 15
  });

  it("both limits below what Cu 54 gives at this flow: no size suggested, pipe.no-size naming the pipes", () => {
    const v54 = pipeFlow(q, 51.6, COPPER_EPS_MM, 1, W).v; // EN 1057 54 × 1.2 (references §4.1): 0.0807 m/s
    const { f, noSize } = run(0.9 * v54, 5000);
    expect(f.suggestedSize).toBeNull();
    expect(noSize).toEqual(["f", "r"]);
  });
});
