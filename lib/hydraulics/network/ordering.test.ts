import { describe, expect, it } from "vitest";
import { minimumDegreeOrder } from "./ordering";

/** Random graph: a few dense clusters joined by sparse links (deterministic LCG). */
function randomGraph(seed: number, m: number, edges: number): number[] {
  let s = seed;
  const rand = (n: number) => ((s = (s * 1103515245 + 12345) % 2 ** 31), s % n);
  const pairs: number[] = [];
  for (let e = 0; e < edges; e++) {
    const a = rand(m);
    // half the links stay within a cluster of 8 nodes: cliques, where nodes become indistinguishable
    const b = e % 2 ? (a - (a % 8) + rand(8)) % m : rand(m);
    pairs.push(a, b);
  }
  return pairs;
}

describe("minimum-degree order", () => {
  it("eliminates every node at the least degree of the elimination graph (George & Liu 1981 §5.1–5.4; degrees 0 and 1 alike: neither makes fill)", () => {
    for (let seed = 1; seed <= 25; seed++) {
      const m = 40 + seed;
      const pairs = randomGraph(seed, m, 3 * m);
      const order = minimumDegreeOrder(m, pairs);
      expect([...order].sort((a, b) => a - b)).toEqual([...Array(m).keys()]);
      // brute force: the elimination graph as sets, each node's degree when it goes
      const adj = Array.from({ length: m }, () => new Set<number>());
      for (let t = 0; t < pairs.length; t += 2) {
        if (pairs[t] === pairs[t + 1]) continue;
        adj[pairs[t]!]!.add(pairs[t + 1]!);
        adj[pairs[t + 1]!]!.add(pairs[t]!);
      }
      const left = new Set(Array.from({ length: m }, (_, i) => i));
      for (const v of order) {
        let least = Infinity;
        for (const u of left) least = Math.min(least, adj[u]!.size);
        expect(Math.max(adj[v]!.size, 1)).toBe(Math.max(least, 1));
        const nb = [...adj[v]!];
        for (const a of nb) {
          adj[a]!.delete(v);
          for (const b of nb) if (a !== b) adj[a]!.add(b);
        }
        left.delete(v);
      }
    }
  });
});
