/**
 * Walking chains: from a port, follow pipes and two-port parts until the
 * first branch (a node with more than two flow links), a load, a header, a
 * diverter or a heat source. Callers pass the circulating adjacency
 * (./circulating.ts), so dead-end legs to accessories and vessels never count as branches.
 */
import type { Part } from "@/lib/schematic/schema";
import type { Adjacency, NetworkModel } from "./model";

export interface Chain {
  parts: Part[];
  /** the node where the walk stopped (a branch point or the last node) */
  end: number;
}

export function walkChain(model: NetworkModel, adj: Adjacency, start: number, cameFrom: number): Chain {
  const parts: Part[] = [];
  let n = start;
  let prev = cameFrom;
  for (let guard = 0; guard < 500; guard++) {
    let k = -1;
    let count = 0;
    for (let j = adj.start[n]!; j < adj.start[n + 1]!; j++) {
      if (adj.list[j] === prev) continue;
      k = adj.list[j]!;
      count++;
    }
    if (count !== 1) break;
    const l = model.links[k]!;
    if (l.role === "load" || l.role.startsWith("header") || l.role.startsWith("diverter") || l.role === "heat-source") break;
    if (l.role !== "pipe") parts.push(model.partById.get(l.id)!);
    n = l.from === n ? l.to : l.from;
    prev = k;
  }
  return { parts, end: n };
}
