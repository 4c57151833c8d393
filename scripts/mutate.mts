/**
 * npm run mutate [-- FOLDER …] — mutation testing of the engine (lib/hydraulics) with StrykerJS and
 * the vitest runner (stryker.config.json), one folder at a time: e.g. `npm run mutate -- sizing
 * emitters`; no folder = every folder ("root" is lib/hydraulics/*.ts). Not part of npm test.
 *
 * Two passes per folder:
 *  1. every mutant against the engine test set (vitest.mutate.config.mts), each running only the
 *     tests whose own code reached it (perTest coverage); sizing/ uses that set less its property
 *     tests (vitest.mutate-sizing.config.mts: they reach every sizing mutant and take seconds each);
 *     static mutants (module-level tables and constants, evaluated once at load) are left out here;
 *  2. the static mutants, and those that pass 1 did not kill which code run while a test file was
 *     collected also reached, against the unit tests beside the folder
 *     (vitest.mutate-unit.config.mts), every test run for every such mutant. Engine tests size their
 *     documents inside each test (testing/per-test.ts), so few mutants land here. Judged by fewer
 *     tests a mutant can only survive more often: the score is not flattered. A kill in either pass
 *     is a kill.
 * Incremental files per folder and pass in reports/mutation/ (git-ignored): a re-run tests only the
 * mutants whose code or covering tests changed. Ends with one line per folder: mutants, killed
 * (+ timed out), survived, no coverage, the score, and the score with the equivalent mutants listed
 * in lib/hydraulics/MUTANTS.md taken out; survivors not listed there are printed.
 * Env: MUTATE_CONCURRENCY (default 2); MUTATE_FORCE=1 re-tests every mutant (still writing the
 * incremental files): Stryker's reuse kept a survivor that a newly added test kills when the mutant
 * is also reached at load time (seen with friction/darcy.ts after regimes.test.ts), so a score to
 * record is measured with it.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { Stryker } from "@stryker-mutator/core";
import type { MutantResult, PartialStrykerOptions } from "@stryker-mutator/api/core";

const ENGINE = "lib/hydraulics";
// Test runners started by Stryker inherit it: the CLI cases skip, the property test runs a tenth of its cases.
process.env.LOOPWRIGHT_MUTATION = "1";
const folders = readdirSync(ENGINE).filter((f) => statSync(path.join(ENGINE, f)).isDirectory() && f !== "testing");
const asked = process.argv.slice(2);
const chosen = asked.length ? asked : [...folders, "root"];
for (const f of chosen) if (f !== "root" && !folders.includes(f)) throw new Error(`no folder ${ENGINE}/${f} (folders: ${folders.join(", ")}, root)`);

/** Equivalent mutants: rows `| file | line | mutator | replacement | reason |` of MUTANTS.md. */
function equivalents(): Set<string> {
  const keys = new Set<string>();
  for (const line of readFileSync(path.join(ENGINE, "MUTANTS.md"), "utf8").split("\n")) {
    // a cell may hold a `|` escaped as `\|` (GFM tables), e.g. a replacement with `||`
    const cells = line.split(/(?<!\\)\|/).map((c) => c.trim().replace(/\\\|/g, "|"));
    if (cells.length < 6 || !cells[1]!.endsWith(".ts")) continue;
    keys.add(`${cells[1]}:${cells[2]}:${cells[3]}:${cells[4]!.replace(/^`|`$/g, "")}`);
  }
  return keys;
}
const keyOf = (m: MutantResult) => `${path.relative(process.cwd(), m.fileName)}:${m.location.start.line}:${m.mutatorName}:${(m.replacement ?? "").replace(/\s+/g, " ")}`;
const placeOf = (m: MutantResult) => `${keyOf(m)}:${m.location.start.column}`;
/** A row's line cell may also give the column (`66:24`) where one line has the same mutant twice. */
const listed = (equiv: Set<string>, m: MutantResult) =>
  equiv.has(keyOf(m)) || equiv.has(keyOf(m).replace(`:${m.location.start.line}:`, `:${m.location.start.line}:${m.location.start.column}:`));

