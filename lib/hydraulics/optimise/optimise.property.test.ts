/**
 * The optimiser against exhaustive search. On random two-pipe trees (up to 12
 * pipes, 3 candidate sizes each, random prices, pump and margin — see
 * testing/random-tree.ts) every one of the 3ⁿ choices is evaluated here, on
 * the test's own account of each circuit (the radiator's path as the
 * generator built it: pipe drops by Darcy–Weisbach, Kv devices by
 * Δp = (Q/Kv)² bar, the pump's head read off its curve by linear
 * interpolation), and the cheapest choice that keeps every circuit within the
 * pump's head less the margin is the reference. The optimiser must find the
 * same cost — or the same least pipe + energy cost for the life-cost
 * objective — and must answer feasible: false exactly when no choice is.
 * A second, smaller property enumerates with the whole engine instead
 * (calculate() on every choice), so the optimiser's own circuit model is
 * checked too.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { fluidProperties } from "@/lib/hydraulics/fluids";
import { sumFittingsK } from "@/lib/hydraulics/losses/fittings";
import { findPipeSize } from "@/lib/hydraulics/pipes/catalogue";
import { pipePressureDrop } from "@/lib/hydraulics/pipes/pressure-drop";
import { randomTree, TREE_SIZES, type TreeCase } from "@/lib/hydraulics/testing/random-tree";
import { optimise } from "./request";

const stream = fc.array(fc.double({ min: 0, max: 1, noNaN: true, maxExcluded: true }), { minLength: 120, maxLength: 120 });
const rng = (xs: number[]) => {
  let i = 0;
  return () => xs[i++ % xs.length]!;
};

interface Reference {
  feasible: boolean;
  cost: number;
  /** least cost + energy (life-cost objective) */
  life: number;
}

/** Exhaustive search on the test's own model of the tree. */
function exhaustive(t: TreeCase, marginKpa: number, energyPerKpaPerM3h: number): Reference {
  const fluid = fluidProperties({ kind: "water" }, 45);
  const flowOf = (w: number) => (w / (fluid.densityKgM3 * fluid.specificHeatJkgK * 10)) * 3600;
  const pipeFlow = new Map<string, number>();
  // a run carries the loads of every circuit through it (pipes and valves alike)
  for (const c of t.circuits) for (const p of [...c.pipes, ...c.valves]) pipeFlow.set(p, (pipeFlow.get(p) ?? 0) + flowOf(c.loadW));
  const total = t.circuits.reduce((s, c) => s + flowOf(c.loadW), 0);
  const kvKpa = (q: number, kv: number) => 100 * (q / kv) ** 2 * (fluid.densityKgM3 / 1000);
  // the pump's head at the total flow: linear between the curve's points
  const [a, b] = [t.curve.findLast(([q]) => q <= total)!, t.curve.find(([q]) => q > total)!];
  const available = a[1] + ((b[1] - a[1]) * (total - a[0])) / (b[0] - a[0]);
  const pipes = t.doc.pipes;
  const drop = pipes.map((p) =>
    TREE_SIZES.map((size) => {
      const row = findPipeSize("copper", size)!;
      const q = pipeFlow.get(p.id) ?? 0;
      return pipePressureDrop({ flowM3s: q / 3600, innerDiameterM: row.innerDiameterMm / 1000, roughnessM: row.roughnessMm / 1000, lengthM: p.lengthM, sumK: sumFittingsK({}, row.innerDiameterMm), densityKgM3: fluid.densityKgM3, kinematicViscosityM2s: fluid.kinematicViscosityM2s }).dpPa / 1000;
    }),
  );
  const at = new Map(pipes.map((p, i) => [p.id, i]));
  const fixed = t.circuits.map((c) => kvKpa(flowOf(c.loadW), c.valveKv) + c.valves.reduce((s, v) => s + kvKpa(pipeFlow.get(v)!, t.valveKv[v]!), 0) + kvKpa(total, t.hpKv));
  const circuitsOf = pipes.map((p) => t.circuits.flatMap((c, j) => (c.pipes.includes(p.id) ? [j] : [])));
  const price = pipes.map((p) => TREE_SIZES.map((size) => t.prices[size]! * p.lengthM));
  const dp = Float64Array.from(fixed);
  const ref: Reference = { feasible: false, cost: Infinity, life: Infinity };
  // depth first over the pipes, each circuit's Δp and the cost kept as running sums
  const visit = (k: number, cost: number) => {
    if (k < pipes.length) {
      for (let s = 0; s < 3; s++) {
        for (const j of circuitsOf[k]!) dp[j] = dp[j]! + drop[k]![s]!;
        visit(k + 1, cost + price[k]![s]!);
        for (const j of circuitsOf[k]!) dp[j] = dp[j]! - drop[k]![s]!;
      }
      return;
    }
    let head = -Infinity;
    for (const v of dp) head = Math.max(head, v);
    if (head > available - marginKpa + 1e-9) return;
    ref.feasible = true;
    ref.cost = Math.min(ref.cost, cost);
    ref.life = Math.min(ref.life, cost + energyPerKpaPerM3h * total * head);
  };
  visit(0, 0);
  return ref;
}

