import { parseSchematic } from "@/lib/schematic/parse";
import { portsOf, partRegistry } from "@/lib/schematic/parts";
import { components } from "@/lib/hydraulics/network/model";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const p = parseSchematic(generateBuildingWithPipes(20000)); if (!p.ok) throw 0;
const doc = p.doc;
const T: Record<string, number> = {};
for (let it = 0; it < 10; it++) {
  let t = performance.now();
  const lap = (k: string) => { const n = performance.now(); if (it >= 3) T[k] = (T[k] ?? 0) + n - t; t = n; };
  const portNode = new Map<string, number>(); const nodeLabel: string[] = [];
  for (const part of doc.parts) {
    const ports = portsOf(part);
    for (const port of ports) portNode.set(`${part.id}.${port}`, nodeLabel.push(`${part.id}.${port}`) - 1);
  }
  lap("ports");
  const links: { from: number; to: number }[] = [];
  for (const pipe of doc.pipes) links.push({ from: portNode.get(pipe.from)!, to: portNode.get(pipe.to)! });
  lap("pipes");
  components(nodeLabel.length, links);
  lap("components");
}
for (const k in T) console.log(k, (T[k]! / 7).toFixed(1));
