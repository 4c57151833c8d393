import { Findings } from "@/lib/hydraulics/findings/finding";
import { clearTopologyCache } from "@/lib/hydraulics/network/topology-cache";
import { scenarioState } from "@/lib/hydraulics/scenarios/run";
import { simulate } from "@/lib/hydraulics/scenarios/simulate";
import { createContext } from "@/lib/hydraulics/sizing/context";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
import { generateGridWithPipes } from "@/lib/schematic/generate-grid";
const kind = process.argv[2] ?? "building", n = Number(process.argv[3] ?? 10000), cold = process.argv[4] === "cold";
const doc = kind === "building" ? generateBuildingWithPipes(n) : generateGridWithPipes(n);
const t: Record<string, number> = {};
for (let r = 0; r < 30; r++) {
  if (cold) clearTopologyCache();
  let a = performance.now();
  const ctx = createContext(doc, new Findings());
  let b = performance.now(); t.ctx = (t.ctx ?? 0) + b - a; a = b;
  const state = scenarioState(ctx, { name: "all zones open", mode: "heating", valves: {} }, new Map());
  b = performance.now(); t.state = (t.state ?? 0) + b - a; a = b;
  simulate(ctx, state, null);
  b = performance.now(); t.sim = (t.sim ?? 0) + b - a; a = b;
}
for (const k in t) console.log(k, (t[k]! / 30).toFixed(1));
