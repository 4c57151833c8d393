/**
 * Fill and work of a sparse LDLᵀ factorisation under a given elimination
 * order, without factorising: the symbolic phase of ldl.ts (elimination tree
 * and column counts, Davis, Direct Methods for Sparse Linear Systems, SIAM
 * 2006, §4.1–4.4) on the pairs renumbered by that order. nnz(L) counts the
 * strictly lower entries; work counts the multiply-adds, Σ_j c_j(c_j + 1)/2
 * for a column with c_j entries below the diagonal.
 */
import { symbolicFactor } from "./ldl";

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
  const renumbered: number[] = [];
  for (let t = 0; t + 1 < pairs.length; t += 2) {
    if (pairs[t] !== pairs[t + 1]) renumbered.push(pos[pairs[t]!]!, pos[pairs[t + 1]!]!);
  }
  const { nnzL, work, maxColumn } = symbolicFactor(m, renumbered).sym;
  return { nnzL, work, maxColumn };
}
