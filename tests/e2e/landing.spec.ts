import { expect, test } from "@playwright/test";

test("landing page says what Loopwright does, in the shipped font", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1 })).toContainText("drawn, checked and sized");
  const family = await page.locator("h1").evaluate((el) => getComputedStyle(el).fontFamily);
  expect(family).toMatch(/plex/i);
  // The font file was really loaded from our own server, not a fallback.
  const loaded = await page.evaluate(async () => {
    await document.fonts.ready;
    return [...document.fonts].filter((f) => f.status === "loaded").map((f) => f.family);
  });
  expect(loaded.join(" ")).toMatch(/plex/i);
  await page.screenshot({ path: "test-results/screens/landing.png", fullPage: true });
});
