import fs from "node:fs";
import { parseSchematic } from "@/lib/schematic";
import { expect, test, type Page } from "@playwright/test";
import { copySchematic, ORCHARD_END, shots, signInAs, sizeIt, sql, waitSaved } from "./helpers/board";

// Results everyone can see: the reviewer reads the revision under review with its numbers
// (no Size it), the hot-water and scenario switch, findings grouped by check, a new firm's
// first project, and the drawing exported with its title block.

const bypassOnly = async () => (await sql<{ id: string }>("select id from schematics where project_id = $1 and name = 'Bypass only'", [ORCHARD_END]))[0]!.id;
type Pipe = { id: string; lengthM: number };
type ModeRes = { mode: string; pipes: { id: string; flowM3h: number; pressureDropKpa: number }[] };

async function zoomIn(page: Page, times = 4) {
  for (let i = 0; i < times; i++) await page.locator(".react-flow__controls-zoomin").click();
}

test("the reviewer opens the revision under review and reads its report without sizing: its numbers, not the changed draft's", async ({ page, browser }) => {
  test.setTimeout(120_000);
  const id = await bypassOnly();
  const [saved] = await sql<{ draft: unknown; lock_version: number }>("select draft, lock_version from schematics where id = $1", [id]);
  await sql("delete from draft_results where schematic_id = $1", [id]); // the draft as the seed leaves it: never sized itself
  try {
    // the designer changes the draft after submitting: pipe z1-f0 from 6 m to 80 m
    const designer = await browser.newPage();
    await signInAs(designer, "designer");
    const view = await (await designer.request.get(`/api/v1/schematics/${id}`)).json();
    const doc = structuredClone(view.doc);
    doc.pipes.find((p: Pipe) => p.id === "z1-f0").lengthM = 80;
    const put = await designer.request.put(`/api/v1/schematics/${id}`, { data: { lockVersion: view.schematic.lockVersion, doc }, headers: { origin: new URL(designer.url()).origin } });
    expect(put.status()).toBe(200);
    const draftDp = (await (await designer.request.post("/api/v1/calculate", { data: doc, headers: { origin: new URL(designer.url()).origin } })).json()).modes
      .find((m: ModeRes) => m.mode === "heating").pipes.find((p: { id: string }) => p.id === "z1-f0").pressureDropKpa as number;
    await designer.close();

    await page.setViewportSize({ width: 1366, height: 768 });
    await signInAs(page, "reviewer");
    await page.goto(`/projects/${ORCHARD_END}`);
    await page.getByRole("link", { name: "Bypass only" }).first().click();
    const banner = page.getByTestId("viewing-banner");
    await expect(banner).toHaveAttribute("data-viewing", "revision");
    await expect(banner).toContainText("Rev 1");
    await expect(banner).toContainText("In review");
    await expect(page.getByTestId("size-it")).toHaveCount(0); // a reviewer cannot size, and need not
    await expect(page.getByTestId("findings-dock")).toBeVisible();
    await page.screenshot({ path: `${shots}/reviewer-board.png` });

    // the revision's own results, through the API
    const revisionId = (await sql<{ id: string }>("select id from schematic_revisions where schematic_id = $1 and status = 'in-review'", [id]))[0]!.id;
    const api = await (await page.request.get(`/api/v1/revisions/${revisionId}`)).json();
    expect(Object.keys(api).sort()).toEqual(["document", "engineVersion", "results", "revision"]);
    const revDp = (api.results.modes as ModeRes[]).find((m) => m.mode === "heating")!.pipes.find((p) => p.id === "z1-f0")!.pressureDropKpa;
    expect(api.document.pipes.find((p: Pipe) => p.id === "z1-f0").lengthM).toBe(6);
    expect(Math.abs(draftDp - revDp)).toBeGreaterThan(0.5); // the draft would read differently

    await page.getByRole("tab", { name: "Sizing report" }).click();
    const row = page.getByTestId("pipe-schedule").locator("tr").filter({ has: page.getByText("z1-f0", { exact: true }) });
    await expect(row).toContainText("6.0 m");
    await expect(row).toContainText(revDp.toFixed(2));
    await expect(row).not.toContainText("80.0 m");
    await page.screenshot({ path: `${shots}/reviewer-report.png` });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: `${shots}/reviewer-report-phone.png` });
    await page.setViewportSize({ width: 1366, height: 768 });

    // the draft is one click away, and says so
    await page.getByRole("tab", { name: "Drawing" }).click();
    await page.getByTestId("open-draft").click();
    await expect(page.getByTestId("viewing-banner")).toHaveAttribute("data-viewing", "draft");
    await expect(page.getByTestId("viewing-banner")).toContainText("Working draft");
    // never sized itself, the draft shows Rev 1's numbers, out of date, with what changed since
    await expect(page.getByTestId("results-bar")).toContainText("Results of Rev 1");
    await expect(page.getByTestId("results-stale")).toContainText("pipe z1-f0: length 6 → 80 m");
    await page.getByTestId("results-stale").locator("summary").click();
    await page.screenshot({ path: `${shots}/reviewer-draft-stale.png` });
  } finally {
    await sql("update schematics set draft = $2, lock_version = lock_version + 1 where id = $1", [id, JSON.stringify(saved!.draft)]);
    await sql("delete from draft_results where schematic_id = $1", [id]);
  }
});

