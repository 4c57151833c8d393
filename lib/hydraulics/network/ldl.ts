/**
 * Sparse LDLᵀ factorisation and solve for the gradient method's node-head
 * system, in the up-looking form of Davis's LDL package (T. A. Davis,
 * "Algorithm 849: A concise sparse Cholesky factorization package", ACM TOMS
 * 31(4), 2005; Direct Methods for Sparse Linear Systems, SIAM 2006, §4.1–4.4):
 * the symbolic phase finds the elimination tree and the column counts of L
 * from the matrix pattern alone; each numeric factorisation then finds row k
 * of L by walking that tree from the row's nonzeros, so it costs its flops and
 * nothing more. The matrix is a weighted graph Laplacian with the fixed-head
 * nodes removed, hence symmetric positive definite: no pivoting (Todini &
 * Pilati 1988; Rossman, EPANET 2.2 manual §12).
 *
 * Unknowns are numbered in elimination order (the caller permutes once, in
 * the symbolic phase), so no permutation is applied per solve.
 */

export interface Symbolic {
  m: number;
  /** strictly upper pattern of A by column: rows rowOf[colStart[k] .. colStart[k+1]) (< k); duplicates allowed */
  colStart: Int32Array;
  rowOf: Int32Array;
  /** elimination tree: parent[k] (−1 at a root) */
  parent: Int32Array;
  /** column k of L: entries lp[k] .. lp[k+1], their rows li (in increasing order) */
  lp: Int32Array;
  li: Int32Array;
  /**
   * row k of L: the columns i < k with an entry, rowPat[rowStart[k] .. rowStart[k+1]),
   * in an order where each comes after the ones it depends on (the elimination-tree
   * walk of ldl_numeric, done once here), and the slot of L(k, i) in column i
   */
  rowStart: Int32Array;
  rowPat: Int32Array;
  rowSlot: Int32Array;
  /** strictly lower entries of L */
  nnzL: number;
  /** multiply-adds of the factorisation, Σ c(c+1)/2 over columns of c entries */
  work: number;
  /** largest column count */
  maxColumn: number;
}

/**
 * m unknowns already in elimination order; pairs (i, j) with i ≠ j. Returns
 * the structure and, for each pair, the index of its entry in A's value array
 * (entryOfPair[t] for pair t).
 */
export function symbolicFactor(m: number, pairs: ArrayLike<number>): { sym: Symbolic; entryOfPair: Int32Array } {
  const count = pairs.length >> 1;
  const colStart = new Int32Array(m + 1);
  for (let t = 0; t < count; t++) colStart[Math.max(pairs[2 * t]!, pairs[2 * t + 1]!) + 1]!++;
  for (let k = 0; k < m; k++) colStart[k + 1]! += colStart[k]!;
  const rowOf = new Int32Array(count);
  const entryOfPair = new Int32Array(count);
  const at = colStart.slice(0, m);
  for (let t = 0; t < count; t++) {
    const a = pairs[2 * t]!;
    const b = pairs[2 * t + 1]!;
    const e = at[a > b ? a : b]!++;
    rowOf[e] = a < b ? a : b;
    entryOfPair[t] = e;
  }
  // ldl_symbolic: row k of L is the union of the tree paths from A's row-k
  // nonzeros up to k; each node met adds one entry to its column.
  const parent = new Int32Array(m).fill(-1);
  const flag = new Int32Array(m);
  const lnz = new Int32Array(m);
  for (let k = 0; k < m; k++) {
    flag[k] = k;
    for (let p = colStart[k]!; p < colStart[k + 1]!; p++) {
      for (let i = rowOf[p]!; flag[i] !== k; i = parent[i]!) {
        if (parent[i] === -1) parent[i] = k;
        lnz[i]!++;
        flag[i] = k;
      }
    }
  }
  const lp = new Int32Array(m + 1);
  let work = 0;
  let maxColumn = 0;
  for (let k = 0; k < m; k++) {
    const c = lnz[k]!;
    lp[k + 1] = lp[k]! + c;
    work += (c * (c + 1)) / 2;
    if (c > maxColumn) maxColumn = c;
  }
  // Row patterns in dependency order (each path from a nonzero up the tree, reversed
  // onto a stack, as ldl_numeric finds them), and L's row indices by column.
  const nnzL = lp[m]!;
  const li = new Int32Array(nnzL);
  const rowStart = new Int32Array(m + 1);
  const rowPat = new Int32Array(nnzL);
  const rowSlot = new Int32Array(nnzL);
  const next = lp.slice(0, m);
  const stack = new Int32Array(m);
  flag.fill(-1);
  let t = 0;
  for (let k = 0; k < m; k++) {
    flag[k] = k;
    let top = m;
    for (let p = colStart[k]!; p < colStart[k + 1]!; p++) {
      let len = 0;
      for (let i = rowOf[p]!; flag[i] !== k; i = parent[i]!) {
        stack[len++] = i;
        flag[i] = k;
      }
      while (len > 0) stack[--top] = stack[--len]!;
    }
    for (; top < m; top++) {
      const i = stack[top]!;
      const slot = next[i]!++;
      li[slot] = k;
      rowPat[t] = i;
      rowSlot[t++] = slot;
    }
    rowStart[k + 1] = t;
  }
  return { sym: { m, colStart, rowOf, parent, lp, li, rowStart, rowPat, rowSlot, nnzL, work, maxColumn }, entryOfPair };
}

