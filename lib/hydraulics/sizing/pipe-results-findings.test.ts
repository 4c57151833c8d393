/**
 * Per-pipe findings of the design results: `pipe.velocity-high` above design.maxVelocityMps,
 * `pipe.gradient-high` above design.targetGradientPaPerM (both limits themselves pass), `pipe.no-size`
 * when no catalogue size meets both, and the one `pipe.no-flow` note. Velocities and gradients are
 * hand calculations (Darcy–Weisbach with Colebrook, testing/hand-calc.ts) on EN 1057 copper bores.
 */
import { describe, expect, it } from "vitest";
import { Findings } from "@/lib/hydraulics/findings/finding";
import { COPPER_EPS_MM, COPPER_ID_MM, pipeFlow, WATER } from "@/lib/hydraulics/testing/hand-calc";
import { contextOf } from "@/lib/hydraulics/testing/context-of";
import { smallSystem, type SmallSystem } from "@/lib/hydraulics/testing/small-system";
import { pipeResults } from "./pipe-results";

/** Water at the small system's 42.5 °C mean, references §1.1, linearly between 40 and 45 °C. */
const W = { rho: (WATER[40].rho + WATER[45].rho) / 2, cp: 0, nu: (WATER[40].nu + WATER[45].nu) / 2 };
/** 0.26 m³/h in p1, copper 22 (d 20.2 mm): v = 0.2254 m/s, Re ≈ 7,230, R ≈ 36 Pa/m. */
const P1 = pipeFlow(0.26, COPPER_ID_MM["22"], COPPER_EPS_MM, 1, W);

/** The small system with every pipe flowing 0.26 m³/h except those named (no flow), and the design limits given. */
function run(limits: { maxVelocityMps?: number; targetGradientPaPerM?: number }, noFlow: string[] = [], edit: (d: SmallSystem) => void = () => {}) {
  const d = smallSystem();
  edit(d);
  const { ctx, findings } = contextOf(d);
  Object.assign(ctx.doc.design, { maxVelocityMps: 5, targetGradientPaPerM: 5000 }, limits);
  const q = new Float64Array(ctx.model.links.length);
  ctx.doc.pipes.forEach((p, i) => (q[ctx.model.pipeLink[i]!] = noFlow.includes(p.id) ? 0 : 0.26));
  return { ctx, findings, q };
}
const about = (findings: Findings, code: string, ref = "p1") => findings.list.filter((f) => f.code === code && f.refs.includes(ref));

describe("velocity above the limit", () => {
  it("2.5 % over a 0.22 m/s limit: a warning naming the pipe, both speeds, the mode and the size that would do", () => {
    expect(P1.v).toBeCloseTo(0.2254, 4);
    const { ctx, findings, q } = run({ maxVelocityMps: 0.22 });
    pipeResults(ctx, q, "heating");
    const [f] = about(findings, "pipe.velocity-high");
    expect(f!.severity).toBe("warning");
    // 28 mm (d 26.2 mm) runs at 0.26/3600/(π·0.0262²/4) = 0.134 m/s
    expect(f!.message).toBe("pipe p1: 0.23 m/s in heating mode is above the 0.22 m/s limit; 28 would do");
    expect(f!.refs).toEqual(["p1"]);
    expect(f!.fields).toEqual(["design.maxVelocityMps"]);
  });

  it("2 % under a 0.23 m/s limit, and exactly at it: no warning", () => {
    const under = run({ maxVelocityMps: 0.23 });
    const rows = pipeResults(under.ctx, under.q, "heating");
    expect(about(under.findings, "pipe.velocity-high")).toHaveLength(0);
    // the engine's own velocity made the limit: v ≤ limit passes
    const at = run({ maxVelocityMps: rows[0]!.velocityMps! });
    pipeResults(at.ctx, at.q, "heating");
    expect(about(at.findings, "pipe.velocity-high")).toHaveLength(0);
  });

  it("no size would do: the message stops at the limit, and pipe.no-size names the material, limits and flow", () => {
    // 0.26 m³/h in copper 54 (d 51.6 mm) runs at 0.0345 m/s, over 0.03 m/s
    expect(pipeFlow(0.26, 51.6, COPPER_EPS_MM, 1, W).v).toBeGreaterThan(0.03);
    const { ctx, findings, q } = run({ maxVelocityMps: 0.03 });
    const rows = pipeResults(ctx, q, "hot-water");
    expect(rows[0]!.suggestedSize).toBeNull();
    expect(about(findings, "pipe.velocity-high")[0]!.message).toBe("pipe p1: 0.23 m/s in hot-water mode is above the 0.03 m/s limit");
    const [n] = about(findings, "pipe.no-size");
    expect(n!.severity).toBe("warning");
    expect(n!.message).toBe("pipe p1: no copper size in the catalogue meets 0.03 m/s and 5000 Pa/m at 0.260 m³/h");
    expect(n!.refs).toEqual(["p1"]);
    expect(n!.fields).toEqual(["design.maxVelocityMps", "design.targetGradientPaPerM"]);
  });

  it("a pipe with a suggested size has no pipe.no-size", () => {
    const { ctx, findings, q } = run({ maxVelocityMps: 0.22 });
    const rows = pipeResults(ctx, q, "heating");
    expect(rows.every((r) => r.suggestedSize !== null)).toBe(true);
    expect(findings.list.filter((f) => f.code === "pipe.no-size")).toHaveLength(0);
  });
});

