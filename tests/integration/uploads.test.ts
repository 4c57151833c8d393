import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { pgPool } from "@/lib/auth/pg-pool";
import { objectSize } from "@/lib/storage/s3";
import { callRoute, cookieFor } from "./helpers/call";
import { dropFixtures, makeFixture, type Fixture } from "./helpers/fixture";

// Photos and documents through the real S3 SDK against the local fake S3 (s3rver, started by
// npm test): presigned PUT, then the server's check of the stored bytes (file-type) and size,
// a sharp thumbnail, and the refusals — each deleting what failed and saying why.

const uploads = () => import("@/app/api/v1/projects/[projectId]/uploads/route");
const complete = () => import("@/app/api/v1/uploads/[uploadId]/complete/route");
const attachments = () => import("@/app/api/v1/projects/[projectId]/attachments/route");
const thumbnail = () => import("@/app/api/v1/uploads/[uploadId]/thumbnail/route");

let f: Fixture;
let installer: string;
const MB = 1024 * 1024;

async function create(body: Record<string, unknown>, cookie = installer) {
  return callRoute((await uploads()).POST as never, { method: "POST", path: `/api/v1/projects/${f.projectId}/uploads`, cookie, params: { projectId: f.projectId }, body });
}
async function finish(uploadId: string, cookie = installer) {
  return callRoute((await complete()).POST as never, { method: "POST", path: `/api/v1/uploads/${uploadId}/complete`, cookie, params: { uploadId } });
}
async function put(url: string, bytes: Uint8Array, type: string) {
  const res = await fetch(url, { method: "PUT", body: Buffer.from(bytes), headers: { "content-type": type } });
  expect(res.status, await res.clone().text()).toBe(200);
}
const storedKey = async (id: string) => (await db()("attachments").where({ id }).first("storage_key")).storage_key as string;

let jpeg: Uint8Array;
beforeAll(async () => {
  f = await makeFixture({ revisionStatus: "issued" });
  installer = (await cookieFor("installer"))!;
  jpeg = new Uint8Array(await sharp({ create: { width: 1200, height: 800, channels: 3, background: { r: 180, g: 99, b: 43 } } }).jpeg().toBuffer());
});
afterAll(async () => {
  await dropFixtures();
  await db().destroy();
  await pgPool().end();
});

