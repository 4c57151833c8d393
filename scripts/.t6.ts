import { parseSchematic } from "@/lib/schematic/parse";
import { Findings } from "@/lib/hydraulics/findings/finding";
import { createContext } from "@/lib/hydraulics/sizing/context";
import { linkLaw } from "@/lib/hydraulics/sizing/laws";
import { baseState } from "@/lib/hydraulics/sizing/state";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const p = parseSchematic(generateBuildingWithPipes(20000));
if (!p.ok) throw 1;
const ctx = createContext(p.doc, new Findings());
const st = baseState(ctx, "simulate", "heating", new Map());
const out = new Float64Array(2);
for (let rep = 0; rep < 8; rep++) {
  let c = process.cpuUsage();
  const laws = ctx.model.links.map((l) => linkLaw(ctx, l, st));
  const t1 = process.cpuUsage(c).user / 1000; c = process.cpuUsage();
  for (let it = 0; it < 3; it++) for (let k = 0; k < laws.length; k++) laws[k]!(0.1 + it * 0.01 + (k % 7) * 0.01, out);
  const t2 = process.cpuUsage(c).user / 1000;
  console.log("make laws", t1, "3 eval passes", t2);
}
