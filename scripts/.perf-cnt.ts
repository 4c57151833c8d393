import { readFileSync } from "node:fs";
import { calculate } from "@/lib/hydraulics/calculate";
const doc = JSON.parse(readFileSync(`db/seeds/data/millbrook-hall.json`, "utf8"));
calculate(doc);
console.log((globalThis as any).__calls, (globalThis as any).__its);
