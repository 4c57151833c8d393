import { defineConfig } from "vitest/config";
import path from "node:path";

// Unit tests live beside their source in lib/ and components/; integration tests
// (real PostgreSQL) under tests/integration. Browser tests belong to Playwright.
export default defineConfig({
  resolve: {
    alias: {
      "@": path.resolve(import.meta.dirname),
      // the marker package throws outside React Server Components; tests run server code directly
      "server-only": path.resolve(import.meta.dirname, "node_modules/server-only/empty.js"),
    },
  },
  test: {
    include: ["lib/**/*.test.ts", "components/**/*.test.{ts,tsx}", "tests/integration/**/*.test.ts", "scripts/**/*.test.ts"],
    environment: "node",
    testTimeout: 30_000,
    hookTimeout: 60_000,
    fileParallelism: true,
  },
});
