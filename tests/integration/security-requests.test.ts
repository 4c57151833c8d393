import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { pgPool } from "@/lib/auth/pg-pool";
import { apiHandler } from "@/lib/auth/authorize";
import { readText } from "@/lib/http/body";
import { BODY_LIMIT_BYTES, JSON_MAX_DEPTH } from "@/lib/http/limits.mjs";
import { listProjectSchematics } from "@/db/queries/schematics";
import * as board from "@/components/drawing-board/actions";
import * as session from "@/app/api/v1/session/route";
import * as projects from "@/app/api/v1/projects/route";
import * as projectItem from "@/app/api/v1/projects/[projectId]/route";
import * as schematic from "@/app/api/v1/schematics/[schematicId]/route";
import { callAction, callRoute, cookieFor, TEST_ORIGIN } from "./helpers/call";
import { demoFirm } from "@/db/seeds/demo/people";
import { dropFixtures, FIXTURE_PREFIX, makeFixture } from "./helpers/fixture";

// Issue 17, request side: a regression test per defect the probe found (items 6–8, 10–13,
// and who may create projects or size without a schematic), through the real route
// handlers and actions against PostgreSQL. Each was written to fail on the code before the fix.

const uniq = () => randomUUID().slice(0, 8);
const projectName = (tag: string) => `${FIXTURE_PREFIX} ${tag} ${uniq()}`;

beforeAll(() => { expect(process.env.DATABASE_URL ?? "").toMatch(/_test$/); });
afterAll(async () => {
  await dropFixtures();
  await db().destroy();
  await pgPool().end();
});

async function projectCount(name: string): Promise<number> {
  const row = await db()("projects").whereRaw("lower(name) = lower(?)", [name]).count<{ n: string }[]>("* as n").first();
  return Number(row!.n);
}

/** A body of `bytes` bytes that counts how much of it was ever read. */
function countedBody(bytes: number) {
  const chunk = new Uint8Array(64 * 1024).fill(0x61);
  let sent = 0;
  const stream = new ReadableStream<Uint8Array>({
    pull(c) {
      if (sent >= bytes) return c.close();
      sent += chunk.byteLength;
      c.enqueue(chunk);
    },
  });
  return { stream, read: () => sent };
}

async function postStream(handler: (req: Request, ctx: never) => Promise<Response>, path: string, bytes: number, cookie: string | null) {
  const body = countedBody(bytes);
  const headers: Record<string, string> = { "content-type": "application/json", origin: TEST_ORIGIN };
  if (cookie) headers.cookie = cookie;
  const req = new Request(`${TEST_ORIGIN}${path}`, { method: "POST", headers, body: body.stream, duplex: "half" } as RequestInit);
  const res = await handler(req, { params: Promise.resolve({}) } as never);
  return { status: res.status, body: await res.json(), read: body.read() };
}

describe("item 7: state-changing routes take only same-origin JSON", () => {
  it("POST /api/v1/projects from another site's Origin is refused and creates nothing", async () => {
    const name = projectName("foreign");
    const out = await callRoute(projects.POST as never, { method: "POST", path: "/api/v1/projects", cookie: await cookieFor("owner"), origin: "http://evil.example", body: { name } });
    expect(out.status).toBe(403);
    expect(out.body.error).toMatch(/came from another site \(http:\/\/evil\.example\)/);
    expect(await projectCount(name)).toBe(0);
  });

  it("a session cookie without an Origin is refused; a cookie-less client without one is not", async () => {
    const name = projectName("no-origin");
    const out = await callRoute(projects.POST as never, { method: "POST", path: "/api/v1/projects", cookie: await cookieFor("owner"), origin: null, body: { name } });
    expect(out.status).toBe(403);
    expect(out.body.error).toMatch(/no Origin header/);
    expect(await projectCount(name)).toBe(0);
    const anon = await callRoute(projects.POST as never, { method: "POST", path: "/api/v1/projects", cookie: null, origin: null, body: { name } });
    expect(anon.status).toBe(401); // reached the handler, which wants a session
  });

  it("a text/plain or form body (what a cross-site form can send) is 415; sign-in sets no cookie", async () => {
    const login = await callRoute(session.POST as never, { method: "POST", path: "/api/v1/session", cookie: null, origin: null, contentType: "text/plain",
      rawBody: JSON.stringify({ email: "owner@fernbank.example", password: "copper-loop-owner" }) });
    expect(login.status).toBe(415);
    expect(login.body.error).toBe("POST /api/v1/session takes a body of type application/json; this request sent text/plain.");
    expect(login.setCookies).toEqual([]);
    const name = projectName("form");
    const form = await callRoute(projects.POST as never, { method: "POST", path: "/api/v1/projects", cookie: await cookieFor("owner"), contentType: "application/x-www-form-urlencoded", rawBody: `name=${name}` });
    expect(form.status).toBe(415);
    expect(await projectCount(name)).toBe(0);
  });

  it("a route can declare another body type and read it through the same limit", async () => {
    const csv = apiHandler(async (req) => Response.json({ text: await readText(req) }), { accepts: ["text/csv"] });
    const ok = await callRoute(csv as never, { method: "POST", path: "/x", cookie: null, contentType: "text/csv", rawBody: "room,load\nhall,4200\n" });
    expect(ok.status).toBe(200);
    expect(ok.body.text).toBe("room,load\nhall,4200\n");
    const json = await callRoute(csv as never, { method: "POST", path: "/x", cookie: null, body: { a: 1 } });
    expect(json.status).toBe(415);
    expect(json.body.error).toMatch(/takes a body of type text\/csv; this request sent application\/json/);
  });
});