test("hot water and scenarios on the drawing: the cylinder coil pipes carry flow in hot-water mode", async ({ page }) => {
  test.setTimeout(120_000);
  const id = await copySchematic("Bypass only", `e2e hot water ${Date.now()}`);
  await page.setViewportSize({ width: 1366, height: 768 });
  await signInAs(page, "designer");
  await page.goto(`/projects/${ORCHARD_END}/schematics/${id}`);
  await sizeIt(page);
  const doc = (await (await page.request.get(`/api/v1/schematics/${id}`)).json()).doc;
  const results = await (await page.request.post("/api/v1/calculate", { data: doc, headers: { origin: new URL(page.url()).origin } })).json();
  const hw = (results.modes as ModeRes[]).find((m) => m.mode === "hot-water")!.pipes.find((p) => p.id === "hw-f")!.flowM3h;
  expect(hw).toBeGreaterThan(0.1);

  const label = page.locator('.react-flow__edge[data-id="hw-f"] .lw-pipe-label');
  await expect(label).toContainText("0.000 m³/h"); // heating: the diverter is on heating
  await page.getByTestId("results-view").first().selectOption("hot-water");
  await expect(label).toContainText(`${hw.toFixed(3)} m³/h`);
  await expect(page.getByTestId("velocity-legend")).toContainText("hot water");
  await zoomIn(page, 2);
  await page.screenshot({ path: `${shots}/board-hot-water.png` });
  // part labels on the drawing, or their ids
  await expect(page.locator('.react-flow__node[data-id="cyl"] [data-tag]')).toHaveText("Hot-water cylinder 200 L");
  await page.getByTestId("toggle-tags").click();
  await expect(page.locator('.react-flow__node[data-id="cyl"] [data-tag]')).toHaveText("cyl");
  await page.getByTestId("toggle-tags").click();

  // a simulated scenario: every zone shut, the bypass passes the heat source's flow
  await page.getByTestId("results-view").first().selectOption("scenario:all zones shut");
  await expect(page.getByTestId("view-summary")).toContainText("bypass passes");
  const shut = results.scenarios.find((s: { name: string }) => s.name === "all zones shut");
  await expect(page.getByTestId("view-summary")).toContainText(`${shut.heatSourceFlowM3h.toFixed(3)} m³/h`);
  await page.screenshot({ path: `${shots}/board-scenario-shut.png` });

  // the report follows the same switch
  await page.getByTestId("results-view").first().selectOption("hot-water");
  await page.getByRole("tab", { name: "Sizing report" }).click();
  await expect(page.getByTestId("sizing-report")).toHaveAttribute("data-view", "hot-water");
  const row = page.getByTestId("pipe-schedule").locator("tr").filter({ has: page.getByText("hw-f", { exact: true }) });
  await expect(row).toContainText(hw.toFixed(3));
  await page.screenshot({ path: `${shots}/report-hot-water.png` });
  await page.setViewportSize({ width: 390, height: 844 });
  await page.getByRole("tab", { name: "Drawing" }).click();
  await page.screenshot({ path: `${shots}/board-hot-water-phone.png` });
});

