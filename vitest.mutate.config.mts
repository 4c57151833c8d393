import { defineConfig } from "vitest/config";
import base from "./vitest.config.mts";

// The engine test set Stryker runs per mutant (npm run mutate): lib/hydraulics and the six engine
// integration files, none of which needs PostgreSQL or the app. The CLI cases spawn a child process
// that never carries a mutant, so per-test coverage leaves them out of mutant runs.
export default defineConfig({
  ...base,
  test: {
    ...base.test,
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