describe("gradient above the target", () => {
  it("3 % over the target: a warning naming the pipe, both gradients, the mode and the size that would do", () => {
    const target = Math.round(0.97 * P1.gradientPaPerM);
    const { ctx, findings, q } = run({ targetGradientPaPerM: target });
    pipeResults(ctx, q, "heating");
    const [f] = about(findings, "pipe.gradient-high");
    expect(f!.severity).toBe("warning");
    // 28 mm: R ≈ 11 Pa/m, well inside
    expect(pipeFlow(0.26, COPPER_ID_MM["28"], COPPER_EPS_MM, 1, W).gradientPaPerM).toBeLessThan(0.5 * target);
    expect(f!.message).toBe(`pipe p1: ${P1.gradientPaPerM.toFixed(0)} Pa/m in heating mode is above the ${target} Pa/m target; 28 would do`);
    expect(f!.refs).toEqual(["p1"]);
    expect(f!.fields).toEqual(["design.targetGradientPaPerM"]);
  });

  it("3 % under the target, and exactly at it: no warning", () => {
    const under = run({ targetGradientPaPerM: 1.03 * P1.gradientPaPerM });
    const rows = pipeResults(under.ctx, under.q, "heating");
    expect(about(under.findings, "pipe.gradient-high")).toHaveLength(0);
    expect(rows[0]!.gradientPaPerM! / P1.gradientPaPerM).toBeCloseTo(1, 2);
    const at = run({ targetGradientPaPerM: rows[0]!.gradientPaPerM! });
    pipeResults(at.ctx, at.q, "heating");
    expect(about(at.findings, "pipe.gradient-high")).toHaveLength(0);
  });

  it("no size would do: the message stops at the target", () => {
    // 0.26 m³/h in copper 54 (d 51.6 mm): v 0.0345 m/s, Re ≈ 2,800, R of order 32·ρ·ν·v/d² ≈ 0.26 Pa/m or more — far above 0.01 Pa/m
    const { ctx, findings, q } = run({ targetGradientPaPerM: 0.01 });
    pipeResults(ctx, q, "heating");
    expect(about(findings, "pipe.gradient-high")[0]!.message).toBe(`pipe p1: ${P1.gradientPaPerM.toFixed(0)} Pa/m in heating mode is above the 0.01 Pa/m target`);
  });
});

describe("flows at the 1e-9 m³/h tolerance", () => {
  it("a flow of exactly 1e-9 m³/h is kept, and with no size suggested raises no pipe.no-size", () => {
    // 1e-9 m³/h in 54 mm copper is 1.3e-10 m/s: above a 1e-12 m/s limit, so no size would do
    const { ctx, findings, q } = run({ maxVelocityMps: 1e-12 });
    q[ctx.model.pipeLink[0]!] = 1e-9;
    const row = pipeResults(ctx, q, "heating")[0]!;
    expect(row.flowM3h).toBe(1e-9);
    expect(row.suggestedSize).toBeNull();
    expect(about(findings, "pipe.no-size")).toHaveLength(0);
  });
});

