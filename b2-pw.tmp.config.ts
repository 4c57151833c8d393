import { defineConfig } from "@playwright/test";
export default defineConfig({
  testDir: "/work/main/tests/e2e", testMatch: /board-(sizing|conflict)\.spec\.ts/, timeout: 180_000, expect: { timeout: 30_000 }, workers: 1, retries: 0,
  reporter: [["list"]], outputDir: "/tmp/b2shots/results",
  use: { baseURL: "http://localhost:3400", browserName: "chromium", navigationTimeout: 120_000, actionTimeout: 60_000,
    launchOptions: { executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu"] }, screenshot: "only-on-failure" },
});