/** The factor of one matrix of a given structure (D and L's values), reused across iterations. */
export interface Factor {
  sym: Symbolic;
  d: Float64Array;
  lx: Float64Array;
  /** dense work vector, all zero between factorisations */
  y: Float64Array;
}

export function newFactor(sym: Symbolic): Factor {
  return { sym, d: new Float64Array(sym.m), lx: new Float64Array(sym.nnzL), y: new Float64Array(sym.m) };
}

/**
 * ldl_numeric: factor A = L D Lᵀ, A given by its diagonal and the strictly
 * upper values ax (by the pattern's entries), row by row: row k of L solves
 * L(0:k, 0:k) D y = A(0:k, k) over the row's pattern only. False when a pivot
 * was not positive — a node cut off from every fixed head: its pivot is kept
 * tiny so the factor stays finite, and the caller's balance check reports the part.
 */
export function factor(f: Factor, diag: Float64Array, ax: Float64Array): boolean {
  const { m, colStart, rowOf, lp, li, rowStart, rowPat, rowSlot } = f.sym;
  const { d, lx, y } = f;
  let ok = true;
  for (let k = 0; k < m; k++) {
    for (let p = colStart[k]!; p < colStart[k + 1]!; p++) y[rowOf[p]!] = y[rowOf[p]!]! + ax[p]!;
    let dk = diag[k]!;
    for (let t = rowStart[k]!; t < rowStart[k + 1]!; t++) {
      const i = rowPat[t]!;
      const slot = rowSlot[t]!;
      const yi = y[i]!;
      y[i] = 0;
      for (let p = lp[i]!; p < slot; p++) y[li[p]!] = y[li[p]!]! - lx[p]! * yi;
      const lki = yi / d[i]!;
      dk -= lki * yi;
      lx[slot] = lki;
    }
    if (!(dk > 1e-300)) {
      ok = false;
      dk = 1e-300;
    }
    d[k] = dk;
  }
  return ok;
}

/** Solve (L D Lᵀ) x = b with the last factor, overwriting b with x. */
export function solve(f: Factor, b: Float64Array): void {
  const { m, lp, li } = f.sym;
  const { d, lx } = f;
  for (let j = 0; j < m; j++) {
    const bj = b[j]!;
    if (bj === 0) continue;
    for (let p = lp[j]!; p < lp[j + 1]!; p++) b[li[p]!] = b[li[p]!]! - lx[p]! * bj;
  }
  for (let j = 0; j < m; j++) b[j] = b[j]! / d[j]!;
  for (let j = m - 1; j >= 0; j--) {
    let x = b[j]!;
    for (let p = lp[j]!; p < lp[j + 1]!; p++) x -= lx[p]! * b[li[p]!]!;
    b[j] = x;
  }
}
