import type { Symbolic } from "./ldl";

// A network's shape for the solver (lib/hydraulics/network/gga.ts) and its prepared symbolic
// phase, kept apart so the per-topology memo (topology-cache.ts) and the solver share them.

export interface Topology {
  nodeCount: number;
  from: Int32Array;
  to: Int32Array;
  /** nodes held at a fixed head (one per connected component at least) */
  fixed: Uint8Array;
}

export interface Prepared {
  topo: Topology;
  unknownOf: Int32Array; // node → unknown index (its elimination position) or −1
  m: number;
  sym: Symbolic;
  linkSlot: Int32Array; // link → its entry among the matrix off-diagonals (sym.rowOf) or −1
}
