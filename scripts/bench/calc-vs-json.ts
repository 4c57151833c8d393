/**
 * The whole calculate() (design modes, bypass, scenarios, vessel, emitters) of
 * a 2,000-pipe building against the floor any JSON API pays for the same
 * answer: JSON.parse of the document's text plus JSON.stringify of the
 * results. Target: calculate() < 3 × that. Also the optimiser on the demo
 * hall (target < 1 s): its first call in this process and the median after.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { calculate } from "@/lib/hydraulics/calculate";
import { optimise } from "@/lib/hydraulics/optimise";
import { generateBuildingWithPipes } from "@/lib/schematic/generate-building";
import { median, pad, passFail, time } from "./timing";

export function benchCalcVsJson(pipes = 2000): boolean {
  const text = JSON.stringify(generateBuildingWithPipes(pipes));
  const doc = JSON.parse(text) as unknown;
  let results = "";
  // Untimed rounds until the JIT has settled: after 3 the next ten calls still ran at 1.5–7× their
  // settled time, and the median of 11 straddled it. BENCH_WARM_CALC sets them.
  for (let w = 0; w < Number(process.env.BENCH_WARM_CALC ?? 30); w++) results = JSON.stringify(calculate(doc));
  const calc: number[] = [];
  const json: number[] = [];
  for (let r = 0; r < 21; r++) {
    const answer = calculate(doc);
    const parsed = answer.ok ? answer.results : null;
    json.push(time(() => JSON.parse(text)).cpuMs + time(() => JSON.stringify(parsed)).cpuMs);
    calc.push(time(() => calculate(doc)).cpuMs);
  }
  const c = median(calc);
  const f = median(json);
  const ok = c < 3 * f;
  console.log(`\ncalculate() of a ${pipes}-pipe building vs JSON.parse(document) + JSON.stringify(results), median CPU ms`);
  console.log(`  document ${(text.length / 1024).toFixed(0)} KiB, results ${(results.length / 1024).toFixed(0)} KiB`);
  console.log(`  calculate ${pad(c.toFixed(1), 8)}   parse + stringify ${pad(f.toFixed(1), 8)}   ratio ${(c / f).toFixed(2)}   target < 3  ${passFail(ok)}`);
  return ok;
}

export function benchOptimiseHall(): boolean {
  const hall = JSON.parse(readFileSync(path.resolve("db/seeds/data/millbrook-hall.json"), "utf8")) as unknown;
  const first = time(() => optimise(hall, {}));
  const rest = Array.from({ length: 7 }, () => time(() => optimise(hall, {})));
  const r = first.value;
  const ok = first.wallMs < 1000 && median(rest.map((x) => x.wallMs)) < 1000;
  const res = r.ok ? r.result : null;
  console.log(`\nOptimising the demo hall (${res ? `${res.method}, ${res.exact ? "exact" : "not proven"}, ${res.changes.length} pipes change` : "refused"})`);
  console.log(`  first call ${first.wallMs.toFixed(0)} ms wall (${first.cpuMs.toFixed(0)} CPU), then median ${median(rest.map((x) => x.wallMs)).toFixed(0)} ms wall (${median(rest.map((x) => x.cpuMs)).toFixed(0)} CPU)   target < 1000 ms  ${passFail(ok)}`);
  return ok;
}
