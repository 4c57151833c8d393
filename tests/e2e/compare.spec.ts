import { expect, test, type Page } from "@playwright/test";
import { ORCHARD_END, shots, signInAs, sql } from "./helpers/board";

// Side by side in the browser: ticked on the project page, opened from the board, the two
// drawings sharing one view with the differences marked, "show only what changed", the
// numbers table; on a phone the drawings stack and the table keeps to the screen's width.

const idOf = async (name: string) => (await sql<{ id: string }>("select id from schematics where project_id = $1 and name = $2", [ORCHARD_END, name]))[0]!.id;
const transforms = (page: Page) => page.evaluate(() => [...document.querySelectorAll(".react-flow__viewport")].map((e) => (e as HTMLElement).style.transform));
const drawn = (page: Page, side: "a" | "b") => page.locator(`[data-testid=compare-canvas-${side}] [data-testid=compare-drawing] > g:last-child [data-part]`);

test("tick two on the project page: both drawings at one view, the buffer's parts marked added, the numbers with a verdict", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 1366, height: 768 });
  await signInAs(page, "trainee");
  await page.goto(`/projects/${ORCHARD_END}`);
  const [bypass, buffer] = [await idOf("Bypass only"), await idOf("With 40 L buffer")];
  await page.locator(`[data-testid=compare-tick][data-ref="schematic:${bypass}"]`).check();
  await page.locator(`[data-testid=compare-tick][data-ref="schematic:${buffer}"]`).check();
  await page.getByTestId("compare-ticked").click();
  await page.waitForURL(/\/compare\?a=schematic/);
  expect(new URL(page.url()).searchParams.get("b")).toBe(`schematic:${buffer}`);

  for (const side of ["a", "b"] as const) await expect(page.getByTestId(`compare-canvas-${side}`)).toBeVisible();
  await expect(page.getByTestId("compare-metrics")).toBeVisible();
  await expect(page.getByTestId("compare-scenarios")).toBeVisible();
  // the buffer vessel is new in B, marked there; the dp bypass valve only in A, marked there
  await expect(page.locator('[data-testid=compare-canvas-b] [data-part="buf"][data-mark="added"]')).toHaveCount(1);
  await expect(page.locator('[data-testid=compare-canvas-a] [data-part="bp"][data-mark="removed"]')).toHaveCount(1);
  await expect(page.locator('[data-testid=compare-canvas-a] [data-part="buf"]')).toHaveCount(0);
  // the numbers: B needs no buffer, and that is marked better with the reason as its tooltip
  const buffered = page.locator('[data-metric="bufferRecommended"]');
  await expect(buffered).toHaveAttribute("data-better", "b");
  await expect(buffered.getByTestId("better-mark")).toHaveAttribute("title", /no buffer/);
  await page.screenshot({ path: `${shots}/compare-laptop.png`, fullPage: true });

  // one view: a drag on A moves B the same; a wheel on B zooms A the same
  const before = await transforms(page);
  const box = (await page.getByTestId("compare-canvas-a").boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width / 2 + 120, box.y + box.height / 2 + 40, { steps: 6 });
  await page.mouse.up();
  const dragged = await transforms(page);
  expect(dragged[0]).not.toBe(before[0]);
  expect(dragged[1]).toBe(dragged[0]);
  const boxB = (await page.getByTestId("compare-canvas-b").boundingBox())!;
  await page.mouse.move(boxB.x + 80, boxB.y + 80);
  await page.mouse.wheel(0, -240);
  await expect.poll(async () => { const t = await transforms(page); return t[0] !== dragged[0] && t[0] === t[1]; }).toBe(true);

  // show only what changed: unchanged parts go, the marked ones stay
  const all = await drawn(page, "a").count();
  await page.getByTestId("compare-only-changed").check();
  const shown = await drawn(page, "a").count();
  expect(shown).toBeLessThan(all);
  expect(shown).toBe(await drawn(page, "a").and(page.locator("[data-mark]")).count());
  await page.screenshot({ path: `${shots}/compare-only-changed.png` });
});

test("on a phone the drawings stack and the table stays within the screen", async ({ page }) => {
  test.setTimeout(90_000);
  await page.setViewportSize({ width: 390, height: 844 });
  await signInAs(page, "reviewer");
  const [bypass, buffer] = [await idOf("Bypass only"), await idOf("With 40 L buffer")];
  await page.goto(`/projects/${ORCHARD_END}/compare?a=schematic:${bypass}&b=schematic:${buffer}`);
  const a = (await page.getByTestId("compare-canvas-a").boundingBox())!;
  const b = (await page.getByTestId("compare-canvas-b").boundingBox())!;
  expect(b.y).toBeGreaterThanOrEqual(a.y + a.height - 1); // stacked, not side by side
  expect(a.width).toBeGreaterThan(300);
  await expect(drawn(page, "a").first()).toBeAttached();
  const table = page.getByTestId("compare-metrics");
  await table.scrollIntoViewIfNeeded();
  const t = (await table.boundingBox())!;
  expect(t.x).toBeGreaterThanOrEqual(0);
  expect(t.x + t.width).toBeLessThanOrEqual(390);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  // each row: its name over the three values, all on screen
  const row = page.locator('[data-metric="systemVolumeL"]');
  for (const cell of [row.locator("th"), row.locator('[data-side="a"]'), row.locator('[data-side="b"]')]) {
    const c = (await cell.boundingBox())!;
    expect(c.x + c.width).toBeLessThanOrEqual(390);
  }
  await page.screenshot({ path: `${shots}/compare-phone.png` });
  await table.screenshot({ path: `${shots}/compare-phone-table.png` });
});

test("the board's Compare with… opens side by side with it as A; the picker chooses B", async ({ page }) => {
  test.setTimeout(90_000);
  await page.setViewportSize({ width: 1366, height: 768 });
  await signInAs(page, "designer");
  const [bypass, buffer] = [await idOf("Bypass only"), await idOf("With 40 L buffer")];
  await page.goto(`/projects/${ORCHARD_END}/schematics/${bypass}?rev=draft`);
  await page.getByTestId("compare-with").click();
  await page.waitForURL(/\/compare\?a=schematic/);
  await page.getByTestId("pick-b").selectOption(`schematic:${buffer}`);
  await page.getByRole("button", { name: "Compare" }).click();
  await expect(page.getByTestId("compare-metrics")).toBeVisible();
  expect(new URL(page.url()).searchParams.get("a")).toBe(`schematic:${bypass}`);
  // a ref that does not parse: said on the page, with the picker to put it right
  await page.goto(`/projects/${ORCHARD_END}/compare?a=schematic:${bypass}&b=draft:1`);
  await expect(page.getByTestId("compare-problem")).toContainText("B:");
  await expect(page.getByTestId("compare-picker")).toBeVisible();
});
