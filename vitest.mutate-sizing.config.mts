import { defineConfig } from "vitest/config";
import engine from "./vitest.mutate.config.mts";

// The faster test set npm run mutate judges sizing/ by (pass 1): the unit tests beside
// lib/hydraulics/sizing and the quick engine integration files. Left out: the other folders' unit
// tests, the property tests and the large EPANET networks — with the whole engine set every sizing
// mutant (reached by nearly every test through calculate()) took hours on this machine. Fewer tests
// can only let more mutants survive, so the score is not flattered.
export default defineConfig({
  ...engine,
  test: {
    ...engine.test,
    include: [
      "lib/hydraulics/sizing/**/*.test.ts",
      "tests/integration/demo-schematics.test.ts",
      "tests/integration/engine-contract.test.ts",
      "tests/integration/engine-independent.test.ts",
      "tests/integration/epanet-compare.test.ts",
      "tests/integration/published-cases.test.ts",
    ],
  },
});
