import { describe, expect, it } from "vitest";
import { fillOf } from "./fill";
import { eliminateLowDegree, graphOf } from "./low-degree";
import { minimumDegreeOrder } from "./ordering";

/** Nodes eliminated by the linear stage and its order, on m nodes. */
function lowDegree(m: number, pairs: number[]) {
  const order = new Int32Array(m);
  const done = new Uint8Array(m);
  const count = eliminateLowDegree(graphOf(m, pairs), order, done, new Int32Array(m));
  return { count, order: order.subarray(0, count), done };
}

describe("the linear low-degree stage of the minimum-degree order", () => {
  it("takes every node of a tree, leaves first, with no fill (a tree's perfect elimination order, George & Liu 1981 §5.1)", () => {
    // a random tree of 200 nodes: node i joined to a parent below it (deterministic LCG)
    let seed = 7;
    const rand = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
    const pairs: number[] = [];
    for (let i = 1; i < 200; i++) pairs.push(i, Math.floor(rand() * i));
    const { count, order } = lowDegree(200, pairs);
    expect(count).toBe(200);
    // no fill: L holds exactly the tree's 199 edges
    expect(fillOf(200, pairs, order).nnzL).toBe(199);
  });

  it("takes a whole ladder (flow and return rails joined by rungs, as radiators join them) with one fill entry per rung", () => {
    const n = 30; // rungs; nodes 0..n−1 the flow rail, n..2n−1 the return rail
    const pairs: number[] = [];
    for (let i = 0; i < n; i++) {
      pairs.push(i, n + i);
      if (i + 1 < n) pairs.push(i, i + 1, n + i, n + i + 1);
    }
    const { count, order } = lowDegree(2 * n, pairs);
    expect(count).toBe(2 * n);
    // series–parallel: each of the n − 1 cells closes with one fill edge, so nnz(L) = edges + (n − 1)
    const edges = pairs.length / 2;
    expect(fillOf(2 * n, pairs, order).nnzL).toBe(edges + (n - 1));
  });

  it("leaves the degree-≥3 core of a mesh to minimum degree: only the four corners of a 6 × 6 mesh go first", () => {
    const k = 6;
    const pairs: number[] = [];
    for (let i = 0; i < k; i++) for (let j = 0; j < k; j++) {
      if (i + 1 < k) pairs.push(i * k + j, (i + 1) * k + j);
      if (j + 1 < k) pairs.push(i * k + j, i * k + j + 1);
    }
    const { count, done } = lowDegree(k * k, pairs);
    // a corner's elimination joins its two neighbours, whose degree stays 3
    expect(count).toBe(4);
    expect([0, k - 1, k * (k - 1), k * k - 1].every((v) => done[v] === 1)).toBe(true);
    // and the whole order is still a permutation
    const order = minimumDegreeOrder(k * k, pairs);
    expect([...order].sort((a, b) => a - b)).toEqual([...Array(k * k).keys()]);
  });

  it("merges parallel links and ignores self-pairs", () => {
    const g = graphOf(3, [0, 1, 1, 0, 1, 2, 2, 2, 0, 1]);
    expect([...g.len]).toEqual([1, 2, 1]);
  });
});
