/**
 * npm run mutate [-- FOLDER …] — mutation testing of the engine (lib/hydraulics) with StrykerJS
 * and the vitest runner (stryker.config.json), one folder at a time: e.g. `npm run mutate -- sizing
 * emitters`; no folder = every folder ("root" is lib/hydraulics/*.ts). Not part of npm test.
 *
 * Each folder keeps its own incremental file in reports/mutation/ (git-ignored): a re-run tests only
 * the mutants whose code or covering tests changed. Ends with one line per folder: mutants, killed
 * (+ timed out), survived, no coverage, the Stryker score, and the score with the equivalent
 * mutants listed in lib/hydraulics/MUTANTS.md taken out. Survivors not listed there are printed.
 * Env: MUTATE_CONCURRENCY (default 2: a shared 2-core machine).
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { Stryker } from "@stryker-mutator/core";
import type { MutantResult, PartialStrykerOptions } from "@stryker-mutator/api/core";
import json from "../stryker.config.json";

const config = json as PartialStrykerOptions;

const ENGINE = "lib/hydraulics";
const folders = readdirSync(ENGINE).filter((f) => statSync(path.join(ENGINE, f)).isDirectory() && f !== "testing");
const asked = process.argv.slice(2);
const chosen = asked.length ? asked : [...folders, "root"];
for (const f of chosen) if (f !== "root" && !folders.includes(f)) throw new Error(`no folder ${ENGINE}/${f} (folders: ${folders.join(", ")}, root)`);

/** Equivalent mutants: rows `| file | line | mutator | replacement | reason |` of MUTANTS.md. */
function equivalents(): Set<string> {
  const text = readFileSync(path.join(ENGINE, "MUTANTS.md"), "utf8");
  const keys = new Set<string>();
  for (const line of text.split("\n")) {
    const cells = line.split("|").map((c) => c.trim());
    if (cells.length < 6 || !cells[1]!.endsWith(".ts")) continue;
    keys.add(`${cells[1]}:${cells[2]}:${cells[3]}:${cells[4]!.replace(/^`|`$/g, "")}`);
  }
  return keys;
}
const keyOf = (m: MutantResult) => `${m.fileName}:${m.location.start.line}:${m.mutatorName}:${(m.replacement ?? "").replace(/\s+/g, " ")}`;

const rows: string[] = [];
const unexplained: string[] = [];
const equiv = equivalents();
for (const folder of chosen) {
  const mutate = folder === "root" ? [`${ENGINE}/*.ts`, `!${ENGINE}/*.test.ts`] : [`${ENGINE}/${folder}/**/*.ts`, `!${ENGINE}/${folder}/**/*.test.ts`];
  const stryker = new Stryker({
    ...config,
    mutate,
    concurrency: Number(process.env.MUTATE_CONCURRENCY ?? config.concurrency ?? 2),
    incrementalFile: `reports/mutation/${folder}.incremental.json`,
    jsonReporter: { fileName: `reports/mutation/${folder}.json` },
    htmlReporter: { fileName: `reports/mutation/${folder}.html` },
  });
  const results = await stryker.runMutationTest();
  const n = (s: string) => results.filter((m) => m.status === s).length;
  const killed = n("Killed") + n("Timeout");
  const survivors = results.filter((m) => m.status === "Survived" || m.status === "NoCoverage");
  const listed = survivors.filter((m) => equiv.has(keyOf(m)));
  for (const m of survivors) if (!equiv.has(keyOf(m))) unexplained.push(`${keyOf(m)} (${m.status})`);
  const valid = killed + survivors.length;
  const pct = (x: number, of: number) => (of ? ((100 * x) / of).toFixed(1) : "–");
  rows.push(
    `${folder.padEnd(10)} ${String(valid).padStart(5)} mutants, ${killed} killed, ${n("Survived")} survived, ${n("NoCoverage")} no coverage: ` +
      `score ${pct(killed, valid)} %, ${pct(killed, valid - listed.length)} % without ${listed.length} equivalent`,
  );
}
if (unexplained.length) console.log(`\nSurvivors not listed as equivalent in ${ENGINE}/MUTANTS.md:\n  ${unexplained.join("\n  ")}`);
console.log(`\nMutation score per folder (killed = killed + timed out):\n${rows.join("\n")}`);