describe("pipes without flow", () => {
  it("every pipe flowing: no pipe.no-flow note", () => {
    const { ctx, findings, q } = run({});
    pipeResults(ctx, q, "heating");
    expect(findings.list.filter((f) => f.code === "pipe.no-flow")).toHaveLength(0);
  });

  it("one pipe: the note speaks of it in the singular and names it", () => {
    const { ctx, findings, q } = run({}, ["pev"]);
    pipeResults(ctx, q, "heating");
    const nf = findings.list.filter((f) => f.code === "pipe.no-flow");
    expect(nf).toHaveLength(1);
    expect(nf[0]!.severity).toBe("info");
    expect(nf[0]!.refs).toEqual(["pev"]);
    expect(nf[0]!.message).toBe(
      "1 pipe carries no water when sized — legs to the expansion vessel and other accessories, shut valves, or circuits a mode does not use — so it has no Reynolds number, friction factor or size suggestion",
    );
  });

  it("two pipes: in the plural, naming both", () => {
    const { ctx, findings, q } = run({}, ["pev", "psv"]);
    pipeResults(ctx, q, "heating");
    const nf = findings.list.filter((f) => f.code === "pipe.no-flow");
    expect(nf[0]!.refs).toEqual(["pev", "psv"]);
    expect(nf[0]!.message).toBe(
      "2 pipes carry no water when sized — legs to the expansion vessel and other accessories, shut valves, or circuits a mode does not use — so they have no Reynolds number, friction factor or size suggestion",
    );
  });

  it("with a sink the ids go there and no note is raised here", () => {
    const { ctx, findings, q } = run({}, ["pev", "psv"]);
    const sink: string[] = ["earlier"];
    pipeResults(ctx, q, "heating", sink);
    expect(sink).toEqual(["earlier", "pev", "psv"]);
    expect(findings.list.filter((f) => f.code === "pipe.no-flow")).toHaveLength(0);
  });
});

describe("what each row rests on", () => {
  it("nothing by default; the assumed values given otherwise (not for a pipe without flow)", () => {
    const a = run({}, ["pev"]);
    const plain = pipeResults(a.ctx, a.q, "heating");
    expect(plain.find((r) => r.id === "p1")!.restsOn).toEqual([]);
    const b = run({}, ["pev"]);
    const rested = pipeResults(b.ctx, b.q, "heating", undefined, ["loop.split"]);
    expect(rested.find((r) => r.id === "p1")!.restsOn).toEqual(["loop.split"]);
    expect(rested.find((r) => r.id === "pev")!.restsOn).toEqual([]);
  });
});

describe("a pipe whose size is not in the catalogue", () => {
  const unknownSize = (d: SmallSystem) => (d.pipes[0]!.size = "21");
  it("has no velocity, drop or gradient, but a suggested size from its flow and material", () => {
    const { ctx, findings, q } = run({ maxVelocityMps: 1, targetGradientPaPerM: 300 }, [], unknownSize);
    expect(findings.list.some((f) => f.code === "input.pipe-size" && f.refs.includes("p1"))).toBe(true);
    const row = pipeResults(ctx, q, "heating", undefined, ["loop.split"])[0]!;
    expect(row).toMatchObject({ id: "p1", flowM3h: 0.26, velocityMps: null, reynolds: null, frictionFactor: null, pressureDropKpa: null, gradientPaPerM: null });
    // 15 mm: 0.50 m/s and ≈ 280 Pa/m within 1 m/s and 300 Pa/m; 10 mm runs at 1.19 m/s (pipe-results.test.ts)
    expect(row.suggestedSize).toBe("15");
    expect(row.restsOn).toEqual(["loop.split"]);
  });

  it("a flow that is not a number gets no suggestion", () => {
    const { ctx, q } = run({}, [], unknownSize);
    q[ctx.model.pipeLink[0]!] = Number.NaN;
    const row = pipeResults(ctx, q, "heating")[0]!;
    expect(row.flowM3h).toBeNull();
    expect(row.suggestedSize).toBeNull();
  });
});
