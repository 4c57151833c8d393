import { parseSchematic } from "@/lib/schematic/parse";
import { Findings } from "@/lib/hydraulics/findings/finding";
import { createContext } from "@/lib/hydraulics/sizing/context";
import { prepare } from "@/lib/hydraulics/network/gga";
import { symbolicFactor } from "@/lib/hydraulics/network/ordering";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const p = parseSchematic(generateBuildingWithPipes(20000));
if (!p.ok) throw 1;
const ctx = createContext(p.doc, new Findings());
for (let i = 0; i < 8; i++) {
  let c = process.cpuUsage();
  prepare(ctx.prep.topo);
  const a = process.cpuUsage(c).user / 1000;
  c = process.cpuUsage();
  createContext(p.doc, new Findings());
  console.log("prepare", a, "createContext", process.cpuUsage(c).user / 1000);
}
