/**
 * Lagrangian relaxation of the circuit limits (problem.ts), for looped
 * networks and circuit sets the tree DP cannot take. With a multiplier
 * λ_j ≥ 0 on each circuit's "Δp_j ≤ H_g" and the head H_g of each pump kept
 * in [its smallest possible value, its limit], the problem splits into one
 * small choice per pipe and one per pump:
 *
 *   L(λ) = Σ_i min_s [cost_i(s) + Σ_j λ_j·a_ji(s)] + Σ_j λ_j·fixed_j
 *        + Σ_g min_{H ∈ [H_lo,g, limit_g]} (K_g − Σ_{j∈g} λ_j)·H
 *
 * and every L(λ) is a lower bound on the optimum (weak duality; Fisher, "The
 * Lagrangian relaxation method for solving integer programming problems",
 * Management Science 27, 1981). λ follows the subgradient method with
 * Polyak's step θ·(UB − L)/‖g‖² (Held, Wolfe & Crowder, Math. Programming 6,
 * 1974). Each relaxed choice is repaired into a feasible one and improved
 * by single-pipe moves (local-search.ts); the best found is the upper bound.
 */
import { improve, repair } from "./local-search";
import { circuitsOfPipes, coeff, evaluate, type Problem } from "./problem";

export interface Relaxation {
  bound: number;
  lambda: Float64Array;
  /** best feasible choice found on the way, and its objective */
  best: Int32Array | null;
  bestObjective: number;
  /** reduced cost of each option at `lambda` (for branch and bound) */
  reduced: Float64Array[];
  /** the part of L(λ) that does not depend on the pipes: Σ λ·fixed + the pumps' terms */
  constant: number;
}

/** Smallest possible required head per group: every pipe at its least drop. */
export function lowestHeads(p: Problem): Float64Array {
  const h = new Float64Array(p.groups.length).fill(-Infinity);
  p.circuits.forEach((c, j) => {
    let s = c.fixedKpa;
    for (let t = 0; t < c.pipes.length; t++) {
      let m = Infinity;
      for (let o = 0; o < p.pipes[c.pipes[t]!]!.options.length; o++) m = Math.min(m, coeff(p, j, t, o));
      s += m;
    }
    h[c.group] = Math.max(h[c.group]!, s);
  });
  return h;
}

export function relax(p: Problem, iterations = 150, start: Int32Array | null = null): Relaxation {
  const lists = circuitsOfPipes(p);
  const hLo = lowestHeads(p);
  const lambda = new Float64Array(p.circuits.length);
  const reduced = p.pipes.map((pipe) => new Float64Array(pipe.options.length));
  let best: Int32Array | null = null;
  let bestObjective = Infinity;
  const consider = (choice: Int32Array) => {
    const fixed = repair(p, choice);
    if (!fixed) return;
    improve(p, fixed);
    const e = evaluate(p, fixed);
    if (e.feasible && e.objective < bestObjective) {
      bestObjective = e.objective;
      best = fixed;
    }
  };
  if (start) consider(Int32Array.from(start));
  let bound = -Infinity;
  let bestLambda = new Float64Array(lambda);
  let theta = 2;
  let stall = 0;
  const choice = new Int32Array(p.pipes.length);
  const grad = new Float64Array(p.circuits.length);
  for (let it = 0; it < iterations; it++) {
    const { value, constant } = lagrangian(p, lambda, lists, hLo, reduced, choice, grad);
    if (value > bound + 1e-12 * Math.max(1, Math.abs(bound))) {
      bound = value;
      bestLambda = new Float64Array(lambda);
      stall = 0;
    } else if (++stall >= 15) {
      theta /= 2;
      stall = 0;
    }
    void constant;
    if (it % 5 === 0 || it === iterations - 1) consider(Int32Array.from(choice));
    let norm = 0;
    for (const g of grad) norm += g * g;
    if (norm === 0 || theta < 1e-6) break;
    const ub = Number.isFinite(bestObjective) ? bestObjective : value + Math.abs(value) * 0.1 + 1;
    if (ub - bound <= 1e-9 * Math.max(1, Math.abs(ub))) break;
    const step = (theta * Math.max(ub - value, 1e-9)) / norm;
    for (let j = 0; j < lambda.length; j++) lambda[j] = Math.max(0, lambda[j]! + step * grad[j]!);
  }
  // Reduced costs and the constant at the best multipliers, for branch and bound.
  const last = lagrangian(p, bestLambda, lists, hLo, reduced, choice, grad);
  return { bound: Math.max(bound, last.value), lambda: bestLambda, best, bestObjective, reduced, constant: last.constant };
}

/** L(λ), the relaxed choice, its subgradient, the reduced costs and the pipe-free constant. */
function lagrangian(
  p: Problem,
  lambda: Float64Array,
  lists: ReturnType<typeof circuitsOfPipes>,
  hLo: Float64Array,
  reduced: Float64Array[],
  choice: Int32Array,
  grad: Float64Array,
): { value: number; constant: number } {
  let value = 0;
  p.pipes.forEach((pipe, i) => {
    const r = reduced[i]!;
    const l = lists[i]!;
    let bestS = 0;
    for (let s = 0; s < pipe.options.length; s++) {
      let v = pipe.options[s]!.cost;
      for (let t = 0; t < l.circuit.length; t++) v += lambda[l.circuit[t]!]! * coeff(p, l.circuit[t]!, l.at[t]!, s);
      r[s] = v;
      if (v < r[bestS]!) bestS = s;
    }
    choice[i] = bestS;
    value += r[bestS]!;
  });
  const sumLambda = new Float64Array(p.groups.length);
  let constant = 0;
  p.circuits.forEach((c, j) => {
    constant += lambda[j]! * c.fixedKpa;
    sumLambda[c.group] = sumLambda[c.group]! + lambda[j]!;
  });
  const head = p.groups.map((g, k) => (g.perKpa - sumLambda[k]! < 0 ? g.limitKpa : Math.min(g.limitKpa, hLo[k]!)));
  p.groups.forEach((g, k) => {
    if (hLo[k]! > -Infinity) constant += (g.perKpa - sumLambda[k]!) * head[k]!;
  });
  p.circuits.forEach((c, j) => {
    let s = c.fixedKpa;
    for (let t = 0; t < c.pipes.length; t++) s += coeff(p, j, t, choice[c.pipes[t]!]!);
    grad[j] = s - head[c.group]!;
  });
  return { value: value + constant, constant };
}
