import { setFlagsFromString } from "node:v8";
import { runInNewContext } from "node:vm";
import { calculate } from "@/lib/hydraulics/calculate";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
setFlagsFromString("--expose-gc");
const gc = runInNewContext("gc") as () => void;
const doc = generateBuildingWithPipes(Number(process.argv[2] ?? 2000));
const useGc = process.argv[3] === "gc";
calculate(doc);
const cpu: number[] = [], wall: number[] = [];
for (let i = 0; i < 15; i++) {
  if (useGc) gc();
  const c0 = process.cpuUsage(); const t0 = performance.now();
  calculate(doc);
  wall.push(performance.now() - t0); const c = process.cpuUsage(c0); cpu.push((c.user + c.system) / 1000);
}
const s = (a: number[]) => a.sort((x, y) => x - y).map((x) => x.toFixed(0)).join(" ");
console.log(useGc ? "gc  " : "nogc", "cpu", s(cpu), "| wall", s(wall));
