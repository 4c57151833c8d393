import { expect, test, type Page } from "@playwright/test";
import { ORCHARD_END, copySchematic, shots, signInAs, sizeIt, sql, waitSaved } from "./helpers/board";

// The designer states the design conditions on the board and the sizing follows them; bad
// conditions are refused in the panel; numbers are read as an en-GB user types them; and
// every row of the sizing report opens a working that reproduces the row's number.
test.use({ locale: "en-GB" });

const open = async (page: Page, name: string) => {
  const id = await copySchematic("Bypass only", `${name} ${Date.now()}`);
  await signInAs(page, "designer");
  await page.goto(`/projects/${ORCHARD_END}/schematics/${id}`);
  await expect(page.getByTestId("drawing-board")).toBeVisible();
  return id;
};
const draft = async (id: string) => (await sql<{ draft: { design: Record<string, number>; parts: { id: string; props: Record<string, unknown> }[] } }>("select draft from schematics where id = $1", [id]))[0]!.draft;
const number = (text: string) => Number(/-?\d[\d,]*\.?\d*/.exec(text.replace(/,/g, ""))?.[0] ?? NaN);

/** The lounge radiator's design flow, read from its working (4 decimals, m³/h). */
async function loungeFlow(page: Page): Promise<number> {
  await page.getByRole("tab", { name: "Sizing report" }).click();
  const row = page.getByTestId("circuits-table").locator("tr").filter({ hasText: "Lounge" });
  await row.getByTitle("Show working").first().click();
  const dialog = page.getByTestId("working-dialog");
  await expect(dialog).toContainText("q = P / (ρ · cp · ΔT)");
  const q = number((await dialog.getByTestId("working-result").textContent()) ?? "");
  await dialog.getByRole("button", { name: "Close" }).click();
  await page.getByRole("tab", { name: "Drawing" }).click();
  return q;
}

test("the Design conditions panel sets the flow temperature and the flows follow the ΔT; bad input is refused", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1366, height: 768 });
  const id = await open(page, "e2e design");

  await sizeIt(page);
  const before = await loungeFlow(page);
  // 1400 W at 45/40 °C: q = P/(ρ·cp·ΔT) with water at the mean 42.5 °C interpolated from references.md §1.1
  // (IAPWS-95: 992.216 / 990.213 kg/m³ and 4179.4 / 4180.1 J/(kg·K) at 40 / 45 °C) → 0.2433 m³/h.
  const props = (rho: number, cp: number) => rho * cp;
  const at42 = props((992.216 + 990.213) / 2, (4179.4 + 4180.1) / 2);
  const at45 = props(990.213, 4180.1);
  // tolerance 0.1 %: the engine's IAPWS-IF97 cp is within 0.053 % of IAPWS-95's, and the working shows 4 decimals
  const near = (a: number, b: number) => expect(Math.abs(a / b - 1)).toBeLessThan(1e-3);
  near(before, (1400 / (at42 * 5)) * 3600);

  // a finding about a design condition links to its field in the panel
  await page.getByRole("button", { name: "Set minimum outdoor temperature in Design conditions" }).click();
  const panel = page.getByTestId("design-panel");
  await expect(panel.getByLabel("Minimum outdoor temperature")).toBeFocused();
  await page.getByTestId("open-design").click();
  await expect(panel).toBeVisible();
  await page.screenshot({ path: `${shots}/design-panel-laptop.png` });

  // bad input: a return above the flow is refused with the reason; nothing is stored
  const ret = panel.getByLabel("Return temperature");
  await ret.fill("47");
  await ret.press("Enter");
  await expect(panel.getByRole("alert")).toContainText("must be below the flow");
  await ret.press("Escape");
  // a static height the safety valve cannot take
  const height = panel.getByLabel("Static height");
  await height.fill("30");
  await height.press("Enter");
  await expect(panel.getByRole("alert")).toContainText("safety valve");
  await page.screenshot({ path: `${shots}/design-panel-refused.png` });
  await height.press("Escape");

  // flow 50 °C: ΔT 10 K instead of 5 K, water at the mean 45 °C
  const flow = panel.getByLabel("Flow temperature", { exact: true });
  await flow.fill("50");
  await flow.press("Enter");
  await expect(page.getByTestId("save-status")).toHaveText(/Unsaved changes|Saving|Saved/);
  await waitSaved(page);
  expect((await draft(id)).design).toMatchObject({ flowTemperatureC: 50, returnTemperatureC: 40, staticHeightM: 5 });

  await page.getByTestId("size-it").click();
  await expect(page.getByTestId("size-it")).toHaveText("Size it", { timeout: 30_000 });
  const after = await loungeFlow(page);
  near(after, (1400 / (at45 * 10)) * 3600); // 0.1218 m³/h
  // the ΔT doubled: the flow halves, times the property ratio (ρ·cp)₄₂.₅/(ρ·cp)₄₅ = 1.0009
  near(after / before, (0.5 * at42) / at45);

  // the change is one undo step
  await page.getByRole("button", { name: "Undo" }).click();
  await expect(flow).toHaveValue("45");
  await page.getByRole("button", { name: "Redo" }).click();
  await expect(flow).toHaveValue("50");
});

