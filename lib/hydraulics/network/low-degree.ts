/**
 * The first stage of the minimum-degree order (ordering.ts), in linear time:
 * every node that reaches degree ≤ 2. Eliminating such a node never raises
 * another node's degree — a leaf only loses its edge; a node between two
 * neighbours at most joins them by one fill edge (series reduction of a
 * series–parallel graph) — so minimum degree takes all of them before any node
 * of degree 3 (George & Liu, "Computer Solution of Large Sparse Positive
 * Definite Systems", 1981, §5.1: the elimination graph). Degree 0 and 1 go
 * first, as minimum degree takes them. On a near-tree heating network this is
 * almost the whole order, found here on compressed adjacency lists that only
 * shrink, with no list grown or allocated per elimination.
 */

/** Compressed adjacency, deduplicated: node v's live neighbours are adj[start[v] .. start[v] + len[v]). */
export interface ShrinkingGraph {
  start: Int32Array;
  len: Int32Array;
  adj: Int32Array;
}

/** Pairs (either order, duplicates and self-pairs allowed) as deduplicated adjacency lists. */
export function graphOf(m: number, pairs: ArrayLike<number>): ShrinkingGraph {
  const start = new Int32Array(m + 1);
  for (let t = 0; t + 1 < pairs.length; t += 2) {
    if (pairs[t] === pairs[t + 1]) continue;
    start[pairs[t]! + 1]!++;
    start[pairs[t + 1]! + 1]!++;
  }
  for (let v = 0; v < m; v++) start[v + 1]! += start[v]!;
  const adj = new Int32Array(start[m]!);
  const len = new Int32Array(m);
  for (let t = 0; t + 1 < pairs.length; t += 2) {
    const a = pairs[t]!;
    const b = pairs[t + 1]!;
    if (a === b) continue;
    adj[start[a]! + len[a]!++] = b;
    adj[start[b]! + len[b]!++] = a;
  }
  // parallel links merged: each list compacted in place, first occurrence kept
  const stamp = new Int32Array(m).fill(-1);
  for (let v = 0; v < m; v++) {
    const s = start[v]!;
    let n = 0;
    for (let i = 0; i < len[v]!; i++) {
      const u = adj[s + i]!;
      if (stamp[u] === v) continue;
      stamp[u] = v;
      adj[s + n++] = u;
    }
    len[v] = n;
  }
  return { start, len, adj };
}

/** Removes v from u's list (order not kept). */
function drop(g: ShrinkingGraph, u: number, v: number): void {
  const s = g.start[u]!;
  const last = s + --g.len[u]!;
  for (let i = s; i < last; i++) {
    if (g.adj[i] === v) {
      g.adj[i] = g.adj[last]!;
      return;
    }
  }
}

/** In u's list, v is replaced by w — or only removed when w is there already. */
function bridge(g: ShrinkingGraph, u: number, v: number, w: number): void {
  const s = g.start[u]!;
  let at = -1;
  for (let i = s; i < s + g.len[u]!; i++) {
    const x = g.adj[i]!;
    if (x === w) return drop(g, u, v);
    if (x === v) at = i;
  }
  g.adj[at] = w;
}

/**
 * Eliminates every node that has or comes to have degree ≤ 2, writing them to
 * order[0 ..) and marking them in done; returns how many. The graph is left
 * as the rest's elimination graph (all degrees ≥ 3); touched[u] is when u last
 * lost or changed a neighbour (1, 2, …; 0: never), for the rest's tie-breaking.
 */
export function eliminateLowDegree(g: ShrinkingGraph, order: Int32Array, done: Uint8Array, touched: Int32Array): number {
  const m = g.len.length;
  // FIFO queues: degree ≤ 1 and degree 2; a node enters each at most once (degrees only fall)
  const low = new Int32Array(m);
  const two = new Int32Array(m);
  let lowHead = 0, lowTail = 0, twoHead = 0, twoTail = 0;
  for (let v = 0; v < m; v++) {
    if (g.len[v]! <= 1) low[lowTail++] = v;
    else if (g.len[v] === 2) two[twoTail++] = v;
  }
  const fell = (u: number) => {
    if (g.len[u] === 1) low[lowTail++] = u;
    else if (g.len[u] === 2) two[twoTail++] = u;
  };
  let k = 0;
  let clock = 0;
  for (;;) {
    let v: number;
    if (lowHead < lowTail) v = low[lowHead++]!;
    else if (twoHead < twoTail) v = two[twoHead++]!;
    else break;
    if (done[v]) continue; // met again in the other queue
    done[v] = 1;
    order[k++] = v;
    const s = g.start[v]!;
    if (g.len[v] === 1) {
      const a = g.adj[s]!;
      drop(g, a, v);
      touched[a] = ++clock;
      fell(a);
    } else if (g.len[v] === 2) {
      const a = g.adj[s]!;
      const b = g.adj[s + 1]!;
      const la = g.len[a]!;
      const lb = g.len[b]!;
      bridge(g, a, v, b);
      bridge(g, b, v, a);
      touched[a] = ++clock;
      touched[b] = ++clock;
      if (g.len[a] !== la) fell(a);
      if (g.len[b] !== lb) fell(b);
    }
    g.len[v] = 0;
  }
  return k;
}
