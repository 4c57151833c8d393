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
