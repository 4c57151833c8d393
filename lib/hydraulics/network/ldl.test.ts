import { lusolve } from "mathjs";
import { describe, expect, it } from "vitest";
import { factor, newFactor, solve, symbolicFactor } from "./ldl";

/** A weighted Laplacian (links with conductance w) plus a grounding on node 0: SPD, as the solver's matrices are. */
function laplacian(m: number, links: [number, number, number][]) {
  const dense = Array.from({ length: m }, () => new Array<number>(m).fill(0));
  for (const [a, b, w] of links) {
    dense[a]![a]! += w;
    dense[b]![b]! += w;
    dense[a]![b]! -= w;
    dense[b]![a]! -= w;
  }
  dense[0]![0]! += 1.5;
  return dense;
}

describe("sparse LDLᵀ (up-looking, elimination tree)", () => {
  it("solves a looped weighted Laplacian as dense LU does (mathjs lusolve, an independent solver)", () => {
    // 3 × 4 mesh with one diagonal and one repeated (parallel) link, weights 0.5 … 3.1
    const links: [number, number, number][] = [];
    for (let i = 0; i < 3; i++) for (let j = 0; j < 4; j++) {
      const v = i * 4 + j;
      if (j < 3) links.push([v, v + 1, 0.5 + ((v * 7) % 5) * 0.4]);
      if (i < 2) links.push([v, v + 4, 1 + ((v * 3) % 4) * 0.7]);
    }
    links.push([0, 5, 2.2], [6, 7, 0.9]);
    const m = 12;
    const pairs = links.flatMap(([a, b]) => [a, b]);
    const { sym, entryOfPair } = symbolicFactor(m, pairs);
    const diag = new Float64Array(m);
    const ax = new Float64Array(sym.rowOf.length);
    const dense = laplacian(m, links);
    for (let v = 0; v < m; v++) diag[v] = dense[v]![v]!;
    links.forEach(([, , w], t) => (ax[entryOfPair[t]!] = ax[entryOfPair[t]!]! - w));
    const f = newFactor(sym);
    const b = Float64Array.from({ length: m }, (_, i) => Math.sin(i + 1));
    const expected = (lusolve(dense, Array.from(b)) as number[][]).map((r) => r[0]!);
    expect(factor(f, diag, ax)).toBe(true);
    solve(f, b);
    b.forEach((x, i) => expect(x).toBeCloseTo(expected[i]!, 12));
    // factorising again (as each gradient iteration does) gives the same factor
    const again = Float64Array.from({ length: m }, (_, i) => Math.sin(i + 1));
    factor(f, diag, ax);
    solve(f, again);
    expect(Array.from(again)).toEqual(Array.from(b));
  });
  it("reports a node cut off from every fixed head (zero pivot) and stays finite", () => {
    // nodes 0–1 grounded through the diagonal; node 2 joined to nothing
    const { sym, entryOfPair } = symbolicFactor(3, [0, 1]);
    const ax = new Float64Array(sym.rowOf.length);
    ax[entryOfPair[0]!] = -1;
    const f = newFactor(sym);
    expect(factor(f, Float64Array.from([2, 1, 0]), ax)).toBe(false);
    const b = Float64Array.from([1, 0, 0]);
    solve(f, b);
    expect(b[0]).toBeCloseTo(1, 12); // [[2, −1], [−1, 1]]⁻¹ · [1, 0] = [1, 1]
    expect(b[1]).toBeCloseTo(1, 12);
    expect(Number.isFinite(b[2]!)).toBe(true);
  });
});
