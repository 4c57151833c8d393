import { expect, test, type Page } from "@playwright/test";
import { ORCHARD_END, removeSchematics, shots, signInAs, sql } from "./helpers/board";
import { caughtMail, linkInMail } from "./helpers/mail";

// The review cycle end to end, two people at once: the designer submits; the reviewer pins
// a thread to a pipe (mentioning the designer) and sends back with a reason; the designer
// sees both live, without reloading, opens the thread from the e-mail, replies and
// resolves; saves Rev 2 and submits it; the reviewer approves; the designer issues. Every
// e-mail is caught and its link opens the right thread or revision.

const LIVE_MS = 2000; // the bound for seeing another person's change

async function clickPipe(page: Page, id: string) {
  const at = await page.locator(`.react-flow__edge[data-id="${id}"] path.react-flow__edge-interaction`).evaluate((el) => {
    const path = el as SVGPathElement;
    const p = path.getPointAtLength(path.getTotalLength() / 2);
    const m = path.getScreenCTM()!;
    return { x: p.x * m.a + p.y * m.c + m.e, y: p.x * m.b + p.y * m.d + m.f };
  });
  await page.mouse.click(at.x, at.y);
}

const statusOf = (page: Page) => page.getByTestId("revision-status-bar");

/** A write the live triggers do not announce (session_replication_role = replica turns triggers off for the connection). */
async function unannounced(text: string, values: unknown[]) {
  const { Client } = await import("pg");
  const c = new Client({ connectionString: process.env.DATABASE_URL });
  await c.connect();
  try {
    await c.query("set session_replication_role = replica");
    await c.query(text, values);
  } finally {
    await c.end();
  }
}

