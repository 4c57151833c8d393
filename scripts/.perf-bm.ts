import { parseSchematic } from "@/lib/schematic/parse";
import { buildModel } from "@/lib/hydraulics/network/model";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const p = parseSchematic(generateBuildingWithPipes(20000)); if (!p.ok) throw 0;
for (let i = 0; i < 30; i++) buildModel(p.doc);
