import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { lucia } from "@/lib/auth/lucia";
import { requireSchematicAccess } from "@/lib/auth/authorize";
import { withRequestCookies } from "@/lib/auth/request-context";
import { createSchematic } from "@/db/queries/schematics";
import { calculate, ENGINE_VERSION } from "@/lib/hydraulics/calculate";
import { schematicView } from "@/lib/persistence/schematic-view";
import { revisionWithResults } from "@/lib/revisions/with-results";
import { parseSchematic, resultsSchema, type Schematic } from "@/lib/schematic";
import * as actions from "@/components/drawing-board/actions";
import { callRoute } from "./helpers/call";

// Results are part of a revision (issue: results everyone can see). Real PostgreSQL, the
// seeded Orchard End project; each test makes its own schematic.

const ORCHARD_END = "6a0f3c1e-0000-4000-8000-000000000102";
const raw = JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data/orchard-end-bypass-only.json"), "utf8"));
const parsed = parseSchematic(raw);
if (!parsed.ok) throw new Error("seed document does not parse");
const seedDoc: Schematic = parsed.doc;
const withLength = (id: string, m: number): Schematic => ({ ...seedDoc, pipes: seedDoc.pipes.map((p) => (p.id === id ? { ...p, lengthM: m } : p)) });
const engine = (doc: Schematic) => {
  const r = calculate(doc);
  if (!r.ok) throw new Error("refused");
  return r.results;
};
const dpOf = (results: { modes: { mode: string; pipes: { id: string; pressureDropKpa: number | null }[] }[] }, id: string) =>
  results.modes.find((m) => m.mode === "heating")!.pipes.find((p) => p.id === id)!.pressureDropKpa;

const cookies = new Map<string, string>();
const as = <T,>(who: string, fn: () => Promise<T>) => withRequestCookies(`lw_session=${cookies.get(who)}`, fn);
const cookie = (who: string) => `lw_session=${cookies.get(who)}`;
const getRevision = async (who: string, id: string) =>
  callRoute((await import("@/app/api/v1/revisions/[revisionId]/route")).GET as never, { path: `/api/v1/revisions/${id}`, cookie: cookie(who), params: { revisionId: id } });

beforeAll(async () => {
  for (const who of ["designer", "reviewer", "trainee", "installer", "owner"]) cookies.set(who, (await lucia().createSession(`demo-${who}`, {})).id);
});
afterAll(async () => {
  await db()("schematics").where("name", "like", "rr-%").del();
  for (const id of cookies.values()) await lucia().invalidateSession(id);
});

let n = 0;
async function fresh(): Promise<string> {
  const r = await createSchematic({ projectId: ORCHARD_END, name: `rr-${Date.now()}-${n++}`, doc: seedDoc, userId: "demo-designer", kind: "team" });
  if (!r.ok) throw new Error(r.reason);
  return r.schematic.id;
}
/** Save revision 1 of a fresh schematic with pipe z1-f0 at 8 m, and submit it for review. */
async function inReview(): Promise<{ id: string; revisionId: string; lockVersion: number }> {
  const id = await fresh();
  const saved = await as("designer", () => actions.saveRevision({ schematicId: id, lockVersion: 1, doc: withLength("z1-f0", 8), message: "for review" }));
  if (!saved.ok) throw new Error(saved.error);
  const moved = await as("designer", () => actions.setRevisionStatus({ revisionId: saved.data.revision.id, status: "in-review" }));
  if (!moved.ok) throw new Error(moved.error);
  return { id, revisionId: saved.data.revision.id, lockVersion: saved.data.lockVersion };
}

describe("saving a revision sizes it and keeps the results with it", () => {
  it("stores the engine's answer for the revision's document, tagged with the engine version, in the same save", async () => {
    const { revisionId } = await inReview();
    const rows = await db()("revision_results").where({ revision_id: revisionId });
    expect(rows.map((r) => r.engine_version)).toEqual([ENGINE_VERSION]);
    const kept = resultsSchema.parse(rows[0].results);
    expect(kept).toEqual(engine(withLength("z1-f0", 8)));
  });
});

describe("GET /api/v1/revisions/{id}", () => {
  it("answers exactly {revision, document, results, engineVersion}: the revision's, not the draft's changed since", async () => {
    const { id, revisionId, lockVersion } = await inReview();
    // the designer changes the draft after submitting: 8 m → 80 m
    const edit = await as("designer", () => actions.autosaveDraft({ schematicId: id, lockVersion, doc: withLength("z1-f0", 80) }));
    expect(edit.ok).toBe(true);
    const out = await getRevision("reviewer", revisionId);
    expect(out.status).toBe(200);
    expect(Object.keys(out.body).sort()).toEqual(["document", "engineVersion", "results", "revision"]);
    expect(out.body.revision).toMatchObject({ id: revisionId, number: 1, status: "in-review", schematicId: id });
    expect(out.body.engineVersion).toBe(ENGINE_VERSION);
    expect(out.body.document.pipes.find((p: { id: string }) => p.id === "z1-f0").lengthM).toBe(8);
    const expected = dpOf(engine(withLength("z1-f0", 8)), "z1-f0");
    expect(dpOf(out.body.results, "z1-f0")).toBeCloseTo(expected!, 9);
    expect(dpOf(engine(withLength("z1-f0", 80)), "z1-f0")!).toBeGreaterThan(expected! * 5); // the draft's would differ
  });
  it("is open to every member who may read the revision; installers only once it is issued", async () => {
    const { revisionId } = await inReview();
    for (const who of ["owner", "designer", "reviewer", "trainee"]) expect((await getRevision(who, revisionId)).status).toBe(200);
    const installer = await getRevision("installer", revisionId);
    expect(installer.status).toBe(403);
    expect(installer.body.error).toMatch(/issued/);
    expect((await getRevision("reviewer", "6a0f3c1e-0000-4000-8000-00000000ffff")).status).toBe(404);
    expect((await getRevision("reviewer", "not-a-uuid")).status).toBe(404);
  });
  it("sizes a revision kept without results on first read, stores that once, and answers from it after", async () => {
    const { revisionId } = await inReview();
    await db()("revision_results").where({ revision_id: revisionId }).del(); // as the demo seed leaves its revisions
    const first = await getRevision("trainee", revisionId);
    expect(first.body.results.engine).toBe(ENGINE_VERSION);
    expect(await db()("revision_results").where({ revision_id: revisionId }).count("* as n").first()).toMatchObject({ n: "1" });
    await getRevision("reviewer", revisionId);
    expect(await db()("revision_results").where({ revision_id: revisionId }).count("* as n").first()).toMatchObject({ n: "1" });
  });
});

