/**
 * The gradient method (Todini & Pilati, "A gradient algorithm for the analysis
 * of pipe networks", 1988), in the shape EPANET uses (Rossman, EPANET 2.2
 * manual §12.2): each iteration linearises every link h(q) around its current
 * flow (p = 1/g, y = h/g), solves the node-head system A·H = F — A is SPD — and
 * updates flows q ← q − y + p·(Hfrom − Hto). Flows satisfy continuity after
 * every linear solve, so on a tree (fixed demands) the first step is exact.
 *
 * Units are the caller's; the engine uses m³/h and kPa so matrix entries sit
 * near 1 (better conditioned than m³/s and Pa). No module state.
 */
import { factor, newFactor, solve, symbolicFactor } from "./ldl";
import { minimumDegreeOrder } from "./ordering";
import { cachedPrepare } from "./topology-cache";
import type { Prepared, Topology } from "./topology";

/** Writes h (loss from→to) into out[0] and g = dh/dq > 0 into out[1]. */
export type Evaluate = (q: number, out: Float64Array) => void;

/** The links' laws, one call site for all (network/behaviour.ts LinkTable). */
export interface LinkLaws {
  evaluate(k: number, q: number, out: Float64Array): void;
}

/** Adapter for tests and small cases: one function per link. */
export const lawsOf = (fns: readonly Evaluate[]): LinkLaws => ({ evaluate: (k, q, out) => fns[k]!(q, out) });

export type { Prepared, Topology } from "./topology";

/** The symbolic phase for a topology, from the per-topology memo when the same network was prepared before. */
export function prepare(topo: Topology): Prepared {
  return cachedPrepare(topo, prepareUncached);
}

export function prepareUncached(topo: Topology): Prepared {
  const L = topo.from.length;
  const unknownOf = new Int32Array(topo.nodeCount).fill(-1);
  let m = 0;
  for (let n = 0; n < topo.nodeCount; n++) if (!topo.fixed[n]) unknownOf[n] = m++;
  // pairs in typed arrays, at most one per link (no growing array, no map callbacks: this runs once per topology)
  const pairOfLink = new Int32Array(L).fill(-1);
  const all = new Int32Array(2 * L);
  let count = 0;
  for (let k = 0; k < L; k++) {
    const a = unknownOf[topo.from[k]!]!;
    const b = unknownOf[topo.to[k]!]!;
    if (a < 0 || b < 0 || a === b) continue;
    all[2 * count] = a;
    all[2 * count + 1] = b;
    pairOfLink[k] = count++;
  }
  const pairs = all.subarray(0, 2 * count);
  // Unknowns renumbered by elimination position once here, so no solve permutes.
  const order = minimumDegreeOrder(m, pairs);
  const pos = new Int32Array(m);
  for (let i = 0; i < m; i++) pos[order[i]!] = i;
  for (let t = 0; t < pairs.length; t++) pairs[t] = pos[pairs[t]!]!;
  for (let n = 0; n < topo.nodeCount; n++) if (unknownOf[n]! >= 0) unknownOf[n] = pos[unknownOf[n]!]!;
  const { sym, entryOfPair } = symbolicFactor(m, pairs);
  const linkSlot = new Int32Array(L);
  for (let k = 0; k < L; k++) linkSlot[k] = pairOfLink[k]! >= 0 ? entryOfPair[pairOfLink[k]!]! : -1;
  return { topo, unknownOf, m, sym, linkSlot };
}

export interface SolveOptions {
  maxIterations?: number;
  /** converged when Σ|Δq| / Σ|q| falls below this (EPANET "accuracy"), or the error left is estimated below a tenth of it */
  accuracy?: number;
  /** smallest g allowed, keeps p = 1/g finite at zero flow (EPANET's RQtol idea) */
  minGradient?: number;
  fixedHead?: Float64Array;
}

export interface SolveResult {
  q: Float64Array;
  head: Float64Array;
  iterations: number;
  converged: boolean;
  factorOk: boolean;
}

