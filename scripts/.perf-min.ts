import { readFileSync } from "node:fs";
import { calculate } from "@/lib/hydraulics/calculate";
for (const w of ["millbrook-hall", "orchard-end-buffer-40l", "orchard-end-bypass-only"]) {
  const doc = JSON.parse(readFileSync(`db/seeds/data/${w}.json`, "utf8"));
  for (let i = 0; i < 50; i++) calculate(doc);
  const cpu: number[] = [];
  const c00 = process.cpuUsage(); const N = 400;
  for (let i = 0; i < N; i++) { const c0 = process.cpuUsage(); calculate(doc); const c = process.cpuUsage(c0); cpu.push((c.user + c.system) / 1000); }
  const tot = process.cpuUsage(c00);
  cpu.sort((a, b) => a - b);
  console.log(w.padEnd(26), "cpu ms/calc: mean", ((tot.user + tot.system) / 1000 / N).toFixed(2), "median", cpu[N >> 1]!.toFixed(2), "p10", cpu[N / 10]!.toFixed(2), "min", cpu[0]!.toFixed(2));
}