test("numbers as an en-GB user types them: “1,500” stores 1500, “1,5” is refused; a zero length is refused", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 1366, height: 768 });
  const id = await open(page, "e2e typing");
  await page.locator('.react-flow__node[data-id="rad-lounge"]').click();
  const form = page.getByTestId("part-form");
  const load = form.getByLabel("Room heat load");
  await load.fill("1,5");
  await load.press("Enter");
  await expect(form.getByRole("alert")).toContainText("can be read two ways");
  await load.fill("1,500");
  await load.press("Enter");
  await expect(load).toHaveValue("1500");
  await waitSaved(page);
  expect((await draft(id)).parts.find((p) => p.id === "rad-lounge")!.props.heatLoadW).toBe(1500);
  // emptied, a field says what the engine then does, and the document stores "not given"
  const valveKv = form.getByLabel("Valve Kv");
  await valveKv.fill("");
  await valveKv.press("Enter");
  await expect(form).toContainText("Empty: typical value assumed");
  await waitSaved(page);
  expect((await draft(id)).parts.find((p) => p.id === "rad-lounge")!.props.valveKv).toBeNull();

  // a straight run along the top of the plant room: a click on its middle selects it
  const box = (await page.locator('.react-flow__edge[data-id="pri-f3"] path.react-flow__edge-interaction').boundingBox())!;
  await page.mouse.click(box.x + box.width / 2, box.y + box.height / 2);
  const pipeForm = page.getByTestId("pipe-form");
  await expect(pipeForm).toBeVisible();
  const length = pipeForm.getByLabel("Length");
  const before = await length.inputValue();
  await length.fill("0");
  await length.press("Enter");
  await expect(pipeForm.getByRole("alert")).toContainText("more than 0 m");
  await length.fill("-2");
  await length.press("Enter");
  await expect(pipeForm.getByRole("alert")).toContainText("more than 0 m");
  await length.press("Escape");
  await expect(length).toHaveValue(before);
});

test("every row of the sizing report opens a working whose result is the row's number", async ({ page }) => {
  test.setTimeout(240_000);
  await page.setViewportSize({ width: 1366, height: 768 });
  await open(page, "e2e working");
  await sizeIt(page);
  await page.getByRole("tab", { name: "Sizing report" }).click();
  const dialog = page.getByTestId("working-dialog");
  let checked = 0;
  const check = async (button: ReturnType<Page["locator"]>) => {
    const shown = number((await button.textContent()) ?? "");
    await button.click();
    const result = number((await dialog.getByTestId("working-result").textContent()) ?? "");
    // the cell shows fewer decimals than the working: equal to the cell's rounding
    const decimals = ((await button.textContent()) ?? "").match(/\.(\d+)/)?.[1]?.length ?? 0;
    expect(Math.abs(result - shown), `${await dialog.locator("h2").textContent()}: ${result} vs ${shown}`).toBeLessThanOrEqual(0.5 * 10 ** -decimals + 1e-9);
    if (checked === 3) await page.screenshot({ path: `${shots}/working-dialog-laptop.png` });
    await dialog.getByRole("button", { name: "Close" }).click();
    checked++;
  };
  for (const table of ["pipe-schedule", "circuits-table", "emitters-table"]) {
    const rows = page.getByTestId(table).locator("tbody tr");
    const n = await rows.count();
    expect(n).toBeGreaterThan(0);
    for (let i = 0; i < n; i++) {
      const buttons = rows.nth(i).getByTitle("Show working");
      expect(await buttons.count(), `${table} row ${i} has a working`).toBeGreaterThan(0);
      await check(buttons.first());
    }
  }
  for (const card of ["pump-duty", "report-bypass", "report-vessel", "report-volume", "report-hot-water"]) {
    const buttons = page.getByTestId(card).getByTitle("Show working");
    const n = await buttons.count();
    expect(n, `${card} has workings`).toBeGreaterThan(0);
    for (let i = 0; i < n; i++) await check(buttons.nth(i));
  }
  expect(checked).toBeGreaterThan(60);
});

test("phone: the Design conditions open in the details drawer", async ({ page }) => {
  test.setTimeout(90_000);
  await page.setViewportSize({ width: 390, height: 844 });
  await open(page, "e2e phone");
  await page.getByTestId("open-design").click();
  await expect(page.getByTestId("design-panel")).toBeVisible();
  await page.screenshot({ path: `${shots}/design-panel-phone.png` });
});