export function solveNetwork(
  prep: Prepared,
  laws: LinkLaws,
  demand: Float64Array,
  q0: Float64Array,
  options: SolveOptions = {},
): SolveResult {
  const { topo, unknownOf, m, sym, linkSlot } = prep;
  const f = newFactor(sym);
  const maxIter = options.maxIterations ?? 60;
  const accuracy = options.accuracy ?? 1e-7;
  const gMin = options.minGradient ?? 1e-6;
  const L = topo.from.length;
  const q = Float64Array.from(q0);
  const head = new Float64Array(topo.nodeCount);
  if (options.fixedHead) for (let n = 0; n < topo.nodeCount; n++) if (topo.fixed[n]) head[n] = options.fixedHead[n]!;
  const p = new Float64Array(L);
  const y = new Float64Array(L);
  const diag = new Float64Array(m);
  const vals = new Float64Array(sym.rowOf.length);
  const rhs = new Float64Array(m);
  const out = new Float64Array(2);
  let converged = false;
  let factorOk = true;
  let iterations = 0;
  let lastRatio = Infinity;
  let relax = 1;
  for (let it = 1; it <= maxIter; it++) {
    iterations = it;
    diag.fill(0);
    vals.fill(0);
    rhs.fill(0);
    for (let n = 0; n < topo.nodeCount; n++) {
      const u = unknownOf[n]!;
      if (u >= 0) rhs[u] = -demand[n]!;
    }
    for (let k = 0; k < L; k++) {
      laws.evaluate(k, q[k]!, out);
      const g = out[1]! > gMin ? out[1]! : gMin;
      const pk = 1 / g;
      const yk = out[0]! * pk;
      p[k] = pk;
      y[k] = yk;
      const a = unknownOf[topo.from[k]!]!;
      const b = unknownOf[topo.to[k]!]!;
      const r = q[k]! - yk;
      if (a >= 0) {
        diag[a] = diag[a]! + pk;
        rhs[a] = rhs[a]! - r;
        if (b < 0) rhs[a] = rhs[a]! + pk * head[topo.to[k]!]!;
      }
      if (b >= 0) {
        diag[b] = diag[b]! + pk;
        rhs[b] = rhs[b]! + r;
        if (a < 0) rhs[b] = rhs[b]! + pk * head[topo.from[k]!]!;
      }
      const s = linkSlot[k]!;
      if (s >= 0) vals[s] = vals[s]! - pk;
    }
    factorOk = factor(f, diag, vals) && factorOk;
    solve(f, rhs);
    for (let n = 0; n < topo.nodeCount; n++) {
      const u = unknownOf[n]!;
      if (u >= 0) head[n] = rhs[u]!;
    }
    let sumDq = 0;
    let sumQ = 0;
    for (let k = 0; k < L; k++) {
      const qNew = q[k]! - y[k]! + p[k]! * (head[topo.from[k]!]! - head[topo.to[k]!]!);
      const dq = relax * (qNew - q[k]!);
      q[k] = q[k]! + dq;
      sumDq += Math.abs(dq);
      sumQ += Math.abs(q[k]!);
    }
    const ratio = sumQ > 0 ? sumDq / sumQ : sumDq;
    if (!Number.isFinite(ratio)) break;
    // Converged too when the error left is estimated below a tenth of the accuracy: while
    // the steps shrink by ρ = ratio/lastRatio < 1, the iterate lies within ρ/(1 − ρ)·ratio
    // of the solution (the a posteriori bound of Banach's fixed-point theorem: Kreyszig,
    // Introductory Functional Analysis with Applications, 1978, §5.1 — recalled from
    // memory). On Newton's quadratic tail ρ ≪ 1, so the last, confirming solve is saved.
    const rho = it > 1 ? ratio / lastRatio : 1;
    if (ratio < accuracy || sumDq < 1e-12 || (rho < 0.5 && (rho / (1 - rho)) * ratio < accuracy / 10)) {
      converged = true;
      break;
    }
    // Piecewise links (bypass opening, check valves) can make plain Newton
    // cycle; halve the step when the error stops shrinking (EPANET's
    // DAMPLIMIT option does the same kind of thing).
    if (it > 8 && ratio >= lastRatio) relax = Math.max(0.3, relax * 0.7);
    lastRatio = ratio;
  }
  return { q, head, iterations, converged, factorOk };
}