test("findings grouped by check, docked beside the drawing; a finding shows its mode", async ({ page }) => {
  test.setTimeout(120_000);
  const id = await copySchematic("Bypass only", `e2e findings ${Date.now()}`);
  // a tight velocity limit: many pipes break it, in heating and in hot water
  await sql(`update schematics set draft = jsonb_set(draft, '{design,maxVelocityMps}', '0.4') where id = $1`, [id]);
  await page.setViewportSize({ width: 1366, height: 768 });
  await signInAs(page, "designer");
  await page.goto(`/projects/${ORCHARD_END}/schematics/${id}`);
  await sizeIt(page);
  const group = page.locator('[data-testid=finding-group][data-code="pipe.velocity-high"]');
  await expect(group).toHaveCount(1);
  const count = Number(await group.getByTestId("finding-count").textContent());
  expect(count).toBeGreaterThan(5);
  const groups = await page.getByTestId("finding-group").count();
  const findings = (await (await page.request.post("/api/v1/calculate", { data: (await (await page.request.get(`/api/v1/schematics/${id}`)).json()).doc, headers: { origin: new URL(page.url()).origin } })).json()).findings.length;
  expect(groups).toBeLessThan(findings);
  // docked beside the canvas, not over it
  const dock = await page.getByTestId("findings-dock").boundingBox();
  const canvas = await page.getByTestId("board-canvas").boundingBox();
  expect(dock!.x).toBeGreaterThanOrEqual(canvas!.x + canvas!.width - 1);
  await page.screenshot({ path: `${shots}/findings-grouped.png` });

  await group.getByRole("button").first().click();
  const items = group.getByTestId("finding");
  await expect(items).toHaveCount(count);
  // a pipe of the cylinder's coil is too fast in hot-water mode only: its finding shows that mode
  // (a pipe too fast in both modes has one finding naming both, shown in every view)
  const hot = items.filter({ has: page.getByTestId("finding-view").getByText("Design · hot water", { exact: true }) }).first();
  await expect(hot).toContainText("hot-water mode");
  await expect(hot).not.toContainText("heating mode");
  await hot.click();
  await expect(page.getByTestId("results-view").first()).toHaveValue("hot-water");
  await page.screenshot({ path: `${shots}/findings-open.png` });
  await page.setViewportSize({ width: 390, height: 844 });
  await page.getByRole("button", { name: "Details" }).click();
  await page.screenshot({ path: `${shots}/findings-phone.png` });
});

test("a tee dropped on a pipe splits it into two connected pipes, and undo joins them again", async ({ page }) => {
  const id = await copySchematic("Bypass only", `e2e split ${Date.now()}`);
  const stored = async () => (await sql<{ draft: { parts: { id: string; type: string }[]; pipes: { id: string; from: string; to: string; lengthM: number }[] } }>(
    "select draft from schematics where id = $1", [id]))[0]!.draft;
  const before = await stored();
  await page.setViewportSize({ width: 1366, height: 768 });
  await signInAs(page, "designer");
  await page.goto(`/projects/${ORCHARD_END}/schematics/${id}`);
  // pri-f5 runs straight from t-av to the diverter, 0.6 m: drop a tee at its middle
  const path = page.locator('.react-flow__edge[data-id="pri-f5"] path.react-flow__edge-path');
  await expect(path).toHaveCount(1);
  const mid = await path.evaluate((p: SVGPathElement) => {
    const pt = p.getPointAtLength(p.getTotalLength() / 2);
    const m = p.getScreenCTM()!;
    return { x: pt.x * m.a + pt.y * m.c + m.e, y: pt.x * m.b + pt.y * m.d + m.f };
  });
  const canvas = (await page.getByTestId("board-canvas").boundingBox())!;
  await page.locator('[data-testid=parts-bin] [data-part="tee"]').dragTo(page.getByTestId("board-canvas"), { targetPosition: { x: mid.x - canvas.x, y: mid.y - canvas.y } });
  await waitSaved(page);
  const split = await stored();
  expect(split.pipes).toHaveLength(before.pipes.length + 1);
  const tee = split.parts.at(-1)!;
  expect(tee.type).toBe("tee");
  const into = split.pipes.find((p) => p.id === "pri-f5")!;
  const out = split.pipes.find((p) => p.from === `${tee.id}.b`)!;
  expect(into).toMatchObject({ from: "t-av.b", to: `${tee.id}.a` });
  expect(out.to).toBe("div.ab");
  expect(into.lengthM + out.lengthM).toBeCloseTo(0.6, 9);
  await page.screenshot({ path: `${shots}/board-tee-split.png` });
  await page.getByRole("button", { name: "Undo" }).click();
  await waitSaved(page);
  // the board works on the parsed document (fields it leaves empty written out as their
  // defaults, e.g. a pipe's fittings as zeros): undo gives back exactly that
  const parsed = parseSchematic(before);
  if (!parsed.ok) throw new Error("the seeded draft does not parse");
  expect((await stored()).pipes).toEqual(parsed.doc.pipes);
});

