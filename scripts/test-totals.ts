import fs from "node:fs";

// Sums vitest's and Playwright's JSON reports into the one closing line CI reads.
type Counts = { passed: number; failed: number; skipped: number };
const total: Counts = { passed: 0, failed: 0, skipped: 0 };

function readJson(path: string): any | null {
  try { return JSON.parse(fs.readFileSync(path, "utf8")); } catch { return null; }
}

const vitest = readJson(".run/vitest.json");
if (vitest) {
  total.passed += vitest.numPassedTests ?? 0;
  total.failed += vitest.numFailedTests ?? 0;
  total.skipped += (vitest.numPendingTests ?? 0) + (vitest.numTodoTests ?? 0);
  // a test file that failed to load has no tests but must count as a failure
  for (const f of vitest.testResults ?? []) if (f.status === "failed" && (f.assertionResults ?? []).length === 0) total.failed += 1;
} else if (process.argv.includes("--expect-vitest")) total.failed += 1;

const pw = readJson(".run/playwright.json");
if (pw?.stats) {
  total.passed += (pw.stats.expected ?? 0) + (pw.stats.flaky ?? 0);
  total.failed += pw.stats.unexpected ?? 0;
  total.skipped += pw.stats.skipped ?? 0;
  for (const e of pw.errors ?? []) { console.error(`playwright: ${e.message ?? e}`); total.failed += 1; }
} else if (process.argv.includes("--expect-playwright")) total.failed += 1;

console.log(`${total.passed} passed, ${total.failed} failed${total.skipped ? `, ${total.skipped} skipped` : ""}`);
process.exitCode = total.failed > 0 ? 1 : 0;
