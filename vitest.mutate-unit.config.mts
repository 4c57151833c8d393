import { defineConfig } from "vitest/config";
import base from "./vitest.config.mts";

// Static mutants (module-level tables and constants, evaluated once at load) are judged by the unit
// tests beside their folder (npm run mutate, second pass): every one of them needs a full test run,
// and the whole engine set per static mutant would take hours on this machine. MUTATE_TESTS: a glob.
export default defineConfig({
  ...base,
  test: { ...base.test, include: [process.env.MUTATE_TESTS ?? "lib/hydraulics/**/*.test.ts"] },
});