describe("results of an older engine version", () => {
  it("are computed again on reading, kept beside the old ones, and the differences named", async () => {
    const { revisionId } = await inReview();
    const current = (await db()("revision_results").where({ revision_id: revisionId }).first()).results;
    // what an older engine had said: another Δp on z1-f0
    const older = structuredClone(current);
    older.engine = "0.9.0";
    older.modes[0].pipes.find((p: { id: string }) => p.id === "z1-f0").pressureDropKpa *= 2;
    await db()("revision_results").where({ revision_id: revisionId }).del();
    await db()("revision_results").insert({ revision_id: revisionId, engine_version: "0.9.0", results: JSON.stringify(older), computed_at: new Date(Date.now() - 86_400_000) });
    const r = await revisionWithResults(revisionId);
    expect(r!.engineVersion).toBe(ENGINE_VERSION);
    expect(r!.recomputed?.fromEngine).toBe("0.9.0");
    expect(r!.recomputed!.changes.map((c) => c.what)).toContain("heating · pipe z1-f0 Δp (kPa)");
    expect((await db()("revision_results").where({ revision_id: revisionId }).orderBy("engine_version")).map((x) => x.engine_version)).toEqual(["0.9.0", ENGINE_VERSION]);
  });
});

describe("the board opens what each role needs, with its kept numbers", () => {
  const open = (who: string, id: string, rev = "default") => as(who, async () => schematicView(await requireSchematicAccess(id, "read"), rev));
  it("the reviewer opens the revision under review by default, with its results; the draft is one choice away", async () => {
    const { id, revisionId, lockVersion } = await inReview();
    await as("designer", () => actions.autosaveDraft({ schematicId: id, lockVersion, doc: withLength("z1-f0", 80) }));
    const v = (await open("reviewer", id))!;
    expect(v.viewing).toMatchObject({ kind: "revision", revision: { id: revisionId, status: "in-review" } });
    expect(v.readOnly).toBe(true);
    expect((v.doc as Schematic).pipes.find((p) => p.id === "z1-f0")!.lengthM).toBe(8);
    expect(dpOf(v.sizing!.results, "z1-f0")).toBeCloseTo(dpOf(engine(withLength("z1-f0", 8)), "z1-f0")!, 9);
    const draft = (await open("reviewer", id, "draft"))!;
    expect(draft.viewing.kind).toBe("draft");
    expect((draft.doc as Schematic).pipes.find((p) => p.id === "z1-f0")!.lengthM).toBe(80);
    // the designer opens the draft by default
    expect((await open("designer", id))!.viewing.kind).toBe("draft");
  });
  it("a draft never sized itself shows its last revision's results, measured against that revision's document", async () => {
    const { id, lockVersion } = await inReview();
    await as("designer", () => actions.autosaveDraft({ schematicId: id, lockVersion, doc: withLength("z1-f0", 80) }));
    await db()("draft_results").where({ schematic_id: id }).del(); // as the demo seed leaves its drafts
    const v = (await open("trainee", id, "draft"))!;
    expect(v.sizing!.fromRevision).toBe(1);
    expect(v.sizing!.sizedDocument!.pipes.find((p) => p.id === "z1-f0")!.lengthM).toBe(8);
    expect(v.sizing!.results).toEqual(engine(withLength("z1-f0", 8)));
  });
  it("keeps the draft's last sizing with the document it was for, shown to everyone who opens the draft", async () => {
    const id = await fresh();
    const sized = await as("designer", () => actions.sizeSchematic({ schematicId: id, doc: withLength("z1-f0", 12) }));
    expect(sized.ok).toBe(true);
    const v = (await open("trainee", id, "draft"))!;
    expect(v.sizing!.results).toEqual(engine(withLength("z1-f0", 12)));
    expect(v.sizing!.sizedDocument!.pipes.find((p) => p.id === "z1-f0")!.lengthM).toBe(12);
    expect(v.sizing!.sizedBy).toBe("Imogen Pryce");
    // a kept sizing by an older engine is sized again on opening, the difference flagged
    await db()("draft_results").where({ schematic_id: id }).update({ engine_version: "0.9.0" });
    const again = (await open("designer", id, "draft"))!;
    expect(again.sizing!.engineVersion).toBe(ENGINE_VERSION);
    expect(again.sizing!.recomputed).toMatchObject({ fromEngine: "0.9.0", changes: [] });
  });
});
