/**
 * Symbolic phase of the sparse LDLᵀ factorisation used by the gradient method:
 * a minimum-degree elimination order (the idea behind the multiple-minimum-
 * degree order EPANET uses, Rossman, EPANET 2.2 manual §12 "Analysis
 * algorithms"; George & Liu, "Computer Solution of Large Sparse Positive
 * Definite Systems", 1981) and the filled structure it produces. Heating
 * networks are near-trees, so minimum degree peels leaves first and creates
 * almost no fill: factorisation and solve stay O(n).
 *
 * Input: m unknown nodes and the node pairs that share a link.
 * Output: for each node, the later-eliminated neighbours at its elimination
 * (its column of L) with a slot index for every value, and the list of Schur
 * updates the numeric phase performs.
 */

export interface Symbolic {
  m: number;
  /** order[k] = node eliminated k-th */
  order: Int32Array;
  /** column v's entries: colRows[colStart[v] .. colEnd[v]) (node ids), colSlots (value slots) */
  colStart: Int32Array;
  colEnd: Int32Array;
  colRows: Int32Array;
  colSlots: Int32Array;
  /** Schur updates of column v: updStart[v]..; entries a,b index colRows; target slot (≥0) or diagonal (−1−node) */
  updStart: Int32Array;
  updA: Int32Array;
  updB: Int32Array;
  updTarget: Int32Array;
  slotCount: number;
  /** slot of the pair (u, v), either order; −1 when u and v are not adjacent */
  slotOf(u: number, v: number): number;
}

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

export function symbolicFactor(m: number, pairs: ArrayLike<number>): Symbolic {
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
  const patterns: number[][] = new Array(m);
  let k = 0;
  let tick = 0;
  while (heap.size > 0) {
    const v = heap.pop();
    if (done[v] || heap.topKey !== deg[v]) continue;
    done[v] = 1;
    order[k++] = v;
    const nbrs: number[] = [];
    for (const u of adj[v]!) if (!done[u]) nbrs.push(u);
    patterns[v] = nbrs;
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
  const pos = new Int32Array(m);
  for (let i = 0; i < m; i++) pos[order[i]!] = i;

  // Slots: column v's entries are consecutive, in elimination order of their
  // rows; a pair (u, v) lives in the column of whichever was eliminated first.
  const colStart = new Int32Array(m);
  const colEnd = new Int32Array(m);
  let total = 0;
  for (let i = 0; i < m; i++) {
    const v = order[i]!;
    const pat = patterns[v]!;
    // Insertion sort by elimination position: patterns are a handful of entries
    // on near-tree networks, and Array#sort allocates a work array per call.
    for (let i = 1; i < pat.length; i++) {
      const x = pat[i]!;
      const px = pos[x]!;
      let j = i - 1;
      while (j >= 0 && pos[pat[j]!]! > px) {
        pat[j + 1] = pat[j]!;
        j--;
      }
      pat[j + 1] = x;
    }
    colStart[v] = total;
    total += pat.length;
    colEnd[v] = total;
  }
  const colRows = new Int32Array(total);
  const colSlots = new Int32Array(total);
  for (let v = 0; v < m; v++) {
    const pat = patterns[v] ?? [];
    for (let i = 0; i < pat.length; i++) {
      colRows[colStart[v]! + i] = pat[i]!;
      colSlots[colStart[v]! + i] = colStart[v]! + i;
    }
  }
  const slotOf = (u: number, v: number): number => {
    if (u === v) return -1;
    const a = pos[u]! < pos[v]! ? u : v;
    const b = a === u ? v : u;
    for (let i = colStart[a]!, e = colEnd[a]!; i < e; i++) if (colRows[i] === b) return i;
    return -1;
  };
  let updCount = 0;
  for (let v = 0; v < m; v++) {
    const d = (patterns[v] ?? []).length;
    updCount += (d * (d + 1)) / 2;
  }
  const updStart = new Int32Array(m + 1);
  const updA = new Int32Array(updCount);
  const updB = new Int32Array(updCount);
  const updTarget = new Int32Array(updCount);
  let w = 0;
  for (let v = 0; v < m; v++) {
    updStart[v] = w;
    const s = colStart[v]!;
    const e = colEnd[v]!;
    for (let a = s; a < e; a++) {
      for (let b = a; b < e; b++) {
        updA[w] = a;
        updB[w] = b;
        updTarget[w] = a === b ? -1 - colRows[a]! : slotOf(colRows[a]!, colRows[b]!);
        w++;
      }
    }
  }
  updStart[m] = w;
  return {
    m,
    order,
    colStart,
    colEnd,
    colRows,
    colSlots,
    updStart,
    updA,
    updB,
    updTarget,
    slotCount: total,
    slotOf,
  };
}
