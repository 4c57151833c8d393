import { defineConfig } from "vitest/config";
import engine from "./vitest.mutate.config.mts";

// The smaller test set npm run mutate judges sizing/ by (pass 1): the unit tests beside
// lib/hydraulics/sizing and the two quick engine integration files. Left out: the other folders' unit
// tests, the property tests, engine-contract, engine-independent and the EPANET comparisons — every
// sizing mutant is reached by nearly every test through calculate(), and those files size dozens of
// documents while they are collected, once per mutant: with the whole engine set sizing took hours on
// this shared machine. Fewer tests can only let more mutants survive, so the score is not flattered.
export default defineConfig({
  ...engine,
  test: {
    ...engine.test,
    include: ["lib/hydraulics/sizing/**/*.test.ts", "tests/integration/demo-schematics.test.ts", "tests/integration/published-cases.test.ts"],
  },
});
