/**
 * Walking chains: from a port, follow pipes and two-port parts until the
 * first branch (a node with more than two flow links), a load, a header, a
 * diverter or a heat source. Pipes that only lead to a no-flow accessory or to
 * the expansion vessel do not count as branches.
 */
import { partRegistry } from "@/lib/schematic/parts";
import type { Part, Schematic } from "@/lib/schematic/schema";
import { adjacency, type Adjacency, type NetworkModel } from "./model";

/** Links at each node, leaving out pipes that only lead to a no-flow accessory or vessel. */
export function flowAdjacency(doc: Schematic, model: NetworkModel): Adjacency {
  const dead = new Set<number>();
  for (const part of doc.parts) {
    const role = partRegistry[part.type].role;
    if (role === "accessory" || role === "vessel") dead.add(model.portNode.get(`${part.id}.connection`)!);
  }
  return adjacency(model.nodeCount, model.links, (k) => !dead.has(model.links[k]!.from) && !dead.has(model.links[k]!.to));
}

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
