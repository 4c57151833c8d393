/**
 * Numeric LDLᵀ factorisation and solve on the structure from ordering.ts.
 * The gradient-method matrix is a weighted graph Laplacian with the fixed-
 * head nodes removed, hence symmetric positive definite, so no pivoting is
 * needed (Todini & Pilati 1988; Rossman, EPANET 2.2 manual §12).
 */
import type { Symbolic } from "./ordering";

export interface Factor {
  sym: Symbolic;
  diag: Float64Array;
  vals: Float64Array;
}

/** Values are the matrix entries on entry and L / D on return (in place). */
export function factorInPlace(sym: Symbolic, diag: Float64Array, vals: Float64Array): boolean {
  const { order, colStart, colEnd, colSlots, updStart, updA, updB, updTarget } = sym;
  let ok = true;
  for (let k = 0; k < sym.m; k++) {
    const v = order[k]!;
    let d = diag[v]!;
    if (!(d > 1e-300)) {
      // A node cut off from every fixed head: keep the factor finite; the
      // caller's balance check reports the element.
      ok = false;
      d = 1e-300;
      diag[v] = d;
    }
    const s = colStart[v]!;
    const e = colEnd[v]!;
    for (let i = s; i < e; i++) vals[colSlots[i]!] = vals[colSlots[i]!]! / d;
    for (let u = updStart[v]!; u < updStart[v + 1]!; u++) {
      const la = vals[colSlots[updA[u]!]!]!;
      const lb = vals[colSlots[updB[u]!]!]!;
      const t = updTarget[u]!;
      if (t < 0) diag[-1 - t] = diag[-1 - t]! - la * lb * d;
      else vals[t] = vals[t]! - la * lb * d;
    }
  }
  return ok;
}

/** Solve (L D Lᵀ) x = b, overwriting b with x. */
export function solveInPlace(sym: Symbolic, diag: Float64Array, vals: Float64Array, b: Float64Array): void {
  const { order, colStart, colEnd, colRows, colSlots } = sym;
  const m = sym.m;
  for (let k = 0; k < m; k++) {
    const v = order[k]!;
    const bv = b[v]!;
    if (bv === 0) continue;
    for (let i = colStart[v]!; i < colEnd[v]!; i++) b[colRows[i]!] = b[colRows[i]!]! - vals[colSlots[i]!]! * bv;
  }
  for (let v = 0; v < m; v++) b[v] = b[v]! / diag[v]!;
  for (let k = m - 1; k >= 0; k--) {
    const v = order[k]!;
    let x = b[v]!;
    for (let i = colStart[v]!; i < colEnd[v]!; i++) x -= vals[colSlots[i]!]! * b[colRows[i]!]!;
    b[v] = x;
  }
}
