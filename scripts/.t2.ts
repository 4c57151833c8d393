import { calculate } from "@/lib/hydraulics/calculate";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const n = Number(process.argv[2] ?? 2000);
const raw = generateBuildingWithPipes(n);
for (let i = 0; i < 2; i++) calculate(raw);
const c0 = process.cpuUsage(); const t0 = performance.now();
for (let i = 0; i < 3; i++) calculate(raw);
const c = process.cpuUsage(c0); console.log(((performance.now() - t0) / 3).toFixed(1), "ms wall avg", ((c.user + c.system) / 3e3).toFixed(1), "ms cpu avg");
