/**
 * The circulating part of the network: every link that can carry a
 * circulating flow. A link whose end is a dead end (a node with no other link)
 * carries nothing by continuity — there are no demands in a closed heating
 * circuit — so dead ends are pruned repeatedly until none is left (the
 * graph's 2-core). That removes whole dead-end sub-trees at once: accessories,
 * expansion vessels, drain cocks, filling loops, and tees leading only to
 * them (tee → tee → vessel + filling loop), not just the last pipe.
 *
 * Added beside chains.ts (not in it) while the solver files are being worked
 * on; walkChain accepts this adjacency unchanged.
 */
import { adjacency, type Adjacency, type NetworkModel } from "./model";

/** Links kept by circulatingLinks: true for links on a loop or between loops. */
export function circulatingLinks(model: NetworkModel): Uint8Array {
  const { links, nodeCount } = model;
  const keep = new Uint8Array(links.length).fill(1);
  const degree = new Int32Array(nodeCount);
  for (const l of links) {
    if (l.from === l.to) continue; // a self-loop never leads anywhere
    degree[l.from]!++;
    degree[l.to]!++;
  }
  links.forEach((l, k) => {
    if (l.from === l.to) keep[k] = 0;
  });
  const full = adjacency(nodeCount, links);
  const stack: number[] = [];
  for (let n = 0; n < nodeCount; n++) if (degree[n]! <= 1) stack.push(n);
  while (stack.length > 0) {
    const n = stack.pop()!;
    for (let j = full.start[n]!; j < full.start[n + 1]!; j++) {
      const k = full.list[j]!;
      if (!keep[k]) continue;
      keep[k] = 0;
      const l = links[k]!;
      const m = l.from === n ? l.to : l.from;
      degree[n]!--;
      if (--degree[m]! === 1) stack.push(m);
    }
  }
  return keep;
}

/** Adjacency over the circulating links only (dead-end sub-trees pruned). */
export function circulatingAdjacency(model: NetworkModel): Adjacency {
  const keep = circulatingLinks(model);
  return adjacency(model.nodeCount, model.links, (k) => keep[k] === 1);
}
