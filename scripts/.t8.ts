import { parseSchematic } from "@/lib/schematic/parse";
import { buildModel } from "@/lib/hydraulics/network/model";
import { prepare } from "@/lib/hydraulics/network/gga";
import { Findings } from "@/lib/hydraulics/findings/finding";
import { createContext } from "@/lib/hydraulics/sizing/context";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const p = parseSchematic(generateBuildingWithPipes(Number(process.argv[2])));
if (!p.ok) throw 1;
for (let i = 0; i < 6; i++) {
  let c = process.cpuUsage();
  const m = buildModel(p.doc);
  const a = process.cpuUsage(c).user / 1000; c = process.cpuUsage();
  prepare({ nodeCount: m.nodeCount, from: Int32Array.from(m.links, (l) => l.from), to: Int32Array.from(m.links, (l) => l.to), fixed: m.fixed });
  const b = process.cpuUsage(c).user / 1000; c = process.cpuUsage();
  createContext(p.doc, new Findings());
  console.log("model", a, "prepare", b, "ctx", process.cpuUsage(c).user / 1000);
}
