import { expect, test } from "@playwright/test";
import { ORCHARD_END, copySchematic, removeSchematics, shots, signInAs, sizeIt, sql, waitSaved } from "./helpers/board";

// The designer opens a copy of the seeded Orchard End "Bypass only" schematic (the seed itself
// stays as seeded for every other test), sizes it, reads the numbers on a pipe and in the report
// (checked against POST /api/v1/calculate), changes the drawing, waits for autosave, reloads and
// finds the change saved.
test("size a copy of the Orchard End schematic, see the numbers, change it and find it saved", async ({ page }) => {
  test.setTimeout(120_000);
  const name = `e2e sizing ${Date.now()}`;
  const schematicId = await copySchematic("Bypass only", name);
  try {
    await page.setViewportSize({ width: 1440, height: 900 });
    await signInAs(page, "designer");
    await page.goto(`/projects/${ORCHARD_END}`);
    await page.getByRole("link", { name }).click();
    await expect(page.getByTestId("drawing-board")).toBeVisible();
    expect(page.url().split("/").pop()).toBe(schematicId);

    await sizeIt(page);
    await page.screenshot({ path: `${shots}/board-sized.png` });

    // The engine's own answer for the same document, through the public API.
    const view = await (await page.request.get(`/api/v1/schematics/${schematicId}`)).json();
    const partsBefore = view.doc.parts.length as number;
    const results = await (await page.request.post("/api/v1/calculate", { data: view.doc, headers: { origin: new URL(page.url()).origin } })).json();
    const heating = results.modes.find((m: { mode: string }) => m.mode === "heating");
    const flows = new Map<string, number>(heating.pipes.filter((p: { flowM3h: number | null }) => (p.flowM3h ?? 0) > 0.01)
      .map((p: { id: string; flowM3h: number }) => [p.id, p.flowM3h]));

    // Pipe labels are small print, hidden below 45 % zoom (and on very short runs): zoom in, then
    // read the first pipe label on screen and compare it with the engine's number for that pipe.
    for (let i = 0; i < 5; i++) await page.locator(".react-flow__controls-zoomin").click();
    const labels = await page.locator(".react-flow__edge").evaluateAll((edges) => edges.map((e) => {
      const t = e.querySelector(".lw-pipe-label");
      return { id: e.getAttribute("data-id") ?? "", text: t?.textContent ?? "", shown: !!t && getComputedStyle(t).display !== "none" };
    }));
    const shown = labels.find((l) => l.shown && flows.has(l.id));
    expect(shown, "a sized pipe label on screen").toBeTruthy();
    const id = shown!.id;
    const flow = flows.get(id)!.toFixed(3);
    expect(shown!.text).toContain(`${flow} m³/h`);
    await expect(page.locator(`.react-flow__edge[data-id="${id}"] .lw-pipe-label`)).toBeVisible();
    await page.screenshot({ path: `${shots}/board-pipe-labels.png` });

    await page.getByRole("tab", { name: "Sizing report" }).click();
    const row = page.getByTestId("pipe-schedule").locator("tr").filter({ has: page.getByText(id, { exact: true }) });
    await expect(row).toContainText(flow);
    // flow, velocity and Δp each open a working now: the Δp one is Darcy's
    await row.locator('[data-working^="Pressure drop"]').click();
    await expect(page.getByTestId("working-dialog")).toContainText("Darcy");
    await page.getByTestId("working-dialog").getByRole("button", { name: "Close" }).click();
    await page.screenshot({ path: `${shots}/board-report.png` });

    // Change: add an air vent from the parts bin; autosave follows ~1.5 s later.
    await page.getByRole("tab", { name: "Drawing" }).click();
    await page.locator('[data-testid=parts-bin] [data-part="air-vent"]').click();
    await expect(page.getByTestId("save-status")).toHaveText(/Unsaved changes|Saving/);
    await waitSaved(page);

    await page.reload();
    await expect(page.getByTestId("drawing-board")).toBeVisible();
    await expect(page.locator(".react-flow__node")).toHaveCount(partsBefore + 1);
    const [stored] = await sql<{ draft: { parts: unknown[] } }>("select draft from schematics where id = $1", [schematicId]);
    expect(stored!.draft.parts.length).toBe(partsBefore + 1);
  } finally {
    await removeSchematics(schematicId);
  }
});