describe("uploads", () => {
  it("a photo of a pipe: presigned PUT to the fake S3, checked, thumbnailed and listed", async () => {
    const c = await create({ filename: "pri-f1 joint.jpg", contentType: "image/jpeg", size: jpeg.byteLength, target: { schematicId: f.teamSchematicId, id: "pri-f1" } });
    expect(c.status).toBe(201);
    expect(c.body.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/loopwright-uploads\/projects\//);
    await put(c.body.url, jpeg, "image/jpeg");
    const done = await finish(c.body.uploadId);
    expect(done.status).toBe(200);
    expect(done.body.attachment).toMatchObject({ contentType: "image/jpeg", sizeBytes: jpeg.byteLength, target: { id: "pri-f1" }, uploadedBy: { name: "Callum Ash" } });
    expect(await objectSize(await storedKey(c.body.uploadId))).toBe(jpeg.byteLength);

    const list = await callRoute((await attachments()).GET as never, { path: "", cookie: await cookieFor("reviewer"), params: { projectId: f.projectId } });
    const listed = list.body.attachments.find((a: { id: string }) => a.id === c.body.uploadId);
    expect(listed.thumbnailUrl).toBe(`/api/v1/uploads/${c.body.uploadId}/thumbnail`);
    const th = await thumbnail();
    const res = await th.GET(new Request(`http://test.local${listed.thumbnailUrl}`, { headers: { cookie: installer } }), { params: Promise.resolve({ uploadId: c.body.uploadId }) });
    expect(res.headers.get("content-type")).toBe("image/webp");
    const meta = await sharp(Buffer.from(await res.arrayBuffer())).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(["webp", 320, 213]); // 1200×800 fitted inside 320 px

    // sent again (a phone resending after a lost answer): the same upload, already listed, no new URL
    const again = await create({ id: c.body.uploadId, filename: "pri-f1 joint.jpg", contentType: "image/jpeg", size: jpeg.byteLength });
    expect(again.body).toMatchObject({ uploadId: c.body.uploadId, url: null, status: "listed" });
  });

  it("refuses a renamed executable from its bytes, deletes it and says why", async () => {
    const elf = new Uint8Array(8192);
    elf.set([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]);
    const c = await create({ filename: "boiler-photo.jpg", contentType: "image/jpeg", size: elf.byteLength });
    await put(c.body.url, elf, "image/jpeg");
    const done = await finish(c.body.uploadId);
    expect(done.status).toBe(415);
    expect(done.body.error).toMatch(/"boiler-photo\.jpg" is not a photo or a PDF: its bytes are application\/x-elf .*It was deleted\./);
    expect(await objectSize(await storedKey(c.body.uploadId))).toBeNull();
    const row = await db()("attachments").where({ id: c.body.uploadId }).first("status", "refused_reason");
    expect(row.status).toBe("refused");
  });

  it("refuses 50 MB before any upload, and a photo whose stored bytes exceed 15 MB after it", async () => {
    const big = await create({ filename: "site.jpg", contentType: "image/jpeg", size: 50 * MB });
    expect(big.status).toBe(413);
    expect(big.body.error).toMatch(/50\.0 MB is over the limit; photos .* up to 15 MB and PDF documents up to 25 MB/);

    // declared as a 20 MB PDF (allowed), but the bytes are a photo: a photo may be at most 15 MB
    const padded = new Uint8Array(20 * MB);
    padded.set(jpeg);
    const c = await create({ filename: "scan.pdf", contentType: "application/pdf", size: padded.byteLength });
    await put(c.body.url, padded, "application/pdf");
    const done = await finish(c.body.uploadId);
    expect(done.status).toBe(413);
    expect(done.body.error).toMatch(/is 20\.0 MB; a photo may be at most 15\.0 MB/);
    expect(await objectSize(await storedKey(c.body.uploadId))).toBeNull();
  });

  it("refuses a photo for a schematic the caller cannot read, a part that is not there, and types other than photos and PDF", async () => {
    const practice = await create({ filename: "a.jpg", contentType: "image/jpeg", size: 10, target: { schematicId: f.practiceSchematicId } });
    expect(practice.status).toBe(404); // an installer is not told a trainee's practice variant exists
    const other = await makeFixture({ revisionStatus: "issued" });
    const elsewhere = await create({ filename: "a.jpg", contentType: "image/jpeg", size: 10, target: { schematicId: other.teamSchematicId } });
    expect(elsewhere.status).toBe(404);
    const ghost = await create({ filename: "a.jpg", contentType: "image/jpeg", size: 10, target: { schematicId: f.teamSchematicId, id: "no-such-part" } });
    expect(ghost).toMatchObject({ status: 400, body: { error: expect.stringMatching(/^target\.id: no pipe or part "no-such-part"/) } });
    const exe = await create({ filename: "setup.exe", contentType: "application/x-msdownload", size: 10 });
    expect(exe.status).toBe(415);
    const n = await db()("attachments").where({ project_id: f.projectId, status: "pending" }).count("* as n");
    expect(Number(n[0]!.n)).toBe(0); // none of these left a pending upload behind
  });

  it("completing before the PUT says so and keeps the upload pending; others cannot complete it", async () => {
    const c = await create({ filename: "later.jpg", contentType: "image/jpeg", size: jpeg.byteLength });
    const early = await finish(c.body.uploadId);
    expect(early).toMatchObject({ status: 409, body: { error: expect.stringMatching(/Nothing has been uploaded/) } });
    const reviewer = await finish(c.body.uploadId, (await cookieFor("reviewer"))!);
    expect(reviewer.status).toBe(403);
    await put(c.body.url, jpeg, "image/jpeg");
    expect((await finish(c.body.uploadId)).status).toBe(200);
  });
});

