/**
 * Fill and work of a sparse LDLᵀ factorisation under a given elimination
 * order, without factorising: the elimination tree and the column counts of L
 * by the row-subtree method (Liu, "The role of elimination trees in sparse
 * factorization", SIAM J. Matrix Anal. Appl. 11, 1990; Davis, Direct Methods
 * for Sparse Linear Systems, SIAM 2006, §4.1–4.4). nnz(L) counts the strictly
 * lower entries; work counts the multiply-adds of the right-looking
 * factorisation, Σ_j c_j(c_j + 1)/2 for a column with c_j entries below the
 * diagonal (the Schur updates ldl.ts performs).
 */

export interface FillStats {
  nnzL: number;
  work: number;
  /** largest column count (front size) */
  maxColumn: number;
}

/** m unknowns, adjacency as node pairs (either order, duplicates allowed), order[k] = node eliminated k-th. */
export function fillOf(m: number, pairs: ArrayLike<number>, order: ArrayLike<number>): FillStats {
  const pos = new Int32Array(m);
  for (let k = 0; k < m; k++) pos[order[k]!] = k;
  // adjacency in elimination positions: for each position i, the earlier positions it touches
  const deg = new Int32Array(m + 1);
  for (let t = 0; t + 1 < pairs.length; t += 2) {
    const a = pos[pairs[t]!]!;
    const b = pos[pairs[t + 1]!]!;
    if (a !== b) deg[Math.max(a, b) + 1]!++;
  }
  for (let i = 0; i < m; i++) deg[i + 1]! += deg[i]!;
  const lower = new Int32Array(deg[m]!);
  const fillAt = deg.slice(0, m);
  for (let t = 0; t + 1 < pairs.length; t += 2) {
    const a = pos[pairs[t]!]!;
    const b = pos[pairs[t + 1]!]!;
    if (a !== b) lower[fillAt[Math.max(a, b)]!++] = Math.min(a, b);
  }
  // row i of L: the union of the etree paths from each earlier neighbour up to i
  const parent = new Int32Array(m).fill(-1);
  const mark = new Int32Array(m).fill(-1);
  const count = new Int32Array(m);
  for (let i = 0; i < m; i++) {
    mark[i] = i;
    for (let t = deg[i]!; t < deg[i + 1]!; t++) {
      for (let j = lower[t]!; mark[j] !== i; j = parent[j]!) {
        if (parent[j] === -1) parent[j] = i;
        count[j]!++;
        mark[j] = i;
      }
    }
  }
  let nnzL = 0;
  let work = 0;
  let maxColumn = 0;
  for (let j = 0; j < m; j++) {
    const c = count[j]!;
    nnzL += c;
    work += (c * (c + 1)) / 2;
    if (c > maxColumn) maxColumn = c;
  }
  return { nnzL, work, maxColumn };
}
