/**
 * The elimination order of the sparse LDLᵀ factorisation used by the gradient
 * method (ldl.ts): minimum degree (the idea behind the multiple-minimum-degree
 * order EPANET uses, Rossman, EPANET 2.2 manual §12 "Analysis algorithms";
 * George & Liu, "Computer Solution of Large Sparse Positive Definite Systems",
 * 1981, ch. 5) on the explicit elimination graph. Heating networks are
 * near-trees, so it peels leaves first and creates almost no fill.
 *
 * Input: m unknown nodes and the node pairs that share a link (either order,
 * duplicates allowed). Output: order[k] = node eliminated k-th.
 */

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
  // Adjacency as plain arrays with lazy removal of eliminated nodes; a stamp
  // array answers "already adjacent?" while forming the fill clique.
  const adj: number[][] = Array.from({ length: m }, () => []);
  const stamp = new Int32Array(m).fill(-1);
  for (let i = 0; i + 1 < pairs.length; i += 2) {
    const a = pairs[i]!;
    const b = pairs[i + 1]!;
    if (a === b) continue;
    adj[a]!.push(b);
    adj[b]!.push(a);
  }
  const lists = new DegreeLists(m);
  // Merge parallel links: deduplicate each list once.
  for (let v = 0; v < m; v++) {
    const list = adj[v]!;
    let len = 0;
    for (let i = 0; i < list.length; i++) {
      const u = list[i]!;
      if (stamp[u] === v) continue;
      stamp[u] = v;
      list[len++] = u; // compacted in place, first occurrence kept
    }
    list.length = len;
  }
  for (let v = 0; v < m; v++) lists.insert(v, adj[v]!.length);
  stamp.fill(-1);
  const done = new Uint8Array(m);
  const order = new Int32Array(m);
  const nbrs: number[] = [];
  let tick = 0;
  for (let k = 0; k < m; k++) {
    const v = lists.popMin();
    done[v] = 1;
    order[k] = v;
    nbrs.length = 0;
    for (const u of adj[v]!) if (!done[u]) nbrs.push(u);
    for (const u of nbrs) {
      // u loses v and gains every other neighbour of v it is not adjacent to
      // yet; its list is compacted in place (no allocation per elimination).
      const t = ++tick;
      const list = adj[u]!;
      let len = 0;
      for (let i = 0; i < list.length; i++) {
        const w = list[i]!;
        if (done[w]) continue;
        list[len++] = w;
        stamp[w] = t;
      }
      list.length = len;
      for (const w of nbrs) {
        if (w !== u && stamp[w] !== t) {
          list.push(w);
          stamp[w] = t;
        }
      }
      lists.remove(u);
      lists.insert(u, list.length);
    }
    adj[v] = [];
  }
  return order;
}