test("designer submits, reviewer threads and sends back, designer answers live, approve, issue — with every e-mail", async ({ browser }) => {
  test.setTimeout(240_000);
  const name = `Review cycle ${Date.now()}`;
  const [s] = await sql<{ id: string }>(`insert into schematics (project_id, name, kind, owner_id, draft, updated_by)
    select project_id, $1, 'team', owner_id, draft, updated_by from schematics where project_id = $2 and name = 'Bypass only' returning id`, [name, ORCHARD_END]);
  const id = s!.id;
  const [rev1] = await sql<{ id: string }>(`insert into schematic_revisions (schematic_id, number, document, status, message, author_id)
    select $1, 1, draft, 'draft', 'Bypass only, for review', 'demo-designer' from schematics where id = $1 returning id`, [id]);
  const board = `/projects/${ORCHARD_END}/schematics/${id}`;
  const subject = (words: string) => (m: { subject: string }) => m.subject.includes(name) && m.subject.includes(words);

  const dCtx = await browser.newContext({ viewport: { width: 1366, height: 768 } });
  const rCtx = await browser.newContext({ viewport: { width: 1366, height: 768 } });
  const designer = await dCtx.newPage();
  const reviewer = await rCtx.newPage();
  try {
    await signInAs(designer, "designer");
    await designer.goto(board);
    await expect(designer.getByTestId("presence")).toHaveAttribute("data-state", "live");
    await expect(statusOf(designer)).toContainText("Draft");

    // 1. the designer submits; the reviewer is told by e-mail, and its link opens the revision
    await designer.getByTestId("move-in-review").click();
    await expect(statusOf(designer)).toContainText("In review");
    const submitted = await caughtMail(subject("is ready for review"), "reviewer@fernbank.example");
    const toRevision = linkInMail(submitted.text);
    expect(toRevision).toContain(`${board}?rev=${rev1!.id}`);
    await signInAs(reviewer, "reviewer");
    await reviewer.goto(toRevision);
    await expect(reviewer.getByTestId("viewing-banner")).toContainText("Rev 1");
    await expect(reviewer.getByTestId("viewing-banner")).toContainText("In review");
    // each sees the other looking
    // (from when the reviewer's board is live, i.e. connected)
    await expect(reviewer.getByTestId("presence")).toHaveAttribute("data-state", "live");
    await expect(designer.getByTestId("presence-person")).toHaveText("TV", { timeout: LIVE_MS });
    await expect(reviewer.getByTestId("presence-person")).toHaveText("IP");

    // 2. the reviewer pins a thread to pipe z1-f0, mentioning the designer picked from the list
    await clickPipe(reviewer, "z1-f0");
    await reviewer.getByTestId("new-thread").click();
    await expect(reviewer.getByTestId("new-thread-form")).toContainText("pipe z1-f0");
    const box = reviewer.getByTestId("thread-composer").getByRole("textbox");
    await box.pressSequentially("Zone 1 first leg runs at the velocity limit. @Imo");
    await expect(reviewer.getByTestId("mention-picker")).toContainText("@Imogen Pryce");
    await box.press("Enter");
    await box.pressSequentially("could it go up a size? Notes: https://example.test/velocity <b>not bold</b>");
    await reviewer.getByRole("button", { name: "Start thread" }).click();
    const view = reviewer.getByTestId("thread-view");
    await expect(view).toContainText("@Imogen Pryce could it go up a size?");
    // shown as text: the tag is visible as typed, the address is a safe link
    await expect(view.getByTestId("message-text")).toContainText("<b>not bold</b>");
    await expect(view.locator("b")).toHaveCount(0);
    await expect(view.getByRole("link", { name: "https://example.test/velocity" })).toHaveAttribute("rel", /noopener/);
    const marker = reviewer.locator('[data-testid=thread-marker][data-anchor="pipe:z1-f0"]');
    await expect(marker).toHaveAttribute("data-open", "1");
    await expect(marker).toContainText("#1");

    // the designer sees it without reloading: in the list and on the drawing
    await expect(designer.getByTestId("thread-row")).toHaveCount(1, { timeout: LIVE_MS });
    await expect(designer.locator('[data-testid=thread-marker][data-anchor="pipe:z1-f0"]')).toBeVisible();

    // 3. send back: a reason is required, and it becomes a thread
    await reviewer.getByTestId("move-draft").click();
    const dialog = reviewer.getByTestId("send-back-dialog");
    await dialog.getByRole("button", { name: "Send back" }).click();
    await expect(dialog.getByRole("alert")).toContainText("Say why");
    await dialog.getByLabel("Why").fill("Bypass setting and zone 1 velocity: see thread #1.");
    await dialog.getByRole("button", { name: "Send back" }).click();
    await expect(dialog).toBeHidden();
    await expect(statusOf(designer)).toContainText("Draft", { timeout: LIVE_MS });
    await expect(designer.getByTestId("thread-row")).toHaveCount(2, { timeout: LIVE_MS });
    await expect(designer.getByTestId("thread-row").first()).toContainText("sent back");

    // 4. the designer opens the thread from the mention e-mail, replies and resolves
    const mention = await caughtMail(subject("mentioned you in thread #1"), "designer@fernbank.example");
    const toThread = linkInMail(mention.text);
    const threadId = new URL(toThread).searchParams.get("thread")!;
    await designer.goto(toThread);
    await expect(designer.getByTestId("thread-view")).toHaveAttribute("data-thread", threadId);
    await expect(designer.getByTestId("thread-view")).toContainText("pipe z1-f0");
    await designer.getByTestId("reply-composer").getByRole("textbox").fill("Upsized to 28 in the next revision; velocity now 0.6 m/s.");
    await designer.getByRole("button", { name: "Reply" }).click();
    await expect(reviewer.getByTestId("thread-view")).toContainText("Upsized to 28", { timeout: LIVE_MS });
    await designer.getByTestId("resolve-thread").click();
    await expect(designer.getByTestId("resolve-thread")).toHaveText("Reopen");
    await expect(reviewer.getByTestId("thread-view")).toContainText("Resolved by Imogen Pryce", { timeout: LIVE_MS });
    await expect(reviewer.locator('[data-testid=thread-marker][data-anchor="pipe:z1-f0"]')).toHaveAttribute("data-open", "0");

    const sentBack = await caughtMail(subject("was sent back"), "designer@fernbank.example");
    expect(sentBack.text).toContain("Bypass setting and zone 1 velocity");
    const backThread = new URL(linkInMail(sentBack.text)).searchParams.get("thread")!;
    await designer.goto(linkInMail(sentBack.text));
    await expect(designer.getByTestId("thread-view")).toHaveAttribute("data-thread", backThread);
    await expect(designer.getByTestId("thread-view")).toContainText("sent back");
    await designer.setViewportSize({ width: 1366, height: 768 });
    await designer.screenshot({ path: `${shots}/review-designer-thread.png` });
    // on a phone the threads are a sheet from the bottom, opened from the canvas
    await designer.setViewportSize({ width: 390, height: 844 });
    const sheet = designer.getByTestId("review-sheet");
    await expect(designer.getByTestId("phone-threads").or(sheet)).toBeVisible();
    if (!(await sheet.isVisible())) await designer.getByTestId("phone-threads").click();
    await expect(sheet).toContainText("Bypass setting and zone 1 velocity");
    await designer.screenshot({ path: `${shots}/review-designer-phone.png` });
    await designer.getByTestId("close-sheet").click();
    await designer.setViewportSize({ width: 1366, height: 768 });

    // 5. Rev 2 saved and submitted; the reviewer sees it live and approves; the designer issues
    await designer.getByRole("button", { name: "Save revision" }).click();
    await designer.getByLabel("What changed").fill("Answers the review: see threads #1 and #2");
    await designer.getByTestId("save-revision-dialog").getByRole("button", { name: "Save revision" }).click();
    await expect(statusOf(designer)).toContainText("Rev 2");
    await designer.getByTestId("move-in-review").click();
    await expect(statusOf(reviewer)).toContainText("Rev 2", { timeout: LIVE_MS });
    await expect(statusOf(reviewer)).toContainText("In review");
    await reviewer.getByTestId("move-approved").click();
    await expect(statusOf(designer)).toContainText("Approved", { timeout: LIVE_MS });
    await designer.getByTestId("move-issued").click();
    await expect(statusOf(reviewer)).toContainText("Issued", { timeout: LIVE_MS });

    const approved = await caughtMail(subject("Rev 2 of"), "designer@fernbank.example", (m) => m.subject.includes("was approved"));
    await designer.goto(linkInMail(approved.text));
    await expect(designer.getByTestId("viewing-banner")).toContainText("Rev 2");
    const issued = await caughtMail(subject("was issued"), "reviewer@fernbank.example");
    await reviewer.goto(linkInMail(issued.text));
    await expect(reviewer.getByTestId("viewing-banner")).toContainText("Issued");
    await caughtMail(subject("was issued"), "installer@fernbank.example");

    // the history tells it all
    await reviewer.getByTestId("review-tab-history").click();
    const history = reviewer.getByTestId("history-entry");
    await expect(history).toHaveCount(2);
    await expect(history.first()).toContainText("approved by Tobias Venn");
    await expect(history.last()).toContainText("sent back by Tobias Venn");
    await expect(history.last()).toContainText("Bypass setting and zone 1 velocity");
    await reviewer.screenshot({ path: `${shots}/review-reviewer-history.png` });
  } finally {
    await dCtx.close();
    await rCtx.close();
    await removeSchematics(id);
  }
});

