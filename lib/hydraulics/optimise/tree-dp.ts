/**
 * Exact optimum by dynamic programming over the circuit tree.
 *
 * Each free pipe lies on a set of circuits (the loads it feeds or returns).
 * When these sets are laminar — any two are nested or disjoint, as in every
 * two-pipe tree with direct return, manifolds and plant rooms — they form a
 * tree: a node holds the pipes that all its circuits share (in series for
 * every one of them), its children split its circuits. Bottom-up, each node
 * keeps the Pareto frontier of (pipe cost, largest circuit Δp per pump and
 * mode) over the choices below it; a parent adds its pipes to every point and
 * combines its children (cost adds, Δp takes the larger). At the top the
 * cheapest point within every pump's limit — or, for life-cost, the point
 * with the least pipe cost + energy — is the optimum: nothing is discarded
 * except points another point beats on every count or that cannot be made
 * feasible, so the result is exact for the fixed flows (a tree's flows are).
 * The same principle as the classic dynamic programs for discrete sizing on
 * trees (e.g. van Ginneken, "Buffer placement in distributed RC-tree
 * networks for minimal Elmore delay", ISCAS 1990, a frontier of cost and
 * delay per subtree).
 *
 * Not laminar (reverse return), or a pipe crossed both ways by circuits of
 * the same pump, or a frontier above `cap` points: the caller falls back to
 * branch and bound (branch-bound.ts).
 */
import { combine, emptyFrontier, prune, StepPool, type Bounds, type Frontier } from "./frontier";
import { lowestHeads } from "./lagrange";
import { heuristicUpper } from "./local-search";
import { circuitsOfPipes, FEAS_TOL_KPA, type Problem } from "./problem";

export interface Solved {
  /** option per free pipe; null when no choice meets every limit */
  choice: Int32Array | null;
  objective: number;
  /** proven optimal for the fixed-flow problem */
  exact: boolean;
  /** a lower bound on the optimum (equal to objective when exact) */
  lowerBound: number;
  method: "circuit-tree-dp" | "branch-and-bound" | "none";
}

interface Node {
  circuits: number[];
  pipes: number[];
  parent: number;
  children: number[];
  /** the circuit whose Δp starts this node (a circuit's own node), else −1 */
  base: number;
}

/** Signs of pipe i per group (0: not on that group's circuits); null when one group crosses it both ways. */
function groupSigns(p: Problem, list: { circuit: number[]; at: number[] }): Int8Array | null {
  const s = new Int8Array(p.groups.length);
  for (let t = 0; t < list.circuit.length; t++) {
    const c = p.circuits[list.circuit[t]!]!;
    const v = c.sign[list.at[t]!]!;
    if (s[c.group] === 0) s[c.group] = v;
    else if (s[c.group] !== v) return null;
  }
  return s;
}

/** The laminar tree of circuit sets, or null when the sets are not laminar. */
function circuitTree(p: Problem, sets: number[][]): { nodes: Node[]; free: number[] } | null {
  const byKey = new Map<string, number>();
  const nodes: Node[] = [];
  const free: number[] = [];
  sets.forEach((set, i) => {
    if (set.length === 0) return free.push(i);
    const key = set.join(",");
    let t = byKey.get(key);
    if (t === undefined) {
      t = nodes.push({ circuits: set, pipes: [], parent: -1, children: [], base: set.length === 1 ? set[0]! : -1 }) - 1;
      byKey.set(key, t);
    }
    nodes[t]!.pipes.push(i);
  });
  const order = [...nodes.keys()].sort((a, b) => nodes[b]!.circuits.length - nodes[a]!.circuits.length);
  const owner = new Int32Array(p.circuits.length).fill(-1);
  for (const t of order) {
    const set = nodes[t]!.circuits;
    const parent = owner[set[0]!]!;
    for (const j of set) if (owner[j] !== parent) return null;
    for (const j of set) owner[j] = t;
    nodes[t]!.parent = parent;
  }
  p.circuits.forEach((_, j) => {
    if (owner[j]! >= 0 && nodes[owner[j]!]!.base === j) return;
    nodes.push({ circuits: [j], pipes: [], parent: owner[j]!, children: [], base: j });
  });
  nodes.forEach((n, t) => n.parent >= 0 && nodes[n.parent]!.children.push(t));
  return { nodes, free };
}

