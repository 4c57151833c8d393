import { readFileSync } from "node:fs";
import { calculate } from "@/lib/hydraulics/calculate";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const which = process.argv[2] ?? "millbrook";
const reps = Number(process.argv[3] ?? 50);
let doc: unknown;
if (which.match(/^\d+$/)) doc = generateBuildingWithPipes(Number(which));
else doc = JSON.parse(readFileSync(`db/seeds/data/${which}.json`, "utf8"));
for (let i = 0; i < 3; i++) calculate(doc);
const cpu: number[] = [];
for (let i = 0; i < reps; i++) {
  const c0 = process.cpuUsage();
  const r = calculate(doc);
  const c = process.cpuUsage(c0);
  cpu.push((c.user + c.system) / 1000);
  if (!r.ok) { console.log("NOT OK", JSON.stringify(r).slice(0, 300)); break; }
}
cpu.sort((a, b) => a - b);
console.log(which, "cpu ms median", cpu[cpu.length >> 1]!.toFixed(2), "min", cpu[0]!.toFixed(2));