describe("item 8: bad input is a 4xx with a message, never a 500", () => {
  it("JSON nested thousands of levels deep is refused when the body is read (PUT), and nothing is saved", async () => {
    const f = await makeFixture();
    const deep = `${"{\"a\":".repeat(6000)}1${"}".repeat(6000)}`;
    const doc = JSON.stringify(f.doc).replace(/}$/, `,"extra":${deep}}`); // a valid schematic with one deep extra field
    const before = await db()("schematics").where({ id: f.teamSchematicId }).first("lock_version");
    const out = await callRoute(schematic.PUT as never, { method: "PUT", path: `/api/v1/schematics/${f.teamSchematicId}`, cookie: await cookieFor("designer"),
      params: { schematicId: f.teamSchematicId }, rawBody: `{"lockVersion":${f.lockVersion},"doc":${doc}}` });
    expect(out.status).toBe(400);
    expect(out.body.error).toBe(`The request body nests arrays and objects more than ${JSON_MAX_DEPTH} levels deep.`);
    expect(await db()("schematics").where({ id: f.teamSchematicId }).first("lock_version")).toEqual(before);
  });

  it("two simultaneous creations of one name, even in different case: the one that loses the race is a 409, not a 500", async () => {
    for (const variant of [(n: string) => n, (n: string) => n.toUpperCase()]) {
      const name = projectName("race");
      // the other creation holds its new row uncommitted, so this one's name check passes and its insert waits on the index
      const other = await db().transaction();
      await other("projects").insert({ organisation_id: demoFirm.id, name, created_by: "demo-owner" });
      const mine = callRoute(projects.POST as never, { method: "POST", path: "/api/v1/projects", cookie: await cookieFor("owner"), body: { name: variant(name) } });
      await new Promise((r) => setTimeout(r, 500));
      await other.commit();
      const out = await mine;
      expect(out.status, JSON.stringify(out.body)).toBe(409);
      expect(out.body.error).toMatch(/already has a project called/);
      expect(await projectCount(name)).toBe(1);
    }
  });

  it("the database itself refuses two project names in one firm that differ only in case", async () => {
    const name = projectName("case");
    await db()("projects").insert({ organisation_id: demoFirm.id, name, created_by: "demo-owner" });
    await expect(db()("projects").insert({ organisation_id: demoFirm.id, name: name.toLowerCase(), created_by: "demo-owner" })).rejects.toThrow(/unique/);
  });
});

describe("item 10: every route reads its body through one bounded reader", () => {
  it.each([
    ["POST /api/v1/session", session.POST, "/api/v1/session", false],
    ["POST /api/v1/projects", projects.POST, "/api/v1/projects", true],
  ] as const)("%s: a 100 MB body is refused with 413 after reading at most the limit", async (_name, handler, path, signedIn) => {
    const out = await postStream(handler as never, path, 100 * 1024 * 1024, signedIn ? await cookieFor("owner") : null);
    expect(out.status).toBe(413);
    expect(out.body.error).toBe("The request body is larger than the 2 MB limit.");
    expect(out.read).toBeLessThanOrEqual(BODY_LIMIT_BYTES + 128 * 1024);
  });
});

