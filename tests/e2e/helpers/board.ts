import { expect, type Page } from "@playwright/test";

// Shared steps for the drawing-board browser tests.
export const ORCHARD_END = "6a0f3c1e-0000-4000-8000-000000000102";
export const MILLBROOK = "6a0f3c1e-0000-4000-8000-000000000101";
export const shots = "test-results/screens";

export async function signInAs(page: Page, role: "designer" | "owner" | "reviewer" | "trainee" | "installer") {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail address").fill(`${role}@fernbank.example`);
  await page.getByLabel("Password").fill(`copper-loop-${role}`);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL(/\/projects/);
}

export async function sql<T = Record<string, unknown>>(text: string, values: unknown[] = []): Promise<T[]> {
  const { Client } = await import("pg");
  const c = new Client({ connectionString: process.env.DATABASE_URL });
  await c.connect();
  try {
    return (await c.query(text, values)).rows as T[];
  } finally {
    await c.end();
  }
}

/** A private copy of a seeded schematic for one test, so tests never edit each other's rows. */
export async function copySchematic(fromName: string, name: string): Promise<string> {
  const [row] = await sql<{ id: string }>(
    `insert into schematics (project_id, name, kind, owner_id, draft, updated_by)
     select project_id, $2, 'team', owner_id, draft, updated_by from schematics where project_id = $3 and name = $1 returning id`,
    [fromName, name, ORCHARD_END]);
  return row!.id;
}

/**
 * Removes test schematics and any variant saved from them (cleanup in a test's finally), issued
 * revisions too: the database refuses that otherwise, so its guard trigger is off inside this
 * one transaction only (as tests/integration/helpers/fixture.ts deleteForTests does).
 */
export async function removeSchematics(...ids: string[]): Promise<void> {
  const { Client } = await import("pg");
  const c = new Client({ connectionString: process.env.DATABASE_URL });
  await c.connect();
  try {
    await c.query("begin");
    await c.query("alter table schematic_revisions disable trigger lw_revision_immutable");
    await c.query("delete from schematics where variant_of = any($1::uuid[])", [ids]);
    await c.query("delete from schematics where id = any($1::uuid[])", [ids]);
    await c.query("alter table schematic_revisions enable trigger lw_revision_immutable");
    await c.query("commit");
  } catch (e) {
    await c.query("rollback");
    throw e;
  } finally {
    await c.end();
  }
}

export async function waitSaved(page: Page) {
  await expect(page.getByTestId("save-status")).toHaveText(/Saved/, { timeout: 20_000 });
}

export async function sizeIt(page: Page) {
  await page.getByTestId("size-it").click();
  await expect(page.getByTestId("findings-list")).toBeVisible({ timeout: 30_000 });
}
