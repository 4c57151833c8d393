import { expect, test } from "@playwright/test";
import { ORCHARD_END, copySchematic, removeSchematics, shots, signInAs, sql, waitSaved } from "./helpers/board";

// Two people edit the same schematic. The first save wins; the second gets the conflict
// message and saves theirs as a variant, so both versions are kept.
test("the second save gets the conflict message; save mine as a variant keeps both", async ({ browser }) => {
  test.setTimeout(120_000);
  const id = await copySchematic("Bypass only", `e2e conflict ${Date.now()}`);
  try {
    const url = `/projects/${ORCHARD_END}/schematics/${id}`;
    const a = await (await browser.newContext({ viewport: { width: 1440, height: 900 } })).newPage();
    const b = await (await browser.newContext({ viewport: { width: 1440, height: 900 } })).newPage();
    await signInAs(a, "designer");
    await signInAs(b, "owner");
    // B's live connection is down (a patchy network): it does not hear A's save, so its own
    // save is the one that meets the conflict (with it up, B's board would reload A's draft first)
    await b.route(/\/api\/v1\/schematics\/[^/]+\/events/, (route) => route.abort());
    await a.goto(url);
    await b.goto(url);
    await expect(a.getByTestId("drawing-board")).toBeVisible();
    await expect(b.getByTestId("drawing-board")).toBeVisible();

    // A adds an air vent; autosave writes the draft.
    await a.locator('[data-testid=parts-bin] [data-part="air-vent"]').click();
    await waitSaved(a);

    // B, still on the version it opened, adds a drain cock.
    await b.locator('[data-testid=parts-bin] [data-part="drain-cock"]').click();
    const dialog = b.getByTestId("conflict-dialog");
    await expect(dialog).toBeVisible({ timeout: 20_000 });
    await expect(dialog).toContainText("Someone else saved this schematic since you opened it");
    await b.screenshot({ path: `${shots}/board-conflict.png` });
    await dialog.getByRole("button", { name: "Save mine as a variant" }).click();
    await b.waitForURL((u) => u.pathname.includes("/schematics/") && !u.pathname.endsWith(id));

    const rows = await sql<{ id: string; variant_of: string | null; draft: { parts: { type: string }[] } }>(
      "select id, variant_of, draft from schematics where id = $1 or variant_of = $1", [id]);
    const original = rows.find((r) => r.id === id)!;
    const variant = rows.find((r) => r.variant_of === id)!;
    const count = (d: typeof original.draft, type: string) => d.parts.filter((p) => p.type === type).length;
    // A's air vent is in the schematic, B's drain cock in the variant; neither has the other's.
    expect(count(original.draft, "air-vent")).toBe(count(variant.draft, "air-vent") + 1);
    expect(count(variant.draft, "drain-cock")).toBe(count(original.draft, "drain-cock") + 1);
    await expect(b.getByTestId("drawing-board")).toBeVisible();
  } finally {
    await removeSchematics(id);
  }
});