test("a new firm's empty projects page offers a first project and the demo copy; creating one opens it", async ({ page }) => {
  const stamp = Date.now();
  await page.setViewportSize({ width: 1366, height: 768 });
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Wren Marsh");
  const email = `wren-${stamp}@example.test`;
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Password").fill("heron-lane-copper-27");
  await page.getByLabel("Firm name").fill(`Heron Plumbing ${stamp}`);
  await page.getByRole("button", { name: "Create account" }).click();
  // sign-up is finished from the e-mailed link (caught by the SMTP catcher)
  const mailApi = process.env.MAIL_WEB_URL ?? "http://127.0.0.1:1081";
  let link = "";
  await expect.poll(async () => {
    const all = (await (await fetch(`${mailApi}/api/email`)).json()) as { text: string; to: { address: string }[] }[];
    link = all.filter((m) => m.to.some((t) => t.address === email)).map((m) => /https?:\/\/\S+\/sign-up\/\S+/.exec(m.text)?.[0] ?? "").find(Boolean) ?? "";
    return link;
  }, { timeout: 15_000 }).not.toBe("");
  await page.goto(new URL(link).pathname);
  await page.getByRole("button", { name: "Create my account" }).click();
  await page.waitForURL(/\/projects(\?welcome=1)?$/);
  const empty = page.getByTestId("projects-empty");
  await expect(empty).toBeVisible();
  await expect(empty.getByRole("button", { name: "New project" })).toBeVisible();
  await expect(empty.getByRole("button", { name: "Copy the demo project" })).toBeVisible();
  await page.screenshot({ path: `${shots}/projects-new-firm.png` });
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: `${shots}/projects-new-firm-phone.png`, fullPage: true });
  await page.setViewportSize({ width: 1366, height: 768 });

  await empty.getByRole("button", { name: "New project" }).click();
  const form = page.getByTestId("project-form");
  await form.getByLabel("Project name").fill("Heron Cottage");
  await form.getByLabel("Client").fill("The Heron household");
  await form.getByLabel("Site").fill("Invented lane, Lower Alder");
  await form.getByLabel("Flow temperature").fill("50");
  await form.getByLabel("Return temperature").fill("43");
  await page.screenshot({ path: `${shots}/projects-new-form.png` });
  await form.getByRole("button", { name: "Create project" }).click();
  await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
  await expect(page.getByRole("heading", { name: "Heron Cottage" })).toBeVisible();
  await expect(page.getByTestId("project-design")).toContainText("flow 50 °C / return 43 °C");
  await page.getByTestId("edit-project").click();
  await page.getByTestId("project-form").getByLabel("Project name").fill("Heron Cottage, phase 1");
  await page.getByRole("button", { name: "Save project" }).click();
  await expect(page.getByRole("heading", { name: "Heron Cottage, phase 1" })).toBeVisible();
  await page.getByTestId("archive-project").click();
  await expect(page.getByTestId("archived-banner")).toBeVisible();
  await page.screenshot({ path: `${shots}/project-archived.png` });
});

test("the drawing exports as SVG with its title block, and as PNG", async ({ page }) => {
  const id = await bypassOnly();
  await page.setViewportSize({ width: 1366, height: 768 });
  await signInAs(page, "reviewer");
  await page.goto(`/projects/${ORCHARD_END}/schematics/${id}`);
  await page.getByTestId("export-menu").locator("summary").click();
  const [svgFile] = await Promise.all([page.waitForEvent("download"), page.getByTestId("export-svg").click()]);
  expect(svgFile.suggestedFilename()).toBe("orchard-end-bypass-only-rev-1.svg");
  const text = fs.readFileSync((await svgFile.path())!, "utf8");
  for (const line of ["Project: </tspan><tspan font-weight=\"600\">Orchard End", "Schematic: </tspan><tspan font-weight=\"600\">Bypass only",
    "Revision: </tspan><tspan font-weight=\"600\">Rev 1", "Status: </tspan><tspan font-weight=\"600\">In review", "Date: </tspan>"]) expect(text).toContain(line);
  expect(text.match(/data-pipe="/g)?.length).toBeGreaterThan(50);

  await page.getByTestId("export-menu").locator("summary").click();
  await page.getByTestId("export-menu").locator("summary").click();
  const [pngFile] = await Promise.all([page.waitForEvent("download"), page.getByTestId("export-png").click()]);
  const png = fs.readFileSync((await pngFile.path())!);
  expect(png.subarray(1, 4).toString()).toBe("PNG");

  // look at the sheet as a browser shows the file
  const shown = await page.context().newPage();
  await shown.setViewportSize({ width: 1366, height: 768 });
  await shown.setContent(`<body style="margin:0">${text.replace(/^<\?xml[^>]*>/, "")}</body>`);
  await shown.screenshot({ path: `${shots}/export-sheet.png`, fullPage: true });
  await shown.close();
});
