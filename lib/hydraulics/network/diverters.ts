/**
 * Which side of each diverter feeds the hot-water cylinder. A breadth-first
 * walk from port a (and from b) that stops at loads, heat sources and the
 * diverter itself; the side whose walk reaches a cylinder's coil flow port is
 * the hot-water side, the other the heating side. When neither or both reach
 * one, the drawn position is taken as the heating side.
 */
import type { Schematic } from "@/lib/schematic/schema";
import type { NetworkModel } from "./model";

export interface DiverterSides {
  heating: "a" | "b";
  hotWater: "a" | "b" | null;
}

export function diverterSides(doc: Schematic, model: NetworkModel): Map<string, DiverterSides> {
  const out = new Map<string, DiverterSides>();
  const diverters = doc.parts.filter((p) => p.type === "diverter-valve");
  if (diverters.length === 0) return out;
  const coilFlow = new Set<number>();
  for (const p of doc.parts) if (p.type === "cylinder") coilFlow.add(model.portNode.get(`${p.id}.coilFlow`)!);
  const adj: number[][] = Array.from({ length: model.nodeCount }, () => []);
  model.links.forEach((l, k) => {
    if (l.role === "load" || l.role === "heat-source" || l.role.startsWith("diverter")) return;
    adj[l.from]!.push(k);
    adj[l.to]!.push(k);
  });
  const reaches = (start: number): boolean => {
    const seen = new Uint8Array(model.nodeCount);
    const queue = [start];
    seen[start] = 1;
    while (queue.length) {
      const n = queue.pop()!;
      if (coilFlow.has(n)) return true;
      for (const k of adj[n]!) {
        const l = model.links[k]!;
        const m = l.from === n ? l.to : l.from;
        if (!seen[m]) {
          seen[m] = 1;
          queue.push(m);
        }
      }
    }
    return false;
  };
  for (const d of diverters) {
    const a = reaches(model.portNode.get(`${d.id}.a`)!);
    const b = reaches(model.portNode.get(`${d.id}.b`)!);
    const drawn = (d.props as { position: "a" | "b" }).position;
    if (a !== b) out.set(d.id, { heating: a ? "b" : "a", hotWater: a ? "a" : "b" });
    else out.set(d.id, { heating: drawn, hotWater: null });
  }
  return out;
}
