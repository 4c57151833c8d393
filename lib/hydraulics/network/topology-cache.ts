/**
 * The symbolic phase (ordering, filled structure) depends on the topology
 * only — node count, link ends, fixed-head nodes — never on flows, sizes or
 * valve positions (closed links stay in the matrix, EPANET's way). So it is
 * kept per topology and reused by every calculation of the same network: a
 * board sized again after a property edit, the optimiser's checking runs, a
 * scenario sweep. A pure memo (same topology, same answer), keyed by an
 * FNV-1a hash (Fowler, Noll & Vo) of the arrays and confirmed by comparing
 * them; at most MAX_ENTRIES topologies or MAX_SLOTS stored entries, least
 * recently used dropped first.
 */
import type { Prepared, Topology } from "./topology";

const MAX_ENTRIES = 16;
const MAX_SLOTS = 20_000_000;
const cache = new Map<string, Prepared>();

function hash(t: Topology): string {
  let h = 0x811c9dc5 ^ t.nodeCount;
  const mix = (x: number) => {
    h ^= x;
    h = Math.imul(h, 0x01000193);
  };
  for (let i = 0; i < t.from.length; i++) {
    mix(t.from[i]!);
    mix(t.to[i]!);
  }
  for (let n = 0; n < t.fixed.length; n++) if (t.fixed[n]) mix(n);
  return `${t.nodeCount}:${t.from.length}:${h >>> 0}`;
}

const same = (a: ArrayLike<number>, b: ArrayLike<number>) => {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
};

// stored entries: L's row indices, the row patterns and their slots (3 per entry of L), and A's pattern
const size = (p: Prepared) => 3 * p.sym.nnzL + p.sym.rowOf.length;

/** The prepared topology from the memo, or made by `make` and kept. */
export function cachedPrepare(t: Topology, make: (t: Topology) => Prepared): Prepared {
  const key = hash(t);
  const hit = cache.get(key);
  if (hit && hit.topo.nodeCount === t.nodeCount && same(hit.topo.from, t.from) && same(hit.topo.to, t.to) && same(hit.topo.fixed, t.fixed)) {
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  const made = make({ nodeCount: t.nodeCount, from: Int32Array.from(t.from), to: Int32Array.from(t.to), fixed: Uint8Array.from(t.fixed) });
  cache.set(key, made);
  let total = 0;
  for (const p of cache.values()) total += size(p);
  for (const [k, p] of cache) {
    if (cache.size <= MAX_ENTRIES && total <= MAX_SLOTS) break;
    if (p === made) continue;
    cache.delete(k);
    total -= size(p);
  }
  return made;
}

/** For tests and benchmarks: forget every kept topology. */
export function clearTopologyCache(): void {
  cache.clear();
}
