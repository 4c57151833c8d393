import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { lucia } from "@/lib/auth/lucia";
import { withRequestCookies } from "@/lib/auth/request-context";
import { createSchematic } from "@/db/queries/schematics";
import { parseSchematic, type Schematic } from "@/lib/schematic";
import * as actions from "@/components/drawing-board/actions";
import { saveUnitPreference } from "@/components/units/actions";
import { deleteForTests } from "./helpers/fixture";

// Against the real PostgreSQL of DATABASE_URL (the seeded test database). Each test makes its
// own schematic in the seeded Orchard End project, so tests never depend on each other's rows.

const ORCHARD_END = "6a0f3c1e-0000-4000-8000-000000000102";
const raw = JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data/orchard-end-bypass-only.json"), "utf8"));
const parsed = parseSchematic(raw);
if (!parsed.ok) throw new Error("seed document does not parse");
const seedDoc: Schematic = parsed.doc;

export const cookies = new Map<string, string>();
const as = <T,>(who: string, fn: () => Promise<T>) => withRequestCookies(`lw_session=${cookies.get(who)}`, fn);

beforeAll(async () => {
  for (const who of ["designer", "reviewer", "trainee", "installer", "owner"]) {
    const session = await lucia().createSession(`demo-${who}`, {});
    cookies.set(who, session.id);
  }
});
afterAll(async () => {
  await deleteForTests((trx) => trx("schematics").where("name", "like", "it-%").del()); // some hold issued revisions
  for (const id of cookies.values()) await lucia().invalidateSession(id);
});

let n = 0;
async function freshSchematic(): Promise<string> {
  const r = await createSchematic({ projectId: ORCHARD_END, name: `it-${Date.now()}-${n++}`, doc: seedDoc, userId: "demo-designer", kind: "team" });
  if (!r.ok) throw new Error(r.reason);
  return r.schematic.id;
}
const row = (id: string) => db()("schematics").where({ id }).first();
const withLength = (m: number): Schematic => ({ ...seedDoc, pipes: seedDoc.pipes.map((p, i) => (i === 0 ? { ...p, lengthM: m } : p)) });

describe("draft autosave and the lock version", () => {
  it("saves with the current version, then refuses a stale one with 409 and the current version", async () => {
    const id = await freshSchematic();
    const first = await as("designer", () => actions.autosaveDraft({ schematicId: id, lockVersion: 1, doc: withLength(7) }));
    expect(first).toMatchObject({ ok: true, data: { lockVersion: 2 } });
    const stale = await as("designer", () => actions.autosaveDraft({ schematicId: id, lockVersion: 1, doc: withLength(9) }));
    expect(stale).toMatchObject({ ok: false, status: 409, currentLockVersion: 2 });
    expect(stale.ok ? "" : stale.error).toMatch(/Someone else saved this schematic/);
    expect((await row(id)).draft.pipes[0].lengthM).toBe(7);
  });

  it("rejects a bad document with JSON-path issues and changes nothing", async () => {
    const id = await freshSchematic();
    const bad = { ...seedDoc, pipes: [{ ...seedDoc.pipes[0]!, to: "nowhere.a" }, ...seedDoc.pipes.slice(1)] };
    const r = await as("designer", () => actions.autosaveDraft({ schematicId: id, lockVersion: 1, doc: bad }));
    expect(r).toMatchObject({ ok: false, status: 400 });
    if (r.ok) return;
    expect(r.issues?.[0]?.path).toBe("pipes[0].to");
    expect(r.error).toMatch(/pipes\[0\]\.to/);
    const after = await row(id);
    expect(after.lock_version).toBe(1);
    expect(after.draft.pipes[0].to).toBe(seedDoc.pipes[0]!.to);
    const rev = await as("designer", () => actions.saveRevision({ schematicId: id, lockVersion: 1, doc: { ...seedDoc, version: "x" }, message: "bad" }));
    expect(rev).toMatchObject({ ok: false, status: 400 });
    expect(await db()("schematic_revisions").where({ schematic_id: id }).count("* as c").first()).toMatchObject({ c: "0" });
  });

  it("refuses edits from roles that may not edit, and from anyone signed out", async () => {
    const id = await freshSchematic();
    for (const who of ["reviewer", "trainee", "installer"]) {
      const r = await as(who, () => actions.autosaveDraft({ schematicId: id, lockVersion: 1, doc: seedDoc }));
      expect(r, who).toMatchObject({ ok: false, status: 403 });
    }
    const anon = await withRequestCookies(null, () => actions.autosaveDraft({ schematicId: id, lockVersion: 1, doc: seedDoc }));
    expect(anon).toMatchObject({ ok: false, status: 401 });
  });
});

