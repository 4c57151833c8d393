/**
 * Branch and bound over the pipes' sizes, for circuit sets the tree DP does
 * not take (reverse return, loops). Depth first, the pipes shared by the most
 * circuits first, each pipe's sizes in order of reduced cost. A node is cut
 * when (a) some circuit cannot get within its limit even with every pipe
 * still open at its least drop, or (b) its Lagrangian bound — the reduced
 * costs of the fixed pipes plus the least reduced cost of each open pipe plus
 * the constant (lagrange.ts; valid for any λ ≥ 0) — is no better than the
 * best choice found. Finishing the search proves the best choice optimal for
 * the fixed flows; a node budget stops it otherwise, and the root bound then
 * gives the gap.
 */
import { relax } from "./lagrange";
import { circuitsOfPipes, coeff, evaluate, FEAS_TOL_KPA, type Problem } from "./problem";
import type { Solved } from "./tree-dp";

export function solveBranchAndBound(p: Problem, nodeBudget = 400_000, start: Int32Array | null = null): Solved {
  const root = relax(p, 150, start);
  let best = root.best;
  let bestObj = root.bestObjective;
  const n = p.pipes.length;
  const lists = circuitsOfPipes(p);
  const order = [...p.pipes.keys()].sort((a, b) => lists[b]!.circuit.length - lists[a]!.circuit.length || a - b);
  const minA = p.pipes.map((pipe, i) => lists[i]!.circuit.map((j, t) => Math.min(...pipe.options.map((_, s) => coeff(p, j, lists[i]!.at[t]!, s)))));
  const least = root.reduced.map((r) => Math.min(...r));
  const optionOrder = root.reduced.map((r) => [...r.keys()].sort((a, b) => r[a]! - r[b]!));
  const limit = p.circuits.map((c) => p.groups[c.group]!.limitKpa + FEAS_TOL_KPA);
  // each circuit's Δp with every pipe at its least drop, updated as pipes are fixed
  const reach = Float64Array.from(p.circuits, (c, j) => {
    let v = c.fixedKpa;
    for (let t = 0; t < c.pipes.length; t++) v += Math.min(...p.pipes[c.pipes[t]!]!.options.map((_, s) => coeff(p, j, t, s)));
    return v;
  });
  let openLeast = least.reduce((a, b) => a + b, 0);
  const choice = new Int32Array(n);
  let nodes = 0;
  let complete = true;
  const tol = (x: number) => 1e-9 * Math.max(1, Math.abs(x));

  const dive = (depth: number, fixedReduced: number): void => {
    if (nodes++ > nodeBudget) {
      complete = false;
      return;
    }
    if (depth === n) {
      const e = evaluate(p, choice);
      if (e.feasible && e.objective < bestObj - tol(bestObj)) {
        bestObj = e.objective;
        best = Int32Array.from(choice);
      }
      return;
    }
    const i = order[depth]!;
    const l = lists[i]!;
    openLeast -= least[i]!;
    for (const s of optionOrder[i]!) {
      if (!complete) break;
      const bound = root.constant + fixedReduced + root.reduced[i]![s]! + openLeast;
      if (bound >= bestObj - tol(bestObj)) continue;
      let ok = true;
      for (let k = 0; k < l.circuit.length; k++) {
        const j = l.circuit[k]!;
        reach[j] = reach[j]! + coeff(p, j, l.at[k]!, s) - minA[i]![k]!;
        if (reach[j]! > limit[j]!) ok = false;
      }
      if (ok) {
        choice[i] = s;
        dive(depth + 1, fixedReduced + root.reduced[i]![s]!);
      }
      for (let k = 0; k < l.circuit.length; k++) {
        const j = l.circuit[k]!;
        reach[j] = reach[j]! - coeff(p, j, l.at[k]!, s) + minA[i]![k]!;
      }
    }
    openLeast += least[i]!;
  };
  dive(0, 0);
  if (!best) return { choice: null, objective: Infinity, exact: complete, lowerBound: complete ? Infinity : root.bound, method: "branch-and-bound" };
  return { choice: best, objective: bestObj, exact: complete, lowerBound: complete ? bestObj : Math.min(root.bound, bestObj), method: "branch-and-bound" };
}
