import { test } from "@playwright/test";
import { signInAs } from "./helpers/board";
import { dropPart, pipe, smallSystem } from "./helpers/draw";
test("debug", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 1440, height: 900 });
  page.on("console", (m) => console.log("console", m.text().slice(0, 300)));
  page.on("pageerror", (e) => console.log("pageerror", e.stack?.slice(0, 3000)));
  page.on("framenavigated", (f) => f === page.mainFrame() && console.log("NAV", f.url()));
  await signInAs(page, "owner");
  await page.goto("/board-preview?empty=1");
  for (const [type, x, y] of smallSystem.parts) await dropPart(page, type, x, y);
  await page.evaluate(() => { let n = 0; window.__lwBoard!.store.subscribe((s, p) => { if (n++ > 40) return; const keys = Object.keys(s).filter((k) => (s as any)[k] !== (p as any)[k]); console.log("STORE", keys.join(","), JSON.stringify(s.selection)); }); });
  for (const [from, to] of smallSystem.pipes) { console.log("pipe", from, to); await pipe(page, from, to); await page.waitForTimeout(300); }
});
