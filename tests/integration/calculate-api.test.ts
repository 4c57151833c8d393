import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { lucia } from "@/lib/auth/lucia";
import { POST } from "@/app/api/v1/calculate/route";
import { GET, PUT } from "@/app/api/v1/schematics/[schematicId]/route";
import { createSchematic } from "@/db/queries/schematics";
import { db } from "@/lib/db";
import { parseSchematic } from "@/lib/schematic";

// The route handlers called directly with real Requests (no server), on the seeded test database.
const doc = JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data/orchard-end-bypass-only.json"), "utf8"));
let cookie = "";
beforeAll(async () => { cookie = `lw_session=${(await lucia().createSession("demo-designer", {})).id}`; });
afterAll(async () => { await db()("schematics").where("name", "like", "api-%").del(); });

// as the app's own pages send them: JSON, from the app's origin
const json = { "content-type": "application/json", origin: "http://test" };
const post = (body: string, withCookie = true) =>
  POST(new Request("http://test/api/v1/calculate", { method: "POST", body, headers: withCookie ? { ...json, cookie } : json }), undefined as never);

describe("POST /api/v1/calculate", () => {
  it("answers 200 with results, findings included", async () => {
    const res = await post(JSON.stringify(doc));
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.ok).toBe(true);
    expect(body.findings.length).toBeGreaterThan(0);
  });
  it("answers 400 naming JSON paths for an invalid schematic, and for bad JSON", async () => {
    const bad = { ...doc, parts: [{ ...doc.parts[0], type: "kettle" }, ...doc.parts.slice(1)] };
    const res = await post(JSON.stringify(bad));
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.issues[0].path).toBe("parts[0].type");
    expect((await post("{not json")).status).toBe(400);
  });
  it("answers 413 above 2 MB and 401 when signed out", async () => {
    expect((await post(JSON.stringify({ pad: "x".repeat(2 * 1024 * 1024 + 10) }))).status).toBe(413);
    expect((await post(JSON.stringify(doc), false)).status).toBe(401);
  });
});

describe("/api/v1/schematics/:id", () => {
  it("GETs the draft and revisions, PUTs with the lock version and answers 409 with the current one", async () => {
    const parsed = parseSchematic(doc);
    if (!parsed.ok) throw new Error("seed invalid");
    const made = await createSchematic({ projectId: "6a0f3c1e-0000-4000-8000-000000000102", name: `api-${Date.now()}`, doc: parsed.doc, userId: "demo-designer", kind: "team" });
    if (!made.ok) throw new Error(made.reason);
    const id = made.schematic.id;
    const ctx = { params: Promise.resolve({ schematicId: id }) };
    const got = await GET(new Request(`http://test/api/v1/schematics/${id}`, { headers: { cookie } }), ctx);
    expect(got.status).toBe(200);
    expect(await got.json()).toMatchObject({ schematic: { id, lockVersion: 1 }, revisions: [], readOnly: false });
    const put = (lockVersion: number) => PUT(new Request(`http://test/api/v1/schematics/${id}`,
      { method: "PUT", headers: { ...json, cookie }, body: JSON.stringify({ lockVersion, doc: parsed.doc }) }), ctx);
    expect((await put(1)).status).toBe(200);
    const conflict = await put(1);
    expect(conflict.status).toBe(409);
    expect(await conflict.json()).toMatchObject({ currentLockVersion: 2, error: expect.stringMatching(/Someone else saved/) });
  });
});
