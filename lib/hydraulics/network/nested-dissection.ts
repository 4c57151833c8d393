/**
 * A nested-dissection elimination order, for comparison with the minimum-
 * degree order the solver uses (ordering.ts): George's automatic nested
 * dissection with level-structure separators (George & Liu, Computer Solution
 * of Large Sparse Positive Definite Systems, Prentice-Hall 1981, ch. 8). Each
 * connected piece: a pseudo-peripheral node (repeated breadth-first search,
 * Gibbs, Poole & Stockmeyer 1976), its level structure, the middle level as
 * separator; both sides ordered the same way first, the separator last.
 * Pieces of at most LEAF nodes are ordered as they come. On a 2-D mesh this
 * gives O(n log n) fill and O(n^1.5) work, the known lower bounds for such
 * graphs (Hoffman, Martin & Rose 1973), so it serves as the floor to measure
 * the solver's order against.
 */

const LEAF = 8;

export function nestedDissection(m: number, pairs: ArrayLike<number>): Int32Array {
  const start = new Int32Array(m + 1);
  for (let t = 0; t + 1 < pairs.length; t += 2) {
    if (pairs[t] === pairs[t + 1]) continue;
    start[pairs[t]! + 1]!++;
    start[pairs[t + 1]! + 1]!++;
  }
  for (let i = 0; i < m; i++) start[i + 1]! += start[i]!;
  const adj = new Int32Array(start[m]!);
  const fill = start.slice(0, m);
  for (let t = 0; t + 1 < pairs.length; t += 2) {
    const a = pairs[t]!;
    const b = pairs[t + 1]!;
    if (a === b) continue;
    adj[fill[a]!++] = b;
    adj[fill[b]!++] = a;
  }
  const alive = new Uint8Array(m).fill(1); // still to be ordered
  const level = new Int32Array(m).fill(-1);
  const stamp = new Int32Array(m).fill(-1);
  let tick = 0;

  /** Breadth-first levels from root over alive nodes; returns the visit list and the deepest level. */
  const bfs = (root: number): { seen: number[]; depth: number } => {
    const t = ++tick;
    const seen = [root];
    stamp[root] = t;
    level[root] = 0;
    let depth = 0;
    for (let i = 0; i < seen.length; i++) {
      const v = seen[i]!;
      for (let e = start[v]!; e < start[v + 1]!; e++) {
        const w = adj[e]!;
        if (!alive[w] || stamp[w] === t) continue;
        stamp[w] = t;
        level[w] = level[v]! + 1;
        depth = level[w]!;
        seen.push(w);
      }
    }
    return { seen, depth };
  };

  return Int32Array.from(orderPieces([...Array(m).keys()]));

  /** Recursively order the alive nodes of `nodes` (one or more pieces) and return them in order. */
  function orderPieces(nodes: number[]): number[] {
    const out: number[] = [];
    const local: number[] = [];
    for (const v of nodes) if (alive[v]) local.push(v);
    for (const s of local) {
      if (!alive[s]) continue;
      let { seen, depth } = bfs(s);
      if (seen.length <= LEAF) {
        for (const v of seen) {
          out.push(v);
          alive[v] = 0;
        }
        continue;
      }
      for (let guard = 0; guard < 8; guard++) {
        let far = seen[seen.length - 1]!;
        let best = Infinity;
        for (const v of seen) {
          if (level[v] !== depth) continue;
          let d = 0;
          for (let e = start[v]!; e < start[v + 1]!; e++) if (alive[adj[e]!]) d++;
          if (d < best) {
            best = d;
            far = v;
          }
        }
        const again = bfs(far);
        const grew = again.depth > depth;
        ({ seen, depth } = again);
        if (!grew) break;
      }
      const mid = depth >> 1;
      const sep = seen.filter((v) => level[v] === mid);
      for (const v of sep) alive[v] = 0;
      out.push(...orderPieces(seen.filter((v) => level[v] !== mid)), ...sep);
    }
    return out;
  }
}
