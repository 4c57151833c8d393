/**
 * Walking chains: from a port, follow pipes and two-port parts until the
 * first branch (a node with more than two flow links), a load, a header, a
 * diverter or a heat source. Pipes that only lead to a no-flow accessory or to
 * the expansion vessel do not count as branches.
 */
import { partRegistry } from "@/lib/schematic/parts";
import type { Part, Schematic } from "@/lib/schematic/schema";
import type { NetworkModel } from "./model";

/** Links at each node, leaving out pipes that only lead to a no-flow accessory or vessel. */
export function flowAdjacency(doc: Schematic, model: NetworkModel): number[][] {
  const dead = new Set<number>();
  for (const part of doc.parts) {
    const role = partRegistry[part.type].role;
    if (role === "accessory" || role === "vessel") dead.add(model.portNode.get(`${part.id}.connection`)!);
  }
  const adj: number[][] = Array.from({ length: model.nodeCount }, () => []);
  model.links.forEach((l, k) => {
    if (dead.has(l.from) || dead.has(l.to)) return;
    adj[l.from]!.push(k);
    adj[l.to]!.push(k);
  });
  return adj;
}

export interface Chain {
  parts: Part[];
  /** the node where the walk stopped (a branch point or the last node) */
  end: number;
}

export function walkChain(model: NetworkModel, adj: number[][], start: number, cameFrom: number): Chain {
  const parts: Part[] = [];
  let n = start;
  let prev = cameFrom;
  for (let guard = 0; guard < 500; guard++) {
    const next = adj[n]!.filter((k) => k !== prev);
    if (next.length !== 1) break;
    const k = next[0]!;
    const l = model.links[k]!;
    if (l.role === "load" || l.role.startsWith("header") || l.role.startsWith("diverter") || l.role === "heat-source") break;
    if (l.role !== "pipe") parts.push(model.partById.get(l.id)!);
    n = l.from === n ? l.to : l.from;
    prev = k;
  }
  return { parts, end: n };
}
