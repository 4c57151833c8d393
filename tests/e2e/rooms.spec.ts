import { expect, test } from "@playwright/test";
import { shots, signInAs, sizeIt, sql } from "./helpers/board";

// From rooms to a first design in the browser: a designer imports the demo rooms CSV into a
// new project (after a faulty file shows its row messages), sees the flow-temperature chart,
// generates a first draft and opens it on the drawing board, where it sizes with no errors.
const demoCsv = "db/seeds/data/orchard-end-rooms.csv";

test("import the demo rooms CSV, see the flow-temperature chart, generate a first draft and open it on the board", async ({ page }) => {
  test.setTimeout(150_000);
  const name = `Rooms trial ${Date.now()}`;
  const [row] = await sql<{ id: string }>(
    "insert into projects (organisation_id, name, client, site) select id, $1, 'Test client', 'Invented site' from organisations where slug = 'fernbank' returning id", [name]);
  const projectId = row!.id;
  await sql("insert into project_members (project_id, user_id, role) values ($1, 'demo-designer', 'designer')", [projectId]);
  try {
    await page.setViewportSize({ width: 1366, height: 768 });
    await signInAs(page, "designer");
    await page.goto(`/projects/${projectId}`);
    await page.getByRole("link", { name: "Rooms", exact: true }).click();
    await expect(page.getByRole("heading", { name: "Rooms and heat losses" })).toBeVisible();

    // A faulty file first: problems by line and column, and nothing can be accepted.
    await page.getByRole("button", { name: "Import CSV" }).click();
    const bad = "Room,Temperature,Heat loss (W)\nLounge,21,\"1,450\"\nHall,18,0\nStudy,twenty,500\n";
    await page.getByTestId("csv-file").setInputFiles({ name: "survey.csv", mimeType: "text/csv", buffer: Buffer.from(bad) });
    const issues = page.getByTestId("import-issues");
    await expect(issues).toContainText("Line 2, Heat loss (W): '1,450' has a comma");
    await expect(issues).toContainText("Line 3, Heat loss (W): must be more than 0 W");
    await expect(issues).toContainText("Line 4, Temperature: 'twenty' is not a number");
    await expect(page.getByRole("button", { name: /^Accept/ })).toBeDisabled();
    await page.getByTestId("csv-import").screenshot({ path: `${shots}/rooms-import-problems.png` });

    // The demo survey: every column found, nine rooms, accepted.
    await page.getByTestId("csv-file").setInputFiles(demoCsv);
    await expect(page.getByTestId("import-preview").locator("tbody tr")).toHaveCount(9);
    await expect(page.getByTestId("csv-import")).toContainText("No problems · 9 of 9 rooms read");
    await expect(page.getByLabel("Column for heatLossW")).toHaveValue("Heat loss (W)");
    await page.getByTestId("csv-import").screenshot({ path: `${shots}/rooms-import-preview.png` });
    await page.getByRole("button", { name: /^Accept/ }).click();
    await expect(page.getByText("Imported 9 rooms.")).toBeVisible();
    await expect(page.getByTestId("rooms-table").locator("tbody tr")).toHaveCount(9);
    await expect(page.getByLabel("Kitchen-diner — Emitter")).toHaveValue("ufh-loop");

    // The check: the lowest flow temperature as the API solves it, and the chart.
    const check = await (await page.request.get(`/api/v1/projects/${projectId}/rooms/flow-temperature?flowC=45&deltaK=5`)).json();
    await expect(page.getByTestId("lowest-flow")).toContainText(`Every room is met from ${check.lowestFlowTemperatureC.toFixed(1)} °C flow (set by ${check.limitingRoom})`);
    const chart = page.getByTestId("flow-chart");
    await expect(chart.locator(".recharts-line")).toHaveCount(2);
    await expect(chart).toContainText("rooms met");
    await expect(page.getByTestId("flow-table").locator("tbody tr").first()).toContainText("FB-T 600x2000");
    await page.getByTestId("flow-check").screenshot({ path: `${shots}/rooms-flow-chart.png` });
    await page.screenshot({ path: `${shots}/rooms-laptop.png`, fullPage: true });

    // Keyboard: ↓ moves to the same column a row down, Esc puts a cell back.
    const loss = page.getByLabel("Lounge — Heat loss W");
    await loss.click();
    await loss.fill("9");
    await page.keyboard.press("Escape");
    await expect(loss).toHaveValue("1450");
    await page.keyboard.press("ArrowDown");
    await expect(page.getByLabel("Kitchen-diner — Heat loss W")).toBeFocused();

    // First draft: two zones, upstairs rooms in the second.
    const form = page.getByTestId("draft-form");
    await form.getByRole("button", { name: "Add zone" }).click();
    await form.getByLabel("Zone 2 name").fill("Upstairs");
    for (const room of ["Bedroom 1", "Bedroom 2", "Bedroom 3", "Bathroom"]) await form.getByLabel(`Zone of ${room}`).selectOption({ label: "Upstairs" });
    await form.getByRole("button", { name: "Generate first draft" }).click();
    const done = page.getByTestId("draft-done");
    // the one engine finding to look at: resistances resting on typical values (the draft names no model)
    await expect(done).toContainText("is drawn and sized (1 engine finding to look at)", { timeout: 30_000 });
    await expect(done).toContainText("Lounge: the radiator (2,100 W at ΔT 50) gives 700 W at 45/40 °C");
    await done.screenshot({ path: `${shots}/rooms-draft-done.png` });

    // Open it on the board as a new schematic; it sizes with no errors and every emitter meets its room.
    await done.getByRole("link", { name: "Open on the drawing board" }).click();
    await expect(page.getByTestId("drawing-board")).toBeVisible();
    const schematicId = page.url().split("/").pop()!;
    const view = await (await page.request.get(`/api/v1/schematics/${schematicId}`)).json();
    await expect(page.locator(".react-flow__node")).toHaveCount(view.doc.parts.length);
    await sizeIt(page);
    // notes (frost reminder, accessory legs with no flow) and the typical-values warning; no error
    const groups = page.getByTestId("findings-list").getByTestId("finding-group");
    await expect(groups.first()).toBeVisible();
    const shown = await groups.evaluateAll((els) => els.map((e) => [e.getAttribute("data-code"), e.querySelector("button > span:nth-child(2)")?.textContent ?? ""]));
    expect(shown.filter(([, severity]) => severity !== "Note").map(([code]) => code)).toEqual(["input.assumed-values"]);
    await page.screenshot({ path: `${shots}/rooms-draft-board.png` });
    const results = await (await page.request.post("/api/v1/calculate", { data: view.doc, headers: { origin: new URL(page.url()).origin } })).json();
    expect(results.findings.filter((f: { severity: string }) => f.severity === "error")).toEqual([]);
    expect(results.emitters).toHaveLength(10);
    for (const e of results.emitters) expect(e.ok, `${e.id} meets its room`).toBe(true);

    // The rooms page and the board on a phone.
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: `${shots}/rooms-draft-board-phone.png` });
    await page.goto(`/projects/${projectId}/rooms`);
    await expect(page.getByTestId("flow-chart")).toBeVisible();
    // wide tables scroll inside their frames; the page itself never scrolls sideways
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.screenshot({ path: `${shots}/rooms-phone.png`, fullPage: true });
  } finally {
    await sql("delete from projects where id = $1", [projectId]);
  }
});
