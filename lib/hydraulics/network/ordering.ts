/**
 * The elimination order of the sparse LDLᵀ factorisation used by the gradient
 * method (ldl.ts): minimum degree (the idea behind the multiple-minimum-degree
 * order EPANET uses, Rossman, EPANET 2.2 manual §12 "Analysis algorithms";
 * George & Liu, "Computer Solution of Large Sparse Positive Definite Systems",
 * 1981, ch. 5) on the explicit elimination graph. Heating networks are
 * near-trees, so it peels leaves first and creates almost no fill.
 *
 * Nodes of degree ≤ 2 are taken first in linear time (low-degree.ts), then
 * the rest by the degree lists below.
 *
 * Input: m unknown nodes and the node pairs that share a link (either order,
 * duplicates allowed). Output: order[k] = node eliminated k-th.
 */
import { eliminateLowDegree, graphOf } from "./low-degree";

/**
 * Nodes by current degree: one doubly linked list per degree (George & Liu
 * 1981 §5.4 keep the same degree structure), so taking a node of least degree
 * and moving one to another degree are O(1) — a heap would pay log n for each
 * of the many small updates a near-tree makes.
 */
class DegreeLists {
  private readonly head: Int32Array;
  private readonly tail: Int32Array;
  private readonly next: Int32Array;
  private readonly prev: Int32Array;
  private readonly deg: Int32Array;
  private min = 0;
  constructor(m: number) {
    this.head = new Int32Array(m + 1).fill(-1);
    this.tail = new Int32Array(m + 1).fill(-1);
    this.next = new Int32Array(m);
    this.prev = new Int32Array(m);
    this.deg = new Int32Array(m);
  }
  insert(v: number, d: number): void {
    // at the tail: nodes of equal degree leave in the order they reached it
    this.deg[v] = d;
    const t = this.tail[d]!;
    this.prev[v] = t;
    this.next[v] = -1;
    if (t >= 0) this.next[t] = v;
    else this.head[d] = v;
    this.tail[d] = v;
    if (d < this.min) this.min = d;
  }
  remove(v: number): void {
    const n = this.next[v]!;
    const p = this.prev[v]!;
    if (p >= 0) this.next[p] = n;
    else this.head[this.deg[v]!] = n;
    if (n >= 0) this.prev[n] = p;
    else this.tail[this.deg[v]!] = p;
  }
  /** removes and returns a node of least degree (the first to reach it) */
  popMin(): number {
    while (this.head[this.min]! < 0) this.min++;
    const v = this.head[this.min]!;
    this.remove(v);
    return v;
  }
}

export function minimumDegreeOrder(m: number, pairs: ArrayLike<number>): Int32Array {
  const g = graphOf(m, pairs);
  const order = new Int32Array(m);
  const done = new Uint8Array(m);
  const touched = new Int32Array(m);
  const first = eliminateLowDegree(g, order, done, touched);
  if (first === m) return order;
  // The rest, all of degree ≥ 3: adjacency as plain arrays whose live part is
  // adj[v][0 .. len[v]) (eliminated nodes removed lazily; no array shrunk);
  // a stamp array answers "already adjacent?" while forming the fill clique.
  const adj: number[][] = new Array(m);
  const len = new Int32Array(m);
  const lists = new DegreeLists(m);
  // Ties broken as if the first stage had run on the degree lists: a node whose
  // neighbours changed moves to the tail of its list, so the rest enter in the
  // order of their last change, untouched ones first (that order measurably
  // lowers the fill on meshes: the factorisation's work, not only the order's).
  const rest: number[] = [];
  for (let v = 0; v < m; v++) if (!done[v]) rest.push(v);
  rest.sort((a, b) => touched[a]! - touched[b]! || a - b);
  for (const v of rest) {
    len[v] = g.len[v]!;
    const list: number[] = []; // copied by hand: Array.from over a subarray goes through the iterator
    for (let e = g.start[v]!; e < g.start[v]! + len[v]!; e++) list.push(g.adj[e]!);
    adj[v] = list;
    lists.insert(v, len[v]!);
  }
  const stamp = new Int32Array(m).fill(-1);
  const nbrs: number[] = [];
  let tick = 0;
  for (let k = first; k < m; k++) {
    const v = lists.popMin();
    done[v] = 1;
    order[k] = v;
    nbrs.length = 0;
    const av = adj[v]!;
    for (let i = 0; i < len[v]!; i++) if (!done[av[i]!]) nbrs.push(av[i]!);
    // v's neighbours stamped once: each of them keeps its other neighbours
    // and takes the whole of nbrs (less itself) in their place
    const t = ++tick;
    for (const u of nbrs) stamp[u] = t;
    for (const u of nbrs) {
      const list = adj[u]!;
      let n = 0;
      for (let i = 0; i < len[u]!; i++) {
        const w = list[i]!;
        if (done[w] || stamp[w] === t) continue;
        list[n++] = w;
      }
      for (const w of nbrs) if (w !== u) list[n++] = w;
      len[u] = n;
      lists.remove(u);
      lists.insert(u, n);
    }
    len[v] = 0;
    // Mass elimination (George & Liu 1981 §5.4; their indistinguishable nodes): a
    // neighbour now joined to v's clique only has degree |nbrs| − 1, the least of
    // all, and makes no fill, so minimum degree takes it next — and then every
    // other such neighbour. Taken here as one group, the rest of the clique is
    // tidied once for all of them instead of once per member.
    let group = 0;
    for (const u of nbrs) {
      if (len[u] !== nbrs.length - 1) continue;
      done[u] = 1;
      order[++k] = u;
      lists.remove(u);
      len[u] = 0;
      group++;
    }
    if (group === 0) continue;
    for (const w of nbrs) {
      if (done[w]) continue;
      const list = adj[w]!;
      let n = 0;
      for (let i = 0; i < len[w]!; i++) if (!done[list[i]!]) list[n++] = list[i]!;
      len[w] = n;
      lists.remove(w);
      lists.insert(w, n);
    }
  }
  return order;
}