export function solveTreeDp(p: Problem, cap = 100_000): Solved | null {
  const G = p.groups.length;
  const lists = circuitsOfPipes(p);
  const signs: Int8Array[] = [];
  for (const l of lists) {
    const s = groupSigns(p, l);
    if (!s) return null;
    signs.push(s);
  }
  const built = circuitTree(p, lists.map((l) => l.circuit));
  if (!built) return null;
  const { nodes, free } = built;
  const limit = Float64Array.from(p.groups, (g) => g.limitKpa);
  const coef = (i: number, s: number, g: number) => signs[i]![g]! * p.pipes[i]!.options[s]!.dp[p.groups[g]!.mode]!;
  const minCoef = p.pipes.map((pipe, i) => Float64Array.from(p.groups, (_, g) => (signs[i]![g] ? Math.min(...pipe.options.map((_, s) => coef(i, s, g))) : 0)));

  // Smallest Δp the pipes above each node can still add, per group (parents come first in `order`).
  const above = nodes.map(() => new Float64Array(G));
  const order = [...nodes.keys()].sort((a, b) => nodes[b]!.circuits.length - nodes[a]!.circuits.length || a - b);
  for (const t of order) {
    const n = nodes[t]!;
    if (n.parent < 0) continue;
    const a = above[t]!;
    a.set(above[n.parent]!);
    for (const i of nodes[n.parent]!.pipes) for (let g = 0; g < G; g++) a[g] = a[g]! + minCoef[i]![g]!;
  }

  // Least cost of the pipes outside a node's finished part, for the bound against a known choice.
  const minCost = p.pipes.map((pipe) => Math.min(...pipe.options.map((o) => o.cost)));
  const totalMin = minCost.reduce((a, b) => a + b, 0);
  const subtreeMin = new Float64Array(nodes.length);
  for (const t of [...order].reverse()) {
    const n = nodes[t]!;
    subtreeMin[t] = n.children.reduce((a, k) => a + subtreeMin[k]!, 0) + n.pipes.reduce((a, i) => a + minCost[i]!, 0);
  }
  const outsideCost = (t: number, added: number) => {
    const n = nodes[t]!;
    let inside = n.children.reduce((a, k) => a + subtreeMin[k]!, 0);
    for (let k = 0; k < added; k++) inside += minCost[n.pipes[k]!]!;
    return totalMin - inside;
  };
  const bounds: Bounds = {
    limit,
    tol: FEAS_TOL_KPA,
    upper: heuristicUpper(p),
    perKpa: Float64Array.from(p.groups, (g) => g.perKpa),
    lowestHead: lowestHeads(p),
  };
  const pool = new StepPool();
  const frontier: (Frontier | null)[] = nodes.map(() => null);
  const rest = new Float64Array(G);
  for (const t of [...order].reverse()) {
    const n = nodes[t]!;
    let f: Frontier | null = null;
    if (n.base >= 0) {
      const c = p.circuits[n.base]!;
      f = { cost: [0], w: Array.from({ length: G }, (_, g) => (g === c.group ? c.fixedKpa : -Infinity)), step: [pool.add(0, 0, 0, 0)] };
    }
    // smallest Δp still to come from this node's pipes and above: what a combined point must allow for
    const allRest = Float64Array.from(above[t]!);
    for (const i of n.pipes) for (let g = 0; g < G; g++) allRest[g] = allRest[g]! + minCoef[i]![g]!;
    for (const k of [...n.children].sort((a, b) => frontier[a]!.cost.length - frontier[b]!.cost.length)) {
      const c: Frontier | null = f === null ? frontier[k]! : combine(f, frontier[k]!, G, pool, cap);
      if (c === null) return null;
      f = prune(c, G, allRest, outsideCost(t, 0), bounds);
      frontier[k] = null;
    }
    // this node's pipes one by one; `rest` = smallest Δp still to come from its later pipes and above
    for (let idx = 0; idx < n.pipes.length; idx++) {
      rest.set(above[t]!);
      for (let later = idx + 1; later < n.pipes.length; later++) for (let g = 0; g < G; g++) rest[g] = rest[g]! + minCoef[n.pipes[later]!]![g]!;
      const i = n.pipes[idx]!;
      const next = emptyFrontier();
      for (let k = 0; k < f!.cost.length; k++) {
        p.pipes[i]!.options.forEach((o, s) => {
          next.cost.push(f!.cost[k]! + o.cost);
          for (let g = 0; g < G; g++) next.w.push(f!.w[k * G + g]! + (signs[i]![g] ? coef(i, s, g) : 0));
          next.step.push(pool.add(1, f!.step[k]!, i, s));
        });
      }
      f = prune(next, G, rest, outsideCost(t, idx + 1), bounds);
      if (process.env.DPLOG) console.log(t, idx, n.circuits.length, next.cost.length, f.cost.length);
      if (f.cost.length > cap) return null;
    }
    frontier[t] = f;
  }

  // The top: roots share no pipe, so they are independent unless a life-cost pump spans
  // several of them (its energy follows the largest Δp over all): combine those, pick the
  // best feasible point of each independent piece, and add the pipes on no circuit.
  const roots = order.filter((t) => nodes[t]!.parent < 0);
  const piece = roots.map((_, r) => r);
  const find = (r: number): number => (piece[r] === r ? r : (piece[r] = find(piece[r]!)));
  const lastRootOfGroup = new Map<number, number>();
  roots.forEach((t, r) => {
    const f = frontier[t]!;
    for (let g = 0; g < G; g++) {
      if (!(p.groups[g]!.perKpa > 0) || !f.w.some((_, k) => k % G === g && f.w[k]! > -Infinity)) continue;
      const other = lastRootOfGroup.get(g);
      if (other !== undefined) piece[find(r)] = find(other);
      lastRootOfGroup.set(g, r);
    }
  });
  const choice = new Int32Array(p.pipes.length).fill(-1);
  let objective = 0;
  for (let r = 0; r < roots.length; r++) {
    if (find(r) !== r) continue;
    let f: Frontier | null = null;
    for (let k = 0; k < roots.length; k++) {
      if (find(k) !== r) continue;
      const c: Frontier | null = f === null ? frontier[roots[k]!]! : combine(f, frontier[roots[k]!]!, G, pool, cap);
      if (c === null) return null;
      f = prune(c, G, new Float64Array(G), 0, { ...bounds, upper: Infinity });
    }
    const best = bestPoint(p, f!, limit);
    if (best < 0) return { choice: null, objective: Infinity, exact: true, lowerBound: Infinity, method: "circuit-tree-dp" };
    objective += pointObjective(p, f!, best);
    pool.trace(f!.step[best]!, choice);
  }
  for (const i of free) {
    const o = p.pipes[i]!.options;
    let s = 0;
    for (let k = 1; k < o.length; k++) if (o[k]!.cost < o[s]!.cost) s = k;
    choice[i] = s;
    objective += o[s]!.cost;
  }
  return { choice, objective, exact: true, lowerBound: objective, method: "circuit-tree-dp" };
}

function pointObjective(p: Problem, f: Frontier, k: number): number {
  const G = p.groups.length;
  let obj = f.cost[k]!;
  for (let g = 0; g < G; g++) if (f.w[k * G + g]! > -Infinity) obj += p.groups[g]!.perKpa * f.w[k * G + g]!;
  return obj;
}

/** Index of the feasible point with the least objective, −1 when none is feasible. */
function bestPoint(p: Problem, f: Frontier, limit: Float64Array): number {
  const G = p.groups.length;
  let best = -1;
  let bestObj = Infinity;
  for (let k = 0; k < f.cost.length; k++) {
    let ok = true;
    for (let g = 0; g < G; g++) if (f.w[k * G + g]! > limit[g]! + FEAS_TOL_KPA) ok = false;
    const obj = pointObjective(p, f, k);
    if (ok && obj < bestObj) {
      bestObj = obj;
      best = k;
    }
  }
  return best;
}