describe("revisions", () => {
  it("are numbered, immutable documents: a later save leaves earlier ones as they were", async () => {
    const id = await freshSchematic();
    const r1 = await as("designer", () => actions.saveRevision({ schematicId: id, lockVersion: 1, doc: withLength(5), message: "first" }));
    const r2 = await as("designer", () => actions.saveRevision({ schematicId: id, lockVersion: 2, doc: withLength(8), message: "second" }));
    if (!r1.ok || !r2.ok) throw new Error("save failed");
    expect([r1.data.revision.number, r2.data.revision.number]).toEqual([1, 2]);
    const first = await db()("schematic_revisions").where({ id: r1.data.revision.id }).first();
    expect(first.document.pipes[0].lengthM).toBe(5);
    expect(first.message).toBe("first");
    const empty = await as("designer", () => actions.saveRevision({ schematicId: id, lockVersion: 3, doc: seedDoc, message: "  " }));
    expect(empty).toMatchObject({ ok: false, status: 400 });
  });

  it("move draft → in review → approved → issued only for the roles allowed, audited; issued locks the draft", async () => {
    const id = await freshSchematic();
    const saved = await as("designer", () => actions.saveRevision({ schematicId: id, lockVersion: 1, doc: seedDoc, message: "for review" }));
    if (!saved.ok) throw new Error(saved.error);
    const revisionId = saved.data.revision.id;
    const move = (who: string, status: string, reason?: string) => as(who, () => actions.setRevisionStatus({ revisionId, status, reason }));

    expect(await move("trainee", "in-review")).toMatchObject({ ok: false, status: 403 });
    expect(await move("reviewer", "in-review")).toMatchObject({ ok: false, status: 403 });
    expect(await move("designer", "issued")).toMatchObject({ ok: false, status: 409 }); // not approved yet
    expect(await move("designer", "in-review")).toMatchObject({ ok: true, data: { status: "in-review" } });
    expect(await move("designer", "approved")).toMatchObject({ ok: false, status: 403 });
    expect(await move("reviewer", "draft")).toMatchObject({ ok: false, status: 400, issues: [{ path: "reason" }] }); // a reason is required
    expect(await move("reviewer", "draft", "Bypass opening too low")).toMatchObject({ ok: true, data: { status: "draft" } }); // sent back
    await move("designer", "in-review");
    expect(await move("reviewer", "approved")).toMatchObject({ ok: true, data: { status: "approved" } });
    expect(await move("reviewer", "issued")).toMatchObject({ ok: false, status: 403 });
    expect(await move("designer", "issued")).toMatchObject({ ok: true, data: { status: "issued" } });
    expect(await move("owner", "draft")).toMatchObject({ ok: false, status: 409 }); // issued is final

    const log = await db()("audit_log").where({ action: "revision.status", target: revisionId }).orderBy("id");
    expect(log.map((l) => `${l.detail.from}→${l.detail.to}`)).toEqual(["draft→in-review", "in-review→draft", "draft→in-review", "in-review→approved", "approved→issued"]);
    const issued = await db()("schematic_revisions").where({ id: revisionId }).first();
    expect(issued.document).toEqual(JSON.parse(JSON.stringify(seedDoc)));

    // Issued: the draft is read-only until someone starts a new draft.
    const lv = (await row(id)).lock_version;
    expect(await as("designer", () => actions.autosaveDraft({ schematicId: id, lockVersion: lv, doc: withLength(3) })))
      .toMatchObject({ ok: false, status: 409 });
    const started = await as("designer", () => actions.startNewDraft({ schematicId: id }));
    if (!started.ok) throw new Error(started.error);
    expect(await as("designer", () => actions.autosaveDraft({ schematicId: id, lockVersion: started.data.lockVersion, doc: withLength(3) })))
      .toMatchObject({ ok: true });
  });
});

describe("save as variant", () => {
  it("keeps both: designers get a team variant, trainees a private practice one, reviewers none", async () => {
    const id = await freshSchematic();
    const name = (await row(id)).name;
    const team = await as("designer", () => actions.saveAsVariant({ schematicId: id, doc: withLength(11), name: `${name} v` }));
    const practice = await as("trainee", () => actions.saveAsVariant({ schematicId: id, doc: withLength(12), name: `${name} v` }));
    expect(await as("reviewer", () => actions.saveAsVariant({ schematicId: id, doc: seedDoc, name: `${name} r` }))).toMatchObject({ ok: false, status: 403 });
    if (!team.ok || !practice.ok) throw new Error("variant failed");
    const [t, p] = await Promise.all([row(team.data.id), row(practice.data.id)]);
    expect([t.kind, t.variant_of, t.draft.pipes[0].lengthM]).toEqual(["team", id, 11]);
    expect([p.kind, p.owner_id, p.name]).toEqual(["practice", "demo-trainee", `${name} v 2`]);
    expect((await row(id)).draft.pipes[0].lengthM).toBe(seedDoc.pipes[0]!.lengthM);
  });
});

describe("unit preference", () => {
  it("is stored in users.preferences next to other keys and validated", async () => {
    await db()("users").where({ id: "demo-reviewer" }).update({ preferences: JSON.stringify({ theme: "paper" }) });
    try {
      expect(await as("reviewer", () => saveUnitPreference({ flow: "l/s", pressure: "bar" }))).toMatchObject({ ok: true });
      expect((await db()("users").where({ id: "demo-reviewer" }).first()).preferences).toEqual({ theme: "paper", units: { flow: "l/s", pressure: "bar" } });
      expect(await as("reviewer", () => saveUnitPreference({ flow: "gallons" }))).toMatchObject({ ok: false, status: 400 });
    } finally {
      await db()("users").where({ id: "demo-reviewer" }).update({ preferences: JSON.stringify({}) }); // browser tests expect SI defaults
    }
  });
});

describe("sizing", () => {
  it("sizes the board's document for a designer and refuses a trainee on the team schematic", async () => {
    const id = await freshSchematic();
    const r = await as("designer", () => actions.sizeSchematic({ schematicId: id, doc: seedDoc }));
    if (!r.ok) throw new Error(r.error);
    expect(r.data.modes[0]?.pipes.length).toBe(seedDoc.pipes.length);
    expect(await as("trainee", () => actions.sizeSchematic({ schematicId: id, doc: seedDoc }))).toMatchObject({ ok: false, status: 403 });
    const bad = await as("designer", () => actions.sizeSchematic({ doc: { ...seedDoc, pipes: [{ ...seedDoc.pipes[0]!, lengthM: "six" }] } }));
    expect(bad).toMatchObject({ ok: false, status: 400 });
    expect(bad.ok ? [] : bad.issues?.map((i) => i.path)).toContain("pipes[0].lengthM");
  });
});
