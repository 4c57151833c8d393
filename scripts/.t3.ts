import { parseSchematic } from "@/lib/schematic/parse";
import { Findings } from "@/lib/hydraulics/findings/finding";
import { createContext } from "@/lib/hydraulics/sizing/context";
import { solveDesign } from "@/lib/hydraulics/sizing/design";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const p = parseSchematic(generateBuildingWithPipes(Number(process.argv[2] ?? 2000)));
if (!p.ok) throw 1;
const ctx = createContext(p.doc, new Findings());
const s = solveDesign(ctx, "heating");
console.log("design iterations", s.iterations, s.converged, ctx.model.links.length, ctx.model.nodeCount, ctx.prep.sym.slotCount);
console.log("updates", ctx.prep.sym.updStart[ctx.prep.sym.m], "m", ctx.prep.sym.m);
{ const c = process.cpuUsage(); for (let i = 0; i < 5; i++) solveDesign(ctx, "heating"); console.log("design solve cpu ms", process.cpuUsage(c).user / 5000); }
{ const { prepare } = require("@/lib/hydraulics/network/gga"); const c = process.cpuUsage(); for (let i = 0; i < 5; i++) prepare(ctx.prep.topo); console.log("prepare cpu ms", process.cpuUsage(c).user / 5000); }
