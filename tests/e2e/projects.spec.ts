import { expect, test } from "@playwright/test";
import { signInAs, sql } from "./helpers/board";

// The app shell's projects list reads PostgreSQL through GET /api/v1/projects and swr:
// a row written straight into the database shows up, in the shipped IBM Plex font.
test("projects list shows the seeded projects and a row added in PostgreSQL", async ({ page }) => {
  const name = `Kestrel Barn ${Date.now()}`;
  const [row] = await sql<{ id: string }>(
    `insert into projects (organisation_id, name, client, site) select id, $1, 'Test client', 'Invented site' from organisations where slug = 'fernbank' returning id`,
    [name]);
  try {
    await sql("insert into project_members (project_id, user_id, role) values ($1, 'demo-designer', 'designer')", [row!.id]);
    await signInAs(page, "designer");
    await page.goto("/projects");
    const list = page.getByTestId("project-list");
    await expect(list).toContainText("Millbrook Community Hall");
    await expect(list).toContainText("Orchard End");
    await expect(list).toContainText(name);

    const family = await list.locator("h2").first().evaluate((el) => getComputedStyle(el).fontFamily);
    expect(family).toMatch(/plex/i);
    const loaded = await page.evaluate(async () => {
      await document.fonts.ready;
      return [...document.fonts].filter((f) => f.status === "loaded").map((f) => f.family).join(" ");
    });
    expect(loaded).toMatch(/plex/i);
    await page.screenshot({ path: "test-results/screens/projects.png", fullPage: true });
  } finally {
    await sql("delete from projects where id = $1", [row!.id]);
  }
});
