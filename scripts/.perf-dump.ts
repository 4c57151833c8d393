import { readFileSync, writeFileSync } from "node:fs";
import { calculate } from "@/lib/hydraulics/calculate";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const out: Record<string, unknown> = {};
for (const w of ["millbrook-hall", "orchard-end-buffer-40l", "orchard-end-bypass-only"]) out[w] = calculate(JSON.parse(readFileSync(`db/seeds/data/${w}.json`, "utf8")));
for (const n of [500, 2000]) out[String(n)] = calculate(generateBuildingWithPipes(n));
writeFileSync(process.argv[2]!, JSON.stringify(out));
