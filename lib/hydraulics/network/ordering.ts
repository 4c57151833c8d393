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

/** Binary min-heap on (degree, node) with lazy deletion. */
class Heap {
  private keys: number[] = [];
  private nodes: number[] = [];
  get size() {
    return this.keys.length;
  }
  push(key: number, node: number) {
    const k = this.keys;
    const n = this.nodes;
    let i = k.length;
    k.push(key);
    n.push(node);
    while (i > 0) {
      const p = (i - 1) >> 1;
      if (k[p]! <= key) break;
      k[i] = k[p]!;
      n[i] = n[p]!;
      i = p;
    }
    k[i] = key;
    n[i] = node;
  }
  /** key of the entry the last pop() returned */
  topKey = 0;
  /** removes the smallest entry: returns its node, its key in topKey (no tuple per pop) */
  pop(): number {
    const k = this.keys;
    const n = this.nodes;
    this.topKey = k[0]!;
    const top = n[0]!;
    const lastK = k.pop()!;
    const lastN = n.pop()!;
    const len = k.length;
    if (len > 0) {
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        if (l >= len) break;
        const r = l + 1;
        const c = r < len && k[r]! < k[l]! ? r : l;
        if (k[c]! >= lastK) break;
        k[i] = k[c]!;
        n[i] = n[c]!;
        i = c;
      }
      k[i] = lastK;
      n[i] = lastN;
    }
    return top;
  }
}

export function minimumDegreeOrder(m: number, pairs: ArrayLike<number>): Int32Array {
  // Adjacency as plain arrays with lazy removal of eliminated nodes; a stamp
  // array answers "already adjacent?" while forming the fill clique.
  const adj: number[][] = Array.from({ length: m }, () => []);
  const deg = new Int32Array(m);
  const stamp = new Int32Array(m).fill(-1);
  for (let i = 0; i + 1 < pairs.length; i += 2) {
    const a = pairs[i]!;
    const b = pairs[i + 1]!;
    if (a === b) continue;
    adj[a]!.push(b);
    adj[b]!.push(a);
  }
  // Merge parallel links: deduplicate each list once.
  for (let v = 0; v < m; v++) {
    const list = adj[v]!;
    let len = 0;
    for (let i = 0; i < list.length; i++) {
      const u = list[i]!;
      if (stamp[u] === v) continue;
      stamp[u] = v;
      list[len++] = u; // compacted in place, first occurrence kept (same order as before)
    }
    list.length = len;
    deg[v] = len;
  }
  stamp.fill(-1);
  const heap = new Heap();
  for (let v = 0; v < m; v++) heap.push(deg[v]!, v);
  const done = new Uint8Array(m);
  const order = new Int32Array(m);
  const nbrs: number[] = [];
  let k = 0;
  let tick = 0;
  while (heap.size > 0) {
    const v = heap.pop();
    if (done[v] || heap.topKey !== deg[v]) continue;
    done[v] = 1;
    order[k++] = v;
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
      deg[u] = list.length;
      heap.push(list.length, u);
    }
    adj[v] = [];
  }
  return order;
}
