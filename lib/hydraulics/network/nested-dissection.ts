/**
 * A nested-dissection elimination order, the floor to measure the solver's
 * minimum-degree order (ordering.ts) against: George's automatic nested
 * dissection with level-structure separators (George & Liu, Computer Solution
 * of Large Sparse Positive Definite Systems, Prentice-Hall 1981, ch. 8). Each
 * connected piece: a pseudo-peripheral node by repeated breadth-first search
 * (Gibbs, Poole & Stockmeyer 1976), its level structure, the smallest level in
 * the middle third as separator, thinned to the nodes that touch the far side;
 * both sides ordered the same way first, the separator last. Pieces of at
 * most LEAF nodes are ordered by minimum degree, as multilevel tools do at the
 * bottom of their dissection. On a 2-D mesh nested dissection gives O(n log n)
 * fill and O(n^1.5) work, the known bounds for such graphs (Hoffman, Martin &
 * Rose 1973; Lipton, Rose & Tarjan 1979).
 */
import { graphOf } from "./low-degree";
import { minimumDegreeOrder } from "./ordering";

const LEAF = 64;

export function nestedDissection(m: number, pairs: ArrayLike<number>): Int32Array {
  const { start, len, adj } = graphOf(m, pairs);
  const alive = new Uint8Array(m).fill(1); // not yet numbered
  const level = new Int32Array(m);
  const stamp = new Int32Array(m).fill(-1);
  let tick = 0;
  const live = (v: number, each: (w: number) => void) => {
    for (let e = start[v]!; e < start[v]! + len[v]!; e++) if (alive[adj[e]!]) each(adj[e]!);
  };
  /** Breadth-first levels from root over alive nodes: the visit list and the deepest level. */
  const bfs = (root: number) => {
    const t = ++tick;
    const seen = [root];
    stamp[root] = t;
    level[root] = 0;
    for (let i = 0; i < seen.length; i++) {
      const v = seen[i]!;
      live(v, (w) => {
        if (stamp[w] === t) return;
        stamp[w] = t;
        level[w] = level[v]! + 1;
        seen.push(w);
      });
    }
    return { seen, depth: level[seen[seen.length - 1]!]! };
  };
  /** Minimum degree on the piece's own subgraph. */
  const leafOrder = (nodes: number[]): number[] => {
    const local = new Map(nodes.map((v, i) => [v, i]));
    const sub: number[] = [];
    for (const v of nodes) live(v, (w) => local.has(w) && v < w && sub.push(local.get(v)!, local.get(w)!));
    return Array.from(minimumDegreeOrder(nodes.length, sub), (i) => nodes[i]!);
  };

  const order: number[] = [];
  /** Number the alive nodes reachable from `roots`, piece by piece, separators after their sides. */
  const dissect = (roots: number[]): void => {
    for (const s of roots) {
      if (!alive[s]) continue;
      let { seen, depth } = bfs(s);
      if (seen.length <= LEAF) {
        const ordered = leafOrder(seen);
        for (const v of ordered) alive[v] = 0;
        order.push(...ordered);
        continue;
      }
      for (let guard = 0; guard < 8; guard++) {
        // restart from the narrowest node of the deepest level until the depth stops growing
        let far = seen[seen.length - 1]!;
        let best = Infinity;
        for (const v of seen) {
          if (level[v] !== depth) continue;
          let d = 0;
          live(v, () => d++);
          if (d < best) [best, far] = [d, v];
        }
        const again = bfs(far);
        const grew = again.depth > depth;
        ({ seen, depth } = again);
        if (!grew) break;
      }
      const width = new Int32Array(depth + 1);
      for (const v of seen) width[level[v]!]!++;
      let cut = depth >> 1;
      for (let l = Math.floor(depth / 3); l <= Math.ceil((2 * depth) / 3); l++) if (l > 0 && l < depth && width[l]! < width[cut]!) cut = l;
      // separator: the cut level's nodes that touch the level above (the others join the near side)
      const sep = seen.filter((v) => {
        if (level[v] !== cut) return false;
        let touches = false;
        live(v, (w) => (touches ||= level[w] === cut + 1 && stamp[w] === tick));
        return touches;
      });
      if (sep.length === 0 || sep.length === seen.length) {
        const ordered = leafOrder(seen);
        for (const v of ordered) alive[v] = 0;
        order.push(...ordered);
        continue;
      }
      for (const v of sep) alive[v] = 0;
      dissect(seen.filter((v) => alive[v]));
      order.push(...sep);
    }
  };
  dissect([...Array(m).keys()]);
  return Int32Array.from(order);
}
