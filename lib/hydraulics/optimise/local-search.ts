/**
 * Single-pipe moves on a choice of sizes (a heuristic, no optimality claim):
 * `repair` brings every circuit within its pump's limit by the moves that
 * remove the most excess Δp per unit of added cost; `improve` then takes any
 * move that lowers the objective (pipe cost + energy) and keeps every limit,
 * until none is left (a 1-opt local optimum).
 */
import { circuitsOfPipes, coeff, evaluate, FEAS_TOL_KPA, type Problem } from "./problem";

function drops(p: Problem, choice: Int32Array): Float64Array {
  return evaluate(p, choice).dp;
}

/** The choice made feasible in place, or null when single moves cannot get there. */
export function repair(p: Problem, choice: Int32Array): Int32Array | null {
  const lists = circuitsOfPipes(p);
  const dp = drops(p, choice);
  const limitOf = (j: number) => p.groups[p.circuits[j]!.group]!.limitKpa + FEAS_TOL_KPA;
  const excess = (j: number, v: number) => Math.max(0, v - limitOf(j));
  for (let guard = 0; guard < 50 * p.pipes.length + 10; guard++) {
    const bad: number[] = [];
    dp.forEach((v, j) => v > limitOf(j) && bad.push(j));
    if (bad.length === 0) return choice;
    const seen = new Set<number>();
    let bestScore = 0;
    let move: [number, number] | null = null;
    for (const j of bad) {
      for (const i of p.circuits[j]!.pipes) {
        if (seen.has(i)) continue;
        seen.add(i);
        const l = lists[i]!;
        const cur = choice[i]!;
        for (let s = 0; s < p.pipes[i]!.options.length; s++) {
          if (s === cur) continue;
          let gain = 0;
          for (let t = 0; t < l.circuit.length; t++) {
            const k = l.circuit[t]!;
            const d = coeff(p, k, l.at[t]!, s) - coeff(p, k, l.at[t]!, cur);
            gain += excess(k, dp[k]!) - excess(k, dp[k]! + d);
          }
          if (!(gain > 1e-12)) continue;
          const extra = p.pipes[i]!.options[s]!.cost - p.pipes[i]!.options[cur]!.cost;
          const score = gain / Math.max(extra, 1e-9);
          if (score > bestScore) {
            bestScore = score;
            move = [i, s];
          }
        }
      }
    }
    if (!move) return null;
    const [i, s] = move;
    const l = lists[i]!;
    for (let t = 0; t < l.circuit.length; t++) {
      const k = l.circuit[t]!;
      dp[k] = dp[k]! + coeff(p, k, l.at[t]!, s) - coeff(p, k, l.at[t]!, choice[i]!);
    }
    choice[i] = s;
  }
  return null;
}

/** Lowers the objective in place by single feasible moves until none helps. */
export function improve(p: Problem, choice: Int32Array): void {
  let current = evaluate(p, choice);
  for (let pass = 0; pass < 100; pass++) {
    let changed = false;
    for (let i = 0; i < p.pipes.length; i++) {
      const cur = choice[i]!;
      for (let s = 0; s < p.pipes[i]!.options.length; s++) {
        if (s === cur) continue;
        choice[i] = s;
        const e = evaluate(p, choice);
        if (e.feasible && e.objective < current.objective - 1e-12 * Math.max(1, Math.abs(current.objective))) {
          current = e;
          changed = true;
          break;
        }
        choice[i] = cur;
      }
    }
    if (!changed) return;
  }
}

/** Objective of a feasible choice found from "every pipe at its least drop", repaired and improved (Infinity: none found). */
export function heuristicUpper(p: Problem): number {
  const choice = Int32Array.from(p.pipes, (pipe) => {
    let best = 0;
    const total = (s: number) => pipe.options[s]!.dp.reduce((a, b) => a + b, 0);
    for (let s = 1; s < pipe.options.length; s++) if (total(s) < total(best)) best = s;
    return best;
  });
  const fixed = repair(p, choice);
  if (!fixed) return Infinity;
  improve(p, fixed);
  const e = evaluate(p, fixed);
  return e.feasible ? e.objective : Infinity;
}
