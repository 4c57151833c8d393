import { expect, test } from "@playwright/test";
import { MILLBROOK, signInAs, sql } from "./helpers/board";

// A large drawing stays usable: 1,000 parts / 1,200 pipes (generated in the page) open fitted on
// the overview canvas and a click there selects the part under it; the Millbrook demo hall's real
// board page answers a click on its heat pump. How fast is measured by `npm run bench`
// (scripts/bench-board.ts), not here: timings on a shared machine decide nothing.
test("1,000 parts open on the overview canvas and a click there selects; the demo hall answers a click", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 1440, height: 900 });
  await signInAs(page, "designer");

  const [hall] = await sql<{ id: string }>("select id from schematics where project_id = $1 and name = 'Plant room'", [MILLBROOK]);
  await page.goto(`/projects/${MILLBROOK}/schematics/${hall!.id}`);
  await page.locator('.react-flow__node[data-id="hp"]').click();
  await expect(page.locator('.react-flow__node[data-id="hp"] .lw-part-selected')).toBeVisible();

  await page.goto("/board-preview/perf");
  // it opens fitted, below the level-of-detail zoom: the drawing is the overview canvas
  await expect(page.getByTestId("board-overview")).toBeVisible({ timeout: 60_000 });
  const counts = await page.evaluate(() => {
    const doc = window.__lwBoard!.getDoc();
    return [doc.parts.length, doc.pipes.length];
  });
  expect(counts).toEqual([1000, 1200]);
  await expect(page.locator(".react-flow__node")).toHaveCount(0); // far out no part is an element

  // a part drawn as a box on the overview canvas: a click on its centre selects it
  await page.evaluate(() => window.__lwBoard!.view!.fit());
  const target = await page.evaluate(() => {
    const b = window.__lwBoard!;
    const part = b.getDoc().parts[500]!;
    const v = b.view!.get();
    const pane = document.querySelector(".react-flow__pane")!.getBoundingClientRect();
    return { id: part.id, x: pane.left + v.x + part.x * v.zoom, y: pane.top + v.y + part.y * v.zoom };
  });
  await page.mouse.click(target.x, target.y);
  await expect.poll(() => page.evaluate(() => window.__lwBoard!.store.getState().selection.parts)).toEqual([target.id]);
  await page.screenshot({ path: "test-results/screens/board-large.png" });
});
