/**
 * Pareto frontiers of (cost, w) for the circuit-tree DP: w[g] is, for each
 * pump-and-mode group g, the largest Δp so far over the circuits of g below
 * this point of the tree (−Infinity where g has none). A point is dropped
 * when another is no dearer and no worse in every w, or when even the
 * smallest drops still to come cannot bring it within a pump's limit.
 * Points remember how they were made (a pool of steps) for the traceback.
 */

export class StepPool {
  readonly kind: number[] = [];
  readonly a: number[] = [];
  readonly b: number[] = [];
  readonly c: number[] = [];
  add(kind: 0 | 1 | 2, a: number, b: number, c: number): number {
    this.kind.push(kind);
    this.a.push(a);
    this.b.push(b);
    this.c.push(c);
    return this.kind.length - 1;
  }
  /** Writes the option of every pipe chosen on the way to `id` into choice. */
  trace(id: number, choice: Int32Array): void {
    const stack = [id];
    while (stack.length > 0) {
      let s = stack.pop()!;
      for (;;) {
        const k = this.kind[s]!;
        if (k === 0) break;
        if (k === 2) {
          stack.push(this.b[s]!);
          s = this.a[s]!;
          continue;
        }
        choice[this.b[s]!] = this.c[s]!;
        s = this.a[s]!;
      }
    }
  }
}

export interface Frontier {
  cost: number[];
  /** G values per point, flattened */
  w: number[];
  step: number[];
}

export const emptyFrontier = (): Frontier => ({ cost: [], w: [], step: [] });

/** Groups with a finite w in some point (the dimensions that matter). */
export function activeDims(f: Frontier, G: number): number[] {
  const out: number[] = [];
  for (let g = 0; g < G; g++) {
    for (let i = 0; i < f.cost.length; i++) {
      if (f.w[i * G + g]! > -Infinity) {
        out.push(g);
        break;
      }
    }
  }
  return out;
}

export interface Bounds {
  limit: Float64Array;
  tol: number;
  /** best objective of a known feasible choice (Infinity: none) */
  upper: number;
  /** per group: objective per kPa (life-cost) and the least head it can have */
  perKpa: Float64Array;
  lowestHead: Float64Array;
}

/**
 * Keep the Pareto points that can still be feasible, w[g] + rest[g] ≤ limit[g] + tol, and can
 * still beat `upper`: cost + restCost + Σ perKpa·(least final head) ≤ upper (+ tol).
 * Sorted by cost, then the first w dimension, ascending.
 */
export function prune(f: Frontier, G: number, rest: Float64Array, restCost: number, b: Bounds): Frontier {
  const n = f.cost.length;
  const dims = activeDims(f, G);
  const idx: number[] = [];
  const cut = b.upper + 1e-9 * Math.max(1, Math.abs(b.upper));
  outer: for (let i = 0; i < n; i++) {
    let least = f.cost[i]! + restCost;
    for (let g = 0; g < G; g++) {
      const w = f.w[i * G + g]!;
      if (w + rest[g]! > b.limit[g]! + b.tol) continue outer;
      if (b.perKpa[g]! > 0) least += b.perKpa[g]! * Math.max(w + rest[g]!, b.lowestHead[g]!);
    }
    if (least > cut) continue;
    idx.push(i);
  }
  const d0 = dims[0] ?? 0;
  idx.sort((x, y) => f.cost[x]! - f.cost[y]! || f.w[x * G + d0]! - f.w[y * G + d0]!);
  const out = emptyFrontier();
  if (dims.length <= 1) {
    let best = Infinity;
    for (const i of idx) {
      const w = f.w[i * G + d0]!;
      if (out.cost.length > 0 && !(w < best)) continue;
      best = w;
      push(out, f, i, G);
    }
    return out;
  }
  if (dims.length === 2) return prune2(f, G, idx, dims[0]!, dims[1]!);
  for (const i of idx) {
    let dominated = false;
    for (let k = 0; k < out.cost.length && !dominated; k++) {
      let all = true;
      for (const g of dims) {
        if (out.w[k * G + g]! > f.w[i * G + g]!) {
          all = false;
          break;
        }
      }
      dominated = all;
    }
    if (!dominated) push(out, f, i, G);
  }
  return out;
}

/**
 * Two dimensions: in cost order, a point is dominated when a kept point has w₀ ≤ and w₁ ≤ its
 * own — the least w₁ over kept points with w₀ up to its w₀, a prefix minimum kept in a Fenwick
 * tree over the ranks of w₀ (Fenwick, Software: Practice and Experience 24, 1994): O(n log n).
 */
function prune2(f: Frontier, G: number, idx: number[], d0: number, d1: number): Frontier {
  const w0 = [...new Set(idx.map((i) => f.w[i * G + d0]!))].sort((a, b) => a - b);
  const rank = new Map(w0.map((v, r) => [v, r + 1]));
  const tree = new Float64Array(w0.length + 1).fill(Infinity);
  const out = emptyFrontier();
  for (const i of idx) {
    const r0 = rank.get(f.w[i * G + d0]!)!;
    const w1 = f.w[i * G + d1]!;
    let least = Infinity;
    for (let r = r0; r > 0; r -= r & -r) least = Math.min(least, tree[r]!);
    if (least <= w1) continue;
    push(out, f, i, G);
    for (let r = r0; r < tree.length; r += r & -r) if (w1 < tree[r]!) tree[r] = w1;
  }
  return out;
}

function push(out: Frontier, f: Frontier, i: number, G: number): void {
  out.cost.push(f.cost[i]!);
  for (let g = 0; g < G; g++) out.w.push(f.w[i * G + g]!);
  out.step.push(f.step[i]!);
}

/**
 * Combine two frontiers of disjoint circuit sets: cost adds, w is the larger of the two.
 * One shared dimension: only the cheapest point of each side under each threshold matters
 * (O(n₁ + n₂)); otherwise every pair. Returns null when the result would exceed cap.
 */
export function combine(x: Frontier, y: Frontier, G: number, pool: StepPool, cap: number): Frontier | null {
  const dx = activeDims(x, G);
  const dy = activeDims(y, G);
  const out = emptyFrontier();
  const emit = (i: number, j: number) => {
    out.cost.push(x.cost[i]! + y.cost[j]!);
    for (let g = 0; g < G; g++) out.w.push(Math.max(x.w[i * G + g]!, y.w[j * G + g]!));
    out.step.push(pool.add(2, x.step[i]!, y.step[j]!, 0));
  };
  if (dx.length === 1 && dy.length === 1 && dx[0] === dy[0]) {
    const g = dx[0]!;
    // pruned 1-D frontiers are sorted by cost ascending, w descending: walk both by w ascending
    const xi = [...x.cost.keys()].reverse();
    const yi = [...y.cost.keys()].reverse();
    let a = -1;
    let b = -1;
    let i = 0;
    let j = 0;
    while (i < xi.length || j < yi.length) {
      const wx = i < xi.length ? x.w[xi[i]! * G + g]! : Infinity;
      const wy = j < yi.length ? y.w[yi[j]! * G + g]! : Infinity;
      const t = Math.min(wx, wy);
      while (i < xi.length && x.w[xi[i]! * G + g]! <= t) a = xi[i++]!;
      while (j < yi.length && y.w[yi[j]! * G + g]! <= t) b = yi[j++]!;
      if (a >= 0 && b >= 0) emit(a, b);
    }
    return out;
  }
  if (x.cost.length * y.cost.length > cap) return null;
  for (let i = 0; i < x.cost.length; i++) for (let j = 0; j < y.cost.length; j++) emit(i, j);
  return out;
}