/** Folders judged in pass 1 by a smaller test set than the engine set (see the config for why). */
const PASS1_CONFIG: Record<string, string> = { sizing: "vitest.mutate-sizing.config.mts" };

async function pass(folder: string, name: string, options: PartialStrykerOptions): Promise<MutantResult[]> {
  const mutate = folder === "root" ? [`${ENGINE}/*.ts`, `!${ENGINE}/*.test.ts`] : [`${ENGINE}/${folder}/**/*.ts`, `!${ENGINE}/${folder}/**/*.test.ts`];
  // stryker.config.json is read by Stryker itself; these override it for one folder and pass
  const stryker = new Stryker({
    mutate,
    ...options,
    concurrency: Number(process.env.MUTATE_CONCURRENCY ?? 2),
    force: process.env.MUTATE_FORCE === "1",
    incrementalFile: `reports/mutation/${folder}.${name}.incremental.json`,
    jsonReporter: { fileName: `reports/mutation/${folder}.${name}.json` },
    htmlReporter: { fileName: `reports/mutation/${folder}.${name}.html` },
  });
  return stryker.runMutationTest();
}

async function main() {
  const rows: string[] = [];
  const unexplained: string[] = [];
  const equiv = equivalents();
  for (const folder of chosen) {
    const set = PASS1_CONFIG[folder];
    const first = await pass(folder, set ? "sizing-set" : "engine-set", { ignoreStatic: true, ...(set ? { vitest: { configFile: set, related: true } } : {}) });
    // pass 2: static mutants (ignored above) and hybrid ones (static and per-test coverage) that survived
    const again = first.filter((m) => m.static && (m.status === "Ignored" || m.status === "Survived" || m.status === "NoCoverage"));
    process.env.MUTATE_TESTS = folder === "root" ? `${ENGINE}/*.test.ts` : `${ENGINE}/${folder}/**/*.test.ts`;
    const at = (m: MutantResult) => `${m.fileName}:${m.location.start.line}-${m.location.end.line}`;
    const second = again.length
      ? await pass(folder, "static", { mutate: [...new Set(again.map(at))], ignoreStatic: false, coverageAnalysis: "off", vitest: { configFile: "vitest.mutate-unit.config.mts", related: false } })
      : [];
    const verdict = new Map(second.map((m) => [placeOf(m), m]));
    const results = first
      .filter((m) => m.status !== "Ignored" || m.static)
      .map((m) => (again.includes(m) ? (verdict.get(placeOf(m)) ?? m) : m));
    const statics = again;
    const n = (s: string) => results.filter((m) => m.status === s).length;
    const killed = n("Killed") + n("Timeout");
    const survivors = results.filter((m) => m.status === "Survived" || m.status === "NoCoverage");
    const excused = survivors.filter((m) => listed(equiv, m));
    for (const m of survivors) if (!listed(equiv, m)) unexplained.push(`${keyOf(m)} (${m.status}${again.includes(m) ? ", pass 2" : ""})`);
    const valid = killed + survivors.length;
    const pct = (x: number, of: number) => (of ? ((100 * x) / of).toFixed(1) : "–");
    rows.push(
      `${folder.padEnd(10)} ${String(valid).padStart(5)} mutants (${statics.length} judged in pass 2), ${killed} killed, ${n("Survived")} survived, ` +
        `${n("NoCoverage")} no coverage: score ${pct(killed, valid)} %, ${pct(killed, valid - excused.length)} % without ${excused.length} equivalent`,
    );
    console.log(`\n[mutate] ${rows.at(-1)}`);
  }
  if (unexplained.length) console.log(`\nSurvivors not listed as equivalent in ${ENGINE}/MUTANTS.md:\n  ${unexplained.join("\n  ")}`);
  console.log(`\nMutation score per folder (killed = killed + timed out):\n${rows.join("\n")}`);
}

main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