describe("item 11: a revision's status is not told to callers who may not see it", () => {
  it("signed out → 401, a non-member → 404, and the message never names the status", async () => {
    const f = await makeFixture({ revisionStatus: "issued" });
    const anon = await callAction(() => board.setRevisionStatus({ revisionId: f.revisionId, status: "draft" }), null);
    expect(anon.status).toBe(401);
    expect(anon.body.error).not.toMatch(/issued/);
    await db()("project_members").where({ project_id: f.projectId, user_id: "demo-reviewer" }).delete();
    const outsider = await callAction(() => board.setRevisionStatus({ revisionId: f.revisionId, status: "draft" }), await cookieFor("reviewer"));
    expect(outsider.status).toBe(404);
    expect(outsider.body.error).not.toMatch(/issued/);
  });

  it("an installer learns nothing of a revision that is not issued", async () => {
    const f = await makeFixture({ revisionStatus: "issued" });
    const [draft] = await db()("schematic_revisions").insert({ schematic_id: f.teamSchematicId, number: 2, document: f.doc, status: "in-review", author_id: "demo-designer" }).returning("id");
    const out = await callAction(() => board.setRevisionStatus({ revisionId: draft.id, status: "approved" }), await cookieFor("installer"));
    expect(out.status).toBe(404);
    expect(out.body.error).not.toMatch(/review/);
  });
});

describe("item 12: installers' project list shows only issued revisions", () => {
  it("hides unissued revisions, their messages and schematics with none issued", async () => {
    const f = await makeFixture({ revisionStatus: "issued" });
    await db()("schematic_revisions").insert({ schematic_id: f.teamSchematicId, number: 2, document: f.doc, status: "in-review", message: "secret rework", author_id: "demo-designer" });
    const [other] = await db()("schematics").insert({ project_id: f.projectId, name: "Unissued", kind: "team", owner_id: "demo-designer", draft: f.doc }).returning("id");
    await db()("schematic_revisions").insert({ schematic_id: other.id, number: 1, document: f.doc, status: "draft", message: "early idea", author_id: "demo-designer" });
    const installer = await listProjectSchematics(f.projectId, "demo-installer", "installer");
    expect(installer.map((s) => s.id)).toEqual([f.teamSchematicId]);
    expect(installer[0]!.revisions.map((r) => r.status)).toEqual(["issued"]);
    expect(installer[0]!.latest?.status).toBe("issued");
    expect(JSON.stringify(installer)).not.toMatch(/secret rework|early idea/);
    const designer = await listProjectSchematics(f.projectId, "demo-designer", "designer");
    expect(designer.find((s) => s.id === f.teamSchematicId)!.revisions.map((r) => r.status)).toEqual(["in-review", "issued"]);
  });
});

describe("item 13: a project with issued revisions is archived, not deleted", () => {
  it("DELETE answers 200 with why; the project and its issued revision stay; it is listed as archived", async () => {
    const f = await makeFixture({ revisionStatus: "issued" });
    const owner = await cookieFor("owner");
    const out = await callRoute(projectItem.DELETE as never, { method: "DELETE", path: `/api/v1/projects/${f.projectId}`, cookie: owner, params: { projectId: f.projectId } });
    expect(out.status).toBe(200);
    expect(out.body).toEqual({ archived: true, message: expect.stringMatching(/has 1 issued revision, which are kept as the record of what was built, so the project was archived instead of deleted/) });
    expect((await db()("projects").where({ id: f.projectId }).first()).archived_at).not.toBeNull();
    expect(await db()("schematic_revisions").where({ id: f.revisionId }).first()).toBeTruthy();
    const list = await callRoute(projects.GET as never, { path: "/api/v1/projects", cookie: owner });
    expect(list.body.projects.find((p: { id: string }) => p.id === f.projectId).archivedAt).toEqual(expect.any(String));
    expect(await db()("audit_log").where({ action: "project.archived", project_id: f.projectId }).first()).toBeTruthy();
  });

  it("a project without issued revisions is still deleted (204)", async () => {
    const f = await makeFixture({ revisionStatus: "approved" });
    const out = await callRoute(projectItem.DELETE as never, { method: "DELETE", path: `/api/v1/projects/${f.projectId}`, cookie: await cookieFor("owner"), params: { projectId: f.projectId } });
    expect(out.status).toBe(204);
    expect(await db()("projects").where({ id: f.projectId }).first()).toBeUndefined();
  });
});

describe("who may create projects and size without a schematic", () => {
  it.each(["reviewer", "installer", "trainee"] as const)("a firm member who is only %s on its projects cannot create one", async (who) => {
    const name = projectName(`by-${who}`);
    const out = await callRoute(projects.POST as never, { method: "POST", path: "/api/v1/projects", cookie: await cookieFor(who), body: { name } });
    expect(out.status).toBe(403);
    expect(out.body.error).toMatch(/Only your firm's owners, and people who are an owner or designer on one of its projects, can create projects/);
    expect(await projectCount(name)).toBe(0);
  });

  it.each(["reviewer", "installer"] as const)("a %s cannot size a document that belongs to no schematic", async (who) => {
    const f = await makeFixture();
    const out = await callAction(() => board.sizeSchematic({ doc: f.doc }), await cookieFor(who));
    expect(out.status).toBe(403);
    expect(out.body.error).toMatch(/Only a project owner, designer or trainee can run sizing/);
  });
});
