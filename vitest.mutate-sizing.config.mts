import { configDefaults, defineConfig } from "vitest/config";
import engine from "./vitest.mutate.config.mts";

// The test set npm run mutate judges sizing/ by in pass 1: the engine set less its property tests
// (calculate.property, the optimiser's and solvers' property tests). Every sizing mutant is reached
// through calculate() by those random-document sweeps, which take seconds each and would run for
// every surviving mutant; they check that nothing throws and the optimiser's optimality, not a
// verdict. Fewer tests can only let more mutants survive, so the score is not flattered.
export default defineConfig({
  ...engine,
  test: {
    ...engine.test,
    exclude: [...configDefaults.exclude, "**/*.property.test.ts"],
  },
});
