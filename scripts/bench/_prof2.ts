import { calculate } from "@/lib/hydraulics/calculate";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
const n = Number(process.argv[2] ?? 2000);
const text = JSON.stringify(generateBuildingWithPipes(n));
let t = 0;
for (let r = 0; r < 60; r++) { const doc = JSON.parse(text); const a = performance.now(); calculate(doc); if (r >= 10) t += performance.now() - a; }
console.log("calc ms", (t / 50).toFixed(1));
