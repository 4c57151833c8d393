import { schematicSchema } from "@/lib/schematic/schema";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const raw = generateBuildingWithPipes(2000);
for (let i = 0; i < 30; i++) {
  const c = process.cpuUsage();
  schematicSchema.safeParse(raw);
  const d = process.cpuUsage(c);
  if (i % 5 === 4) console.log(i, (d.user / 1000).toFixed(1));
}
let x = 0; const c = process.cpuUsage(); for (let i = 0; i < 1e8; i++) x += Math.log(i + 1); console.log("1e8 logs", process.cpuUsage(c).user / 1000, x > 0);