describe("optimiser = exhaustive search on trees of ≤ 12 pipes, 3 sizes each", () => {
  it("finds the cheapest feasible sizes, or says none exists", () => {
    let feasible = 0;
    let infeasible = 0;
    let crossing = 0;
    fc.assert(
      fc.property(stream, fc.integer({ min: 1, max: 3 }), fc.boolean(), fc.constantFrom(0, 0, 2.5), fc.constantFrom("pipe-cost", "life-cost"), (xs, radiators, direct, margin, objective) => {
        const t = randomTree(rng(xs), 12, { radiators, direct });
        expect(t.doc.pipes.length).toBeLessThanOrEqual(12);
        const life = { years: 10, pricePerKwh: 0.25, pumpEfficiency: 0.3, hoursPerYear: 3000 };
        // P = Q·Δp/η: per kPa and per m³/h, over the life (the optimiser's life-cost.ts, worked out here)
        const perKpaPerM3h = (life.years * life.hoursPerYear * life.pricePerKwh) / 3600 / life.pumpEfficiency;
        const ref = exhaustive(t, margin, objective === "life-cost" ? perKpaPerM3h : 0);
        const r = optimise(t.doc, { objective, headMarginKpa: margin, prices: { copper: t.prices }, lifeCost: life });
        if (!r.ok) throw new Error(JSON.stringify(r.issues));
        expect(r.result.feasible).toBe(ref.feasible);
        if (!ref.feasible) {
          infeasible++;
          expect(r.result.findings.some((f) => f.severity === "error" && f.code === "optimise.infeasible")).toBe(true);
          return;
        }
        feasible++;
        if (r.result.method === "branch-and-bound") crossing++;
        expect(r.result.cost).toBeGreaterThan(0);
        if (objective === "pipe-cost") expect(Math.abs(r.result.cost - ref.cost)).toBeLessThanOrEqual(1e-9 * ref.cost);
        else expect(Math.abs(r.result.after.lifeCost! - ref.life)).toBeLessThanOrEqual(1e-7 * ref.life);
        expect(r.result.exact).toBe(true);
      }),
      { numRuns: 80, seed: 1401 },
    );
    // the generator must exercise both answers and both solvers
    expect(feasible).toBeGreaterThan(10);
    expect(infeasible).toBeGreaterThan(2);
    expect(crossing).toBeGreaterThan(2);
  }, 300_000);
});

describe("optimiser = exhaustive search with the whole engine on trees of ≤ 5 pipes", () => {
  it("no choice the engine finds within limits is cheaper than the optimiser's", () => {
    fc.assert(
      fc.property(stream, (xs) => {
        const t = randomTree(rng(xs), 5);
        const r = optimise(t.doc, { prices: { copper: t.prices } });
        if (!r.ok) throw new Error(JSON.stringify(r.issues));
        const n = t.doc.pipes.length;
        let best = Infinity;
        for (let code = 0; code < 3 ** n; code++) {
          const sizes = t.doc.pipes.map((_, i) => TREE_SIZES[Math.floor(code / 3 ** i) % 3]!);
          const doc = { ...t.doc, pipes: t.doc.pipes.map((p, i) => ({ ...p, size: sizes[i]! })) };
          const out = calculate(doc);
          if (!out.ok) throw new Error("engine refused a generated tree");
          const pump = out.results.modes[0]!.pump!;
          if (!(pump.requiredHeadKpa! <= pump.availableHeadKpa! + 1e-9)) continue;
          best = Math.min(best, doc.pipes.reduce((s, p) => s + t.prices[p.size]! * p.lengthM, 0));
        }
        expect(r.result.feasible).toBe(Number.isFinite(best));
        if (Number.isFinite(best)) expect(Math.abs(r.result.cost - best)).toBeLessThanOrEqual(1e-9 * best);
      }),
      { numRuns: 8, seed: 1402 },
    );
  }, 300_000);
});