test("a board whose live connection drops reconnects by itself and catches up on what it missed", async ({ browser }) => {
  test.setTimeout(120_000);
  const name = `Reconnect ${Date.now()}`;
  const [s] = await sql<{ id: string }>(`insert into schematics (project_id, name, kind, owner_id, draft, updated_by)
    select project_id, $1, 'team', owner_id, draft, updated_by from schematics where project_id = $2 and name = 'Bypass only' returning id`, [name, ORCHARD_END]);
  const id = s!.id;
  await sql(`insert into schematic_revisions (schematic_id, number, document, status, author_id) select $1, 1, draft, 'in-review', 'demo-designer' from schematics where id = $1`, [id]);
  const ctx = await browser.newContext({ viewport: { width: 1366, height: 768 } });
  const page = await ctx.newPage();
  try {
    await signInAs(page, "designer");
    await page.goto(`/projects/${ORCHARD_END}/schematics/${id}`);
    const presence = page.getByTestId("presence");
    await expect(presence).toHaveAttribute("data-state", "live");
    // a thread written without announcing it (triggers off on this one connection): no board hears of it
    await unannounced(`with t as (insert into review_threads (schematic_id, revision_id, number, anchor_kind, anchor_id, created_by)
      select $1, id, 1, 'part', 'bp', 'demo-reviewer' from schematic_revisions where schematic_id = $1 returning id)
      insert into thread_messages (thread_id, author_id, body) select id, 'demo-reviewer', 'Written while you were away' from t`, [id]);
    await page.waitForTimeout(500);
    await expect(page.getByTestId("thread-row")).toHaveCount(0);
    // the server's LISTEN connection drops: its streams end, the browser reconnects after `retry` and catches up
    await sql("select pg_terminate_backend(pid) from pg_stat_activity where datname = current_database() and query ilike 'LISTEN%'");
    await expect(presence).toHaveAttribute("data-state", "reconnecting");
    await expect(presence).toHaveAttribute("data-state", "live", { timeout: 10_000 });
    await expect(page.getByTestId("thread-row")).toContainText("Written while you were away");
    await expect(page.locator('[data-testid=thread-marker][data-anchor="part:bp"]')).toHaveAttribute("data-open", "1");
  } finally {
    await ctx.close();
    await removeSchematics(id);
  }
});
