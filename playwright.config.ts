import { defineConfig } from "@playwright/test";

// Browser tests drive Debian's chromium (never a downloaded browser) against a production
// build served by Playwright's own webServer, on the test database set up by scripts/test.sh.
const port = Number(process.env.E2E_PORT ?? 3100);

export default defineConfig({
  testDir: "tests/e2e",
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  reporter: [["list"], ["json", { outputFile: ".run/playwright.json" }]],
  outputDir: "test-results",
  use: {
    baseURL: `http://localhost:${port}`,
    browserName: "chromium",
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
    },
    screenshot: "only-on-failure",
    trace: "off",
  },
  webServer: {
    // loopback only: the tests run with demo sign-in and the caught-mail page on
    command: `node_modules/.bin/next start -p ${port} -H 127.0.0.1`,
    url: `http://localhost:${port}/`,
    reuseExistingServer: false,
    timeout: 60_000,
    env: { ...process.env, PORT: String(port), APP_URL: `http://localhost:${port}` } as Record<string, string>,
  },
});
