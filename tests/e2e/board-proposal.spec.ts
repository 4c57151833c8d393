import { expect, test } from "@playwright/test";
import { copySchematic, ORCHARD_END, shots, signInAs, sizeIt, sql, waitSaved } from "./helpers/board";

// The designer asks for the cheapest sizes of the whole network, reads cost and pump head
// before and after, applies the proposal as one step, finds it saved, undoes it in one step,
// and sees the same proposal section in the sizing report.
test("find the cheapest sizes, apply them in one undoable step, see them in the report", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1366, height: 768 });
  const id = await copySchematic("Bypass only", `Proposal e2e ${Date.now()}`);
  const [before] = await sql<{ draft: { pipes: { id: string; size: string }[] } }>("select draft from schematics where id = $1", [id]);
  await signInAs(page, "designer");
  await page.goto(`/projects/${ORCHARD_END}/schematics/${id}`);
  await expect(page.getByTestId("drawing-board")).toBeVisible();

  await page.getByTestId("open-proposal").click();
  await expect(page.getByTestId("head-margin")).toHaveValue("0");
  await page.getByTestId("find-sizes").click();
  const result = page.getByTestId("proposal-result");
  await expect(result).toBeVisible({ timeout: 60_000 });
  await expect(result).toContainText("Pipe cost");
  await expect(result).toContainText(/Head /);
  const rows = page.getByTestId("proposal-changes").locator("tbody tr");
  const changed = await rows.count();
  expect(changed).toBeGreaterThan(0);
  await page.screenshot({ path: `${shots}/proposal-panel.png` });

  // the proposal's own sizes, from the same API the panel called
  const view = await (await page.request.get(`/api/v1/schematics/${id}`)).json();
  const answer = await (await page.request.post("/api/v1/optimise", { data: { doc: view.doc, options: {} }, headers: { origin: new URL(page.url()).origin } })).json();
  expect(answer.changes).toHaveLength(changed);

  await page.getByTestId("apply-proposal").click();
  await expect(result).toContainText("The drawing changed since this proposal");
  await waitSaved(page);
  const [applied] = await sql<{ draft: { pipes: { id: string; size: string }[] } }>("select draft from schematics where id = $1", [id]);
  for (const p of applied!.draft.pipes) expect(p.size).toBe(answer.sizes[p.id]);

  // one undo takes every change back
  await page.getByRole("button", { name: "Undo", exact: true }).click();
  await waitSaved(page);
  const [undone] = await sql<{ draft: { pipes: { id: string; size: string }[] } }>("select draft from schematics where id = $1", [id]);
  expect(undone!.draft.pipes.map((p) => p.size)).toEqual(before!.draft.pipes.map((p) => p.size));

  // the report shows the same section
  await page.getByRole("button", { name: "Close", exact: true }).click();
  await sizeIt(page);
  await page.getByRole("tab", { name: "Sizing report" }).click();
  const section = page.getByRole("heading", { name: "Cheapest sizes for the whole network" });
  await expect(section).toBeVisible();
  await section.scrollIntoViewIfNeeded();
  await page.getByTestId("sizing-report").getByTestId("find-sizes").click();
  await expect(page.getByTestId("sizing-report").getByTestId("proposal-result")).toBeVisible({ timeout: 60_000 });
  await page.getByTestId("sizing-report").getByTestId("proposal-result").scrollIntoViewIfNeeded();
  await page.screenshot({ path: `${shots}/proposal-report.png` });

  await page.setViewportSize({ width: 390, height: 844 });
  await page.getByRole("tab", { name: "Drawing" }).click();
  await page.getByTestId("open-proposal").click();
  await expect(page.getByTestId("find-sizes")).toBeVisible();
  await page.screenshot({ path: `${shots}/proposal-phone.png` });
});

// With the firm's price list on the project, the panel says so and the optimiser weighs those
// prices: the panel's answer equals the API's with the same prices, and every copper pipe it
// resizes gets a size the list stocks.
test("the proposal uses the firm's pipe prices when the project has a price list", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 1366, height: 768 });
  const id = await copySchematic("Bypass only", `Proposal prices e2e ${Date.now()}`);
  await signInAs(page, "designer");
  const origin = { origin: new URL(page.url()).origin };
  const list = "code,description,unit,price\nCU15,Copper tube 15mm,m,2\nCU22,Copper tube 22mm,m,3\nCU28,Copper tube 28mm,m,40\n";
  try {
    const up = await page.request.post(`/api/v1/projects/${ORCHARD_END}/price-list`, { data: list, headers: { ...origin, "content-type": "text/csv" } });
    expect(up.status()).toBe(200);
    await page.goto(`/projects/${ORCHARD_END}/schematics/${id}`);
    await page.getByTestId("open-proposal").click();
    await expect(page.getByTestId("proposal-prices")).toContainText("the firm's price list (3 pipe sizes");
    const asked = page.waitForRequest((r) => r.url().endsWith("/api/v1/optimise") && r.method() === "POST");
    await page.getByTestId("find-sizes").click();
    const sent = (await asked).postDataJSON() as { options: { prices?: unknown } };
    expect(sent.options.prices).toEqual({ copper: { "15": 2, "22": 3, "28": 40 } });
    await expect(page.getByTestId("proposal-result")).toBeVisible({ timeout: 60_000 });
    const view = await (await page.request.get(`/api/v1/schematics/${id}`)).json();
    const answer = await (await page.request.post("/api/v1/optimise", { data: { doc: view.doc, options: { prices: sent.options.prices } }, headers: origin })).json();
    // every pipe the proposal resizes gets a size the list stocks (pipes it leaves alone keep theirs)
    const copper = new Set((view.doc.pipes as { id: string; material: string }[]).filter((p) => p.material === "copper").map((p) => p.id));
    const resized = (answer.changes as { id: string; to: string }[]).filter((c) => copper.has(c.id));
    expect(resized.length).toBeGreaterThan(0);
    for (const c of resized) expect(["15", "22", "28"]).toContain(c.to);
    await expect(page.getByTestId("proposal-changes").locator("tbody tr")).toHaveCount(answer.changes.length);
    await page.screenshot({ path: `${shots}/proposal-firm-prices.png` });
  } finally {
    await sql("delete from project_price_lists where project_id = $1", [ORCHARD_END]);
  }
});
