import { describe, expect, it } from "vitest";
import { fillOf } from "./fill";
import { nestedDissection } from "./nested-dissection";
import { minimumDegreeOrder } from "./ordering";

/** k × k five-point mesh as node pairs */
const mesh = (k: number) => {
  const pairs: number[] = [];
  for (let i = 0; i < k; i++) for (let j = 0; j < k; j++) {
    if (i + 1 < k) pairs.push(i * k + j, (i + 1) * k + j);
    if (j + 1 < k) pairs.push(i * k + j, i * k + j + 1);
  }
  return pairs;
};

describe("fill and work of an elimination order", () => {
  it("counts what eliminating the graph node by node creates (independent method: the elimination graph, George & Liu 1981 §5.1)", () => {
    for (const k of [3, 7, 12]) {
      const pairs = mesh(k);
      const order = minimumDegreeOrder(k * k, pairs);
      const f = fillOf(k * k, pairs, order);
      // brute force: eliminate each node, joining its remaining neighbours into a clique
      const adj = Array.from({ length: k * k }, () => new Set<number>());
      for (let t = 0; t < pairs.length; t += 2) {
        adj[pairs[t]!]!.add(pairs[t + 1]!);
        adj[pairs[t + 1]!]!.add(pairs[t]!);
      }
      let nnz = 0;
      let work = 0;
      for (const v of order) {
        const nb = [...adj[v]!];
        nnz += nb.length;
        work += (nb.length * (nb.length + 1)) / 2;
        for (const a of nb) {
          adj[a]!.delete(v);
          for (const b of nb) if (a !== b) adj[a]!.add(b);
        }
      }
      expect(f.nnzL).toBe(nnz);
      expect(f.work).toBe(work);
    }
  });
  it("a tridiagonal (path) matrix in natural order has no fill: nnz(L) = n − 1", () => {
    const pairs = Array.from({ length: 9 }, (_, i) => [i, i + 1]).flat();
    expect(fillOf(10, pairs, [...Array(10).keys()]).nnzL).toBe(9);
    // eliminating the middle of a path first fills one entry
    expect(fillOf(3, [0, 1, 1, 2], [1, 0, 2]).nnzL).toBe(3);
  });
  it("nested dissection orders every node once and beats the natural (banded) order on a mesh", () => {
    const k = 30;
    const pairs = mesh(k);
    const nd = nestedDissection(k * k, pairs);
    expect([...nd].sort((a, b) => a - b)).toEqual([...Array(k * k).keys()]);
    const natural = fillOf(k * k, pairs, [...Array(k * k).keys()]);
    const dissected = fillOf(k * k, pairs, nd);
    // banded: nnz(L) ≈ n·k; dissection: O(n log n) — well below on a 30 × 30 mesh
    expect(natural.nnzL).toBeGreaterThan(k * k * (k - 2));
    expect(dissected.nnzL).toBeLessThan(natural.nnzL / 2);
  });
});
