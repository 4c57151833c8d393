import { HeadObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { expect, test } from "@playwright/test";
import sharp from "sharp";
import { MILLBROOK, shots, signInAs, sql } from "./helpers/board";

// The installer on a phone (360 px) in a plant room with no signal: opens the site sheet,
// loses the network, ticks three pipes, logs a pressure test and takes a photo, opens the
// page again with no network (service worker + IndexedDB), comes back online and sees it
// all sent; the server holds each event once, the photo is in the fake S3 with its thumbnail.

test.use({ viewport: { width: 360, height: 760 }, isMobile: true, hasTouch: true, deviceScaleFactor: 2 });

let schematicId = "";
test.beforeAll(async () => {
  const name = `Site e2e ${Date.now()}`;
  const [s] = await sql<{ id: string }>(
    `insert into schematics (project_id, name, kind, owner_id, draft, updated_by)
     select project_id, $1, 'team', owner_id, draft, updated_by from schematics where project_id = $2 and name = 'Plant room' returning id`, [name, MILLBROOK]);
  schematicId = s!.id;
  await sql(`insert into schematic_revisions (schematic_id, number, document, status, message, author_id)
    select $1, 1, r.document, 'issued', 'Issued for site', 'demo-designer' from schematic_revisions r
    join schematics s on s.id = r.schematic_id where s.project_id = $2 and s.name = 'Plant room' and r.status = 'issued' limit 1`, [schematicId, MILLBROOK]);
});

async function jpeg(): Promise<Buffer> {
  return sharp({ create: { width: 1600, height: 1200, channels: 3, background: { r: 90, g: 120, b: 160 } } }).jpeg({ quality: 80 }).toBuffer();
}

test("installer works offline and everything is sent once back online", async ({ page, context }) => {
  test.setTimeout(120_000);
  await signInAs(page, "installer");
  const url = `/projects/${MILLBROOK}/schematics/${schematicId}/site`;
  await page.goto(url);
  await expect(page.getByTestId("sync-state")).toHaveText("All sent");
  // the service worker runs the page and has kept it (and its scripts) for later
  await expect(page.locator("html")).toHaveAttribute("data-offline-ready", "true", { timeout: 30_000 });
  await page.screenshot({ path: `${shots}/site-online.png` });

  await context.setOffline(true);
  await expect(page.getByTestId("sync-state")).toHaveText("Offline · 0 waiting");
  for (const id of ["pri-f1", "pri-f2", "pri-f3"]) await page.getByTestId(`tick-${id}`).click();
  await expect(page.getByTestId("sync-state")).toHaveText("Offline · 3 waiting");
  await expect(page.locator("#row-pri-f2")).toContainText("waiting to send");
  await page.screenshot({ path: `${shots}/site-offline-ticks.png` });

  await page.getByRole("tab", { name: "Tests" }).click();
  const form = page.getByTestId("pressure-test-form");
  await form.getByLabel("Test pressure, bar").fill("4.5");
  await expect(page.getByTestId("isolate-list")).toContainText("would lift"); // the 3 bar safety valve
  await form.getByLabel("Start reading, bar").fill("4.5");
  await form.getByLabel("End reading, bar").fill("4.42");
  await form.getByLabel("Ambient at start, °C").fill("11");
  await form.getByLabel("Ambient at end, °C").fill("12");
  await form.getByLabel("Witnessed by").fill("Site supervisor (invented)");
  await expect(page.getByTestId("pressure-preview")).toContainText("PASS");
  await page.screenshot({ path: `${shots}/site-pressure-form.png` });
  await form.getByRole("button", { name: "Log pressure test" }).click();
  await expect(page.getByTestId("sync-state")).toHaveText("Offline · 4 waiting");
  await expect(page.getByTestId("pressure-record").first()).toHaveAttribute("data-state", "waiting");

  await page.getByRole("tab", { name: "Photos" }).click();
  await page.getByTestId("photo-pin").selectOption("pri-f1");
  const chooser = page.waitForEvent("filechooser");
  await page.getByText("Take photo").click();
  await (await chooser).setFiles({ name: "pri-f1-joint.jpg", mimeType: "image/jpeg", buffer: await jpeg() });
  await expect(page.getByTestId("sync-state")).toHaveText("Offline · 5 waiting");
  await expect(page.getByTestId("photo-waiting")).toContainText("waiting to send");
  await page.screenshot({ path: `${shots}/site-offline-photo.png` });

  // the page opens again with no network: the worker's copy, the outbox still on the phone
  const reloadedAt = new Date().toISOString();
  await page.reload();
  await expect(page.getByTestId("sync-state")).toHaveText("Offline · 5 waiting");
  await expect(page.getByTestId("tick-pri-f3")).toHaveAttribute("aria-pressed", "true");
  const servedAt = await page.getByTestId("site-sheet").getAttribute("data-served-at");
  expect(servedAt! < reloadedAt, "the page came from the worker's copy, rendered before the network went").toBe(true);
  await page.screenshot({ path: `${shots}/site-offline-reloaded.png` });

  await context.setOffline(false);
  await page.evaluate(() => window.dispatchEvent(new Event("online")));
  await expect(page.getByTestId("sync-state")).toHaveText("All sent", { timeout: 30_000 });
  await page.getByRole("tab", { name: "Photos" }).click();
  const thumb = page.getByTestId("photo-thumb").first();
  await expect(thumb).toBeVisible();
  await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);
  await page.screenshot({ path: `${shots}/site-photo-listed.png` });

  // the server holds each event once, made by the installer, in the order made
  const events = await sql<{ id: string; kind: string; target: string | null; author_id: string }>(
    "select id, kind, target, author_id from site_events where schematic_id = $1 order by made_at, seq", [schematicId]);
  expect(events.map((e) => [e.kind, e.target])).toEqual([["tick", "pri-f1"], ["tick", "pri-f2"], ["tick", "pri-f3"], ["pressure-test", null]]);
  expect(new Set(events.map((e) => e.id)).size).toBe(4);
  expect(events.every((e) => e.author_id === "demo-installer")).toBe(true);

  // the photo: listed, pinned to pri-f1, in the fake S3 with its thumbnail
  const [photo] = await sql<{ storage_key: string; thumbnail_key: string; target: string }>(
    "select storage_key, thumbnail_key, target from attachments where schematic_id = $1 and status = 'listed'", [schematicId]);
  expect(photo!.target).toBe("pri-f1");
  const s3 = new S3Client({ endpoint: process.env.S3_ENDPOINT, region: "us-east-1", forcePathStyle: true, credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" } });
  for (const Key of [photo!.storage_key, photo!.thumbnail_key]) expect((await s3.send(new HeadObjectCommand({ Bucket: "loopwright-uploads", Key }))).ContentLength).toBeGreaterThan(0);

  // a renamed executable is refused, with the reason, and not listed
  const elf = Buffer.alloc(4096);
  elf.set([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]);
  const chooser2 = page.waitForEvent("filechooser");
  await page.getByText("Pick file").click();
  await (await chooser2).setFiles({ name: "boiler-manual.jpg", mimeType: "image/jpeg", buffer: elf });
  await expect(page.getByTestId("sync-refused")).toHaveText("1 refused", { timeout: 20_000 });
  await expect(page.locator('[data-testid="photo-waiting"][data-state="refused"]')).toContainText("is not a photo or a PDF");
  await page.screenshot({ path: `${shots}/site-refused-executable.png` });
  const refused = await sql<{ status: string; refused_reason: string }>("select status, refused_reason from attachments where file_name = 'boiler-manual.jpg'");
  expect(refused.map((r) => r.status)).toEqual(["refused"]);
});

test("tapping a pipe on the drawing opens its row, and the row leads back to the drawing", async ({ page }) => {
  await signInAs(page, "reviewer");
  await page.goto(`/projects/${MILLBROOK}/schematics/${schematicId}/site`);
  await expect(page.getByTestId("tick-pri-f1")).toBeDisabled(); // reviewers read, they do not record
  await page.getByRole("tab", { name: "Drawing" }).click();
  await page.locator('[data-pipe="z1-rad-h3-f"] [data-hit]').click({ force: true });
  await expect(page.getByRole("tab", { name: "Sheet" })).toHaveAttribute("aria-selected", "true");
  await expect(page.locator("#row-z1-rad-h3-f")).toBeInViewport();
  await page.screenshot({ path: `${shots}/site-jump-to-row.png` });
  await page.locator("#row-z1-rad-h3-f").getByRole("button", { name: "On the drawing" }).click();
  await expect(page.locator('[data-pipe="z1-rad-h3-f"]')).toBeInViewport();
  await page.screenshot({ path: `${shots}/site-drawing.png` });
});
