import { defineConfig } from "vitest/config";
import base from "./vitest.config.mts";

// The engine test set Stryker runs per mutant (npm run mutate): lib/hydraulics and the six engine
// integration files, none of which needs PostgreSQL or the app. The CLI cases spawn a child process
// that never carries a mutant, so per-test coverage leaves them out of mutant runs.
// isolate: false — test files share one module graph per worker, so a mutant run does not re-import
// the engine for every file (the engine keeps no module state; its one cache, pipe-results'
// catalogue columns, is the same data however filled). Static mutants, which need a fresh import,
// are judged separately (vitest.mutate-unit.config.mts keeps isolation).
export default defineConfig({
  ...base,
  test: {
    ...base.test,
    isolate: false,
    include: [
      "lib/hydraulics/**/*.test.ts",
      "tests/integration/demo-schematics.test.ts",
      "tests/integration/engine-contract.test.ts",
      "tests/integration/engine-independent.test.ts",
      "tests/integration/epanet-compare.test.ts",
      "tests/integration/epanet-networks.test.ts",
      "tests/integration/published-cases.test.ts",
    ],
  },
});
