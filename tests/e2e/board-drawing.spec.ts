import { expect, test } from "@playwright/test";
import { shots, signInAs } from "./helpers/board";
import { boardDoc, drawSmallSystem, pipe } from "./helpers/draw";

// A designer draws a small system on an empty board from the parts bin, pipes it port to
// port, sees flow/return colours, is refused a bad pipe, types a pipe length in details,
// and undoes/redoes it. Sizing and saving are covered by board-sizing/board-conflict.
test("draw a small system from the parts bin, pipe it, edit a length, undo and redo", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 1440, height: 900 });
  await signInAs(page, "owner");
  await page.goto("/board-preview?empty=1");
  await expect(page.getByTestId("board-canvas")).toBeVisible();

  await drawSmallSystem(page);
  const doc = await boardDoc(page);
  expect(doc.parts.map((p) => p.id).sort()).toEqual(
    ["bp1", "ev1", "hp1", "pump1", "rad1", "rad2", "t1", "t2", "t3", "t4", "t5", "zv1", "zv2"].sort());
  expect(doc.pipes).toHaveLength(15);
  await page.screenshot({ path: `${shots}/board-drawn.png` });

  // colour comes from the side of the circuit: heat pump flow red, its return blue
  const idOf = (from: string) => doc.pipes.find((p) => p.from === from)!.id;
  const flowEdge = page.locator(`.react-flow__edge[data-id="${idOf("hp1.flow")}"] .lw-pipe`);
  const returnEdge = page.locator(`.react-flow__edge[data-id="${idOf("t5.a")}"] .lw-pipe`);
  await expect(flowEdge).toHaveAttribute("data-side", "flow");
  await expect(returnEdge).toHaveAttribute("data-side", "return");
  await expect(flowEdge.locator("path.react-flow__edge-path")).toHaveCSS("stroke", "rgb(200, 50, 43)");
  await expect(returnEdge.locator("path.react-flow__edge-path")).toHaveCSS("stroke", "rgb(43, 95, 200)");

  // a port takes one pipe: refused with a visible hint, nothing added
  await pipe(page, "hp1.flow", "ev1.connection");
  await expect(page.getByTestId("canvas-hint")).toContainText("already has a pipe");
  expect((await boardDoc(page)).pipes).toHaveLength(15);

  // type a length in details (the pipe selected the way a finding selects it)
  const p = idOf("zv1.b");
  await page.evaluate((id) => window.__lwBoard!.selectRefs([id]), p);
  const length = page.getByTestId("pipe-form").getByLabel("Length");
  await length.fill("6");
  await length.press("Enter");
  const label = page.locator(`.react-flow__edge[data-id="${p}"] .lw-pipe-label`);
  await expect(label).toHaveText("22 · 6 m");
  // a bad value is refused in the form and never reaches the document
  await length.fill("six");
  await length.press("Enter");
  // (numbers are read as the locale types them: lib/units/read-number.ts)
  await expect(page.getByTestId("pipe-form").getByRole("alert")).toContainText("is not a number");
  expect((await boardDoc(page)).pipes.find((x) => x.id === p)!.lengthM).toBe(6);
  await length.press("Escape");

  await page.locator(".react-flow__pane").click({ position: { x: 20, y: 20 } });
  await page.keyboard.press("Control+z");
  await expect(label).toHaveText("22 · 1 m");
  await page.keyboard.press("Control+Shift+z");
  await expect(label).toHaveText("22 · 6 m");
  await page.keyboard.press("Control+z");
  await page.keyboard.press("Control+y");
  await expect(label).toHaveText("22 · 6 m");

  await page.keyboard.press("?");
  await expect(page.getByRole("dialog", { name: "Keyboard shortcuts" })).toContainText("Duplicate");
  await page.screenshot({ path: `${shots}/board-help.png` });
  // Sizing and saving this drawing: board-2's specs (helpers/board.ts sizeIt / waitSaved).
});
