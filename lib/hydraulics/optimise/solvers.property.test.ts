/**
 * The solvers on random abstract problems (problem.ts) against brute force:
 * the circuit-tree DP and branch and bound must reach the least objective of
 * all choices (pipe cost, or pipe cost + energy per kPa of each pump's
 * largest circuit drop), or agree that none is feasible; every Lagrangian
 * bound must lie at or below it (weak duality). Problems: circuits as
 * root-to-leaf paths of a random tree (laminar sets, several pumps and
 * modes, some pipes crossed against their flow), or as random pipe subsets.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solveBranchAndBound } from "./branch-bound";
import { relax } from "./lagrange";
import { evaluate, type Problem } from "./problem";
import { solveTreeDp } from "./tree-dp";

function brute(p: Problem): number {
  let best = Infinity;
  const choice = new Int32Array(p.pipes.length);
  const visit = (k: number) => {
    if (k === p.pipes.length) {
      const e = evaluate(p, choice);
      if (e.feasible) best = Math.min(best, e.objective);
      return;
    }
    for (let s = 0; s < p.pipes[k]!.options.length; s++) {
      choice[k] = s;
      visit(k + 1);
    }
  };
  visit(0);
  return best;
}

const u = fc.double({ min: 0, max: 1, noNaN: true, maxExcluded: true });

function build(xs: number[], laminar: boolean, life: boolean): Problem {
  let i = 0;
  const r = () => xs[i++ % xs.length]!;
  const n = 2 + Math.floor(r() * 7);
  const pipes = Array.from({ length: n }, (_, k) => ({
    id: `p${k}`,
    drawn: 0,
    options: Array.from({ length: 2 + Math.floor(r() * 3) }, () => ({ size: "x", cost: Math.round(r() * 20 * 100) / 100, dp: Float64Array.from([r() * 10, r() * 10]) })),
  }));
  const groups = Array.from({ length: 1 + Math.floor(r() * 3) }, (_, g) => ({ mode: g % 2, pumpId: `g${g}`, limitKpa: 5 + r() * 30, perKpa: life ? r() * 3 : 0 }));
  const circuits: Problem["circuits"] = [];
  if (laminar) {
    // pipe k hangs below a random earlier pipe (or the root); each leaf pipe ends a circuit
    const parent = pipes.map((_, k) => (k === 0 ? -1 : Math.floor(r() * (k + 1)) - 1));
    const isLeaf = pipes.map((_, k) => !parent.includes(k));
    pipes.forEach((_, k) => {
      if (!isLeaf[k]) return;
      const path: number[] = [];
      for (let x = k; x >= 0; x = parent[x]!) path.push(x);
      const sign = r() < 0.1 ? -1 : 1; // the whole circuit crosses one pipe against its flow
      const against = Math.floor(r() * path.length);
      circuits.push({ group: Math.floor(r() * groups.length), load: `c${k}`, fixedKpa: r() * 5, pipes: Int32Array.from(path), sign: Int8Array.from(path, (_, t) => (t === against ? sign : 1)) });
    });
  } else {
    for (let c = 0; c < 1 + Math.floor(r() * 4); c++) {
      const set = pipes.map((_, k) => k).filter(() => r() < 0.5);
      circuits.push({ group: Math.floor(r() * groups.length), load: `c${c}`, fixedKpa: r() * 5, pipes: Int32Array.from(set), sign: Int8Array.from(set, () => 1) });
    }
  }
  return { pipes, circuits, groups };
}

describe("solvers against brute force", () => {
  it.each([
    ["laminar circuit sets, pipe cost", true, false],
    ["laminar circuit sets, life-cost", true, true],
    ["crossing circuit sets, pipe cost", false, false],
    ["crossing circuit sets, life-cost", false, true],
  ])("%s", (_, laminar, life) => {
    let dpUsed = 0;
    fc.assert(
      fc.property(fc.array(u, { minLength: 200, maxLength: 200 }), (xs) => {
        const p = build(xs, laminar, life);
        const best = brute(p);
        const tol = 1e-9 * Math.max(1, Math.abs(best));
        const dp = solveTreeDp(p);
        if (dp) {
          dpUsed++;
          expect(dp.choice === null).toBe(!Number.isFinite(best));
          if (dp.choice) {
            expect(Math.abs(dp.objective - best)).toBeLessThanOrEqual(tol);
            expect(Math.abs(evaluate(p, dp.choice).objective - best)).toBeLessThanOrEqual(tol);
          }
        }
        const bb = solveBranchAndBound(p);
        expect(bb.exact).toBe(true);
        expect(bb.choice === null).toBe(!Number.isFinite(best));
        if (bb.choice) expect(Math.abs(evaluate(p, bb.choice).objective - best)).toBeLessThanOrEqual(tol);
        if (Number.isFinite(best)) expect(relax(p, 60).bound).toBeLessThanOrEqual(best + tol);
      }),
      { numRuns: 150, seed: laminar ? 11 : 12 },
    );
    if (laminar) expect(dpUsed).toBeGreaterThan(100);
  });
});
