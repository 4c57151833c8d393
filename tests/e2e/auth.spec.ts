import { expect, test, type Page } from "@playwright/test";

// Sign-in, invitations and roles in the browser, against the production build and the
// SMTP catcher (maildev; its HTTP API at MAIL_WEB_URL).
const mailApi = process.env.MAIL_WEB_URL ?? "http://127.0.0.1:1081";
const MILLBROOK = "6a0f3c1e-0000-4000-8000-000000000101";
const ORCHARD = "6a0f3c1e-0000-4000-8000-000000000102";
const shots = "test-results/screens";

/** The seeded Orchard End "Bypass only" team schematic, by its seeded name (copies made by other tests have their own). */
async function bypassOnlyId(projectId: string): Promise<string> {
  const { Client } = await import("pg");
  const c = new Client({ connectionString: process.env.DATABASE_URL });
  await c.connect();
  try {
    const r = await c.query("select id from schematics where project_id = $1 and kind = 'team' and name = 'Bypass only'", [projectId]);
    expect(r.rows).toHaveLength(1);
    return r.rows[0].id as string;
  } finally { await c.end(); }
}

async function signIn(page: Page, email: string, password: string, next?: string) {
  await page.goto(next ? `/sign-in?next=${encodeURIComponent(next)}` : "/sign-in");
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

/** The newest e-mail the SMTP catcher holds for `address`, waiting until one arrives. */
async function caughtMailTo(address: string): Promise<{ subject: string; text: string }> {
  let mail: { subject: string; text: string } | undefined;
  await expect.poll(async () => {
    const all = (await (await fetch(`${mailApi}/api/email`)).json()) as { subject: string; text: string; to: { address: string }[] }[];
    mail = all.filter((m) => m.to.some((t) => t.address === address)).at(-1);
    return mail !== undefined;
  }, { message: `an e-mail to ${address} at ${mailApi}`, timeout: 15_000 }).toBe(true);
  return mail!;
}

test("the signed-in area sends a visitor to sign in and back", async ({ page }) => {
  await page.goto(`/projects/${MILLBROOK}/team`);
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fprojects%2F/);
  await page.screenshot({ path: `${shots}/sign-in.png`, fullPage: true });
  await page.getByLabel("E-mail address").fill("owner@fernbank.example");
  await page.getByLabel("Password").fill("wrong password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "do not match" })).toBeVisible();
  await page.screenshot({ path: `${shots}/sign-in-error.png`, fullPage: true });
  await page.getByLabel("Password").fill("copper-loop-owner");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(new RegExp(`/projects/${MILLBROOK}/team$`));
  await expect(page.getByRole("heading", { name: "Team" })).toBeVisible();
});

test("owner invites a new person by e-mail; they sign up into the project, sign out and sign in", async ({ page, browser }) => {
  const email = `new-${Date.now()}@example.test`;
  await signIn(page, "owner@fernbank.example", "copper-loop-owner", `/projects/${MILLBROOK}/team`);
  await expect(page.getByTestId("member-list")).toContainText("Nia Thorne");
  const invite = page.getByTestId("invite-form");
  await invite.getByLabel("E-mail address").fill(email);
  await invite.getByLabel("Role").selectOption("reviewer");
  await invite.getByRole("button", { name: "Send invitation" }).click();
  await expect(invite.getByRole("status")).toContainText(`Invitation sent to ${email}`);
  await expect(page.getByTestId("invitation-list")).toContainText(email);
  await page.screenshot({ path: `${shots}/team-owner.png`, fullPage: true });

  const mail = await caughtMailTo(email);
  expect(mail.subject).toBe("Rowan Hale invited you to Millbrook Community Hall on Loopwright");
  const link = mail.text.match(/https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/)![0];

  const ctx = await browser.newContext();
  const guest = await ctx.newPage();
  await guest.goto(new URL(new URL(link).pathname, page.url()).toString());
  await expect(guest.getByRole("heading", { name: "Join Millbrook Community Hall" })).toBeVisible();
  await guest.screenshot({ path: `${shots}/invite.png`, fullPage: true });
  await guest.getByLabel("Your name").fill("Quinn Ferris");
  await guest.getByLabel("Choose a password").fill("quinn-password-1");
  await guest.getByRole("button", { name: "Create account and join" }).click();
  await expect(guest).toHaveURL(new RegExp(`/projects/${MILLBROOK}/team\\?joined=1`));
  await expect(guest.getByText("You joined as reviewer")).toBeVisible();
  await expect(guest.getByTestId("invite-form")).toHaveCount(0); // reviewers do not manage the team

  await guest.getByRole("button", { name: "Sign out" }).click();
  await expect(guest).toHaveURL(/\/$/);
  await signIn(guest, email, "quinn-password-1");
  await expect(guest).toHaveURL(/\/projects$/);
  await expect(guest.getByTestId("project-list")).toContainText("Millbrook Community Hall");
  await expect(guest.getByTestId("project-list")).not.toContainText("Orchard End"); // only projects they belong to

  // the link worked once
  await guest.goto(new URL(link).pathname);
  await expect(guest.getByRole("alert").filter({ hasText: "already been used" })).toBeVisible();
  await ctx.close();
});

test("a trainee cannot edit the team's schematic: no edit controls, and the API answers 403", async ({ page }) => {
  await page.goto("/");
  await page.getByTestId("demo-trainee").click();
  await expect(page).toHaveURL(/\/projects$/);
  await page.goto(`/projects/${MILLBROOK}/team`);
  await expect(page.getByText("You are trainee")).toBeVisible();
  await expect(page.getByTestId("invite-form")).toHaveCount(0);
  await expect(page.locator("select")).toHaveCount(0); // no role changes

  const project = await page.request.get(`/api/v1/projects/${MILLBROOK}`);
  expect(project.status()).toBe(200);
  const { can } = await project.json();
  expect(can["schematic.edit"]).toBe(false); // what the board reads to hide its edit tools
  expect(can["variant.practice"]).toBe(true);

  // the team's schematic on the drawing board: read-only, no save controls
  const schematicId = await bypassOnlyId(ORCHARD);
  await page.goto(`/projects/${ORCHARD}/schematics/${schematicId}`);
  await expect(page.getByTestId("save-status")).toHaveText("Read-only");
  await expect(page.getByRole("button", { name: "Save revision" })).toHaveCount(0);
  await page.screenshot({ path: `${shots}/board-trainee.png` });

  // and straight at the board's API: reading is fine, writing is 403 with the reason
  const read = await page.request.get(`/api/v1/schematics/${schematicId}`);
  expect(read.status()).toBe(200);
  const view = await read.json();
  // page.request is not the page's own fetch: it sends the Origin a browser would add itself
  const origin = { origin: new URL(page.url()).origin };
  const put = await page.request.put(`/api/v1/schematics/${schematicId}`, { data: { lockVersion: view.schematic?.lockVersion ?? 1, doc: view.doc ?? {} }, headers: origin });
  expect(put.status()).toBe(403);
  expect((await put.json()).error).toMatch(/Only a project owner or designer can edit the team's schematics; your role on this project is trainee/);
  const after = await page.request.get(`/api/v1/schematics/${schematicId}`);
  expect((await after.json()).schematic?.lockVersion).toBe(view.schematic?.lockVersion); // nothing saved

  const del = await page.request.delete(`/api/v1/projects/${MILLBROOK}`, { headers: origin });
  expect(del.status()).toBe(403);
  expect((await del.json()).error).toMatch(/Only a project owner can delete the project; your role on this project is trainee/);
});

test("team page on a phone, and the landing page's demo row", async ({ page }) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto("/");
  await expect(page.getByRole("heading", { name: "Try a demo role" })).toBeVisible();
  await page.screenshot({ path: `${shots}/landing-phone.png`, fullPage: true });
  await page.getByTestId("demo-owner").click();
  await expect(page).toHaveURL(/\/projects$/);
  await page.goto(`/projects/${MILLBROOK}/team`);
  await expect(page.getByTestId("member-list")).toBeVisible();
  await page.screenshot({ path: `${shots}/team-phone.png`, fullPage: true });
  await page.goto("/account");
  await page.screenshot({ path: `${shots}/account-phone.png`, fullPage: true });
});
