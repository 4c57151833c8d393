import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import type { Schematic } from "@/lib/schematic";
import { draftIsReadOnly } from "@/lib/revisions/draft-state";
import type { RevisionStatus } from "@/lib/revisions/transitions";
import { putRevisionResults } from "./kept-results";
import { mapRevision, mapSchematic, type RevisionRecord, type SchematicRecord } from "./schematic-rows";

export type { RevisionRecord, SchematicRecord, SchematicSummary } from "./schematic-rows";
export { listProjectSchematics } from "./schematic-list";

/** Why a write was refused; callers turn these into 404 / 409 / 423-style answers. */
export type WriteRefusal =
  | { ok: false; reason: "not-found" }
  | { ok: false; reason: "conflict"; currentLockVersion: number }
  | { ok: false; reason: "read-only" }
  | { ok: false; reason: "duplicate-name" };

export async function getSchematic(id: string): Promise<SchematicRecord | null> {
  const row = await db()("schematics").where({ id }).first();
  return row ? mapSchematic(row) : null;
}

/** Newest first, without documents (the list can be long; documents are fetched one at a time). */
export async function listRevisions(schematicId: string): Promise<RevisionRecord[]> {
  const rows = await db()("schematic_revisions as r")
    .leftJoin("users as u", "u.id", "r.author_id")
    .where("r.schematic_id", schematicId)
    .select("r.id", "r.schematic_id", "r.number", "r.status", "r.message", "r.author_id", "u.name as author_name",
      "r.created_at", "r.status_changed_at")
    .orderBy("r.number", "desc");
  return rows.map(mapRevision);
}

export async function getRevision(id: string): Promise<(RevisionRecord & { document: unknown; projectId: string }) | null> {
  const row = await db()("schematic_revisions as r").join("schematics as s", "s.id", "r.schematic_id")
    .leftJoin("users as u", "u.id", "r.author_id")
    .where("r.id", id).select("r.*", "u.name as author_name", "s.project_id").first();
  return row ? { ...mapRevision(row), document: row.document, projectId: row.project_id } : null;
}

async function latestOf(trx: Knex, schematicId: string) {
  const row = await trx("schematic_revisions").where({ schematic_id: schematicId }).orderBy("number", "desc")
    .first("number", "status", "status_changed_at");
  return row ? { number: row.number as number, status: row.status as RevisionStatus, statusChangedAt: row.status_changed_at } : null;
}

/** Lock the row, check the caller saw the current version and may edit, then write the draft. */
async function writeDraft(trx: Knex.Transaction, input: { schematicId: string; lockVersion: number; doc: Schematic; userId: string }) {
  const row = await trx("schematics").where({ id: input.schematicId }).forUpdate().first("lock_version", "updated_at");
  if (!row) return { ok: false, reason: "not-found" } as const;
  if (row.lock_version !== input.lockVersion) return { ok: false, reason: "conflict", currentLockVersion: row.lock_version } as const;
  const latest = await latestOf(trx, input.schematicId);
  if (draftIsReadOnly({ draftUpdatedAt: row.updated_at, latest })) return { ok: false, reason: "read-only" } as const;
  const [updated] = await trx("schematics").where({ id: input.schematicId })
    .update({ draft: JSON.stringify(input.doc), lock_version: trx.raw("lock_version + 1"), updated_by: input.userId,
      updated_at: trx.fn.now() })
    .returning(["lock_version", "updated_at"]);
  return { ok: true, lockVersion: updated.lock_version as number, updatedAt: new Date(updated.updated_at).toISOString(), latest } as const;
}

export type DraftSaved = { ok: true; lockVersion: number; updatedAt: string };

export async function saveDraft(input: { schematicId: string; lockVersion: number; doc: Schematic; userId: string }): Promise<DraftSaved | WriteRefusal> {
  return db().transaction(async (trx) => {
    const r = await writeDraft(trx, input);
    return r.ok ? { ok: true, lockVersion: r.lockVersion, updatedAt: r.updatedAt } : r;
  });
}

/**
 * Save the draft and freeze it as the next numbered revision with its sizing results,
 * in one transaction (nothing half-saved).
 */
export async function saveRevision(input: { schematicId: string; lockVersion: number; doc: Schematic; message: string; userId: string;
  results: { engineVersion: string; json: string } | null }): Promise<(DraftSaved & { revision: RevisionRecord }) | WriteRefusal> {
  return db().transaction(async (trx) => {
    const r = await writeDraft(trx, input);
    if (!r.ok) return r;
    const [row] = await trx("schematic_revisions").insert({ schematic_id: input.schematicId, number: (r.latest?.number ?? 0) + 1,
      document: JSON.stringify(input.doc), status: "draft", message: input.message, author_id: input.userId }).returning("*");
    if (input.results) await putRevisionResults(row.id, input.results.engineVersion, input.results.json, trx);
    return { ok: true, lockVersion: r.lockVersion, updatedAt: r.updatedAt, revision: mapRevision(row) };
  });
}

/** Move a revision from `from` to `to`; refuses when another request moved it first. Only status columns change. */
export async function setRevisionStatus(input: { revisionId: string; from: RevisionStatus; to: RevisionStatus }):
  Promise<{ ok: true; revision: RevisionRecord } | { ok: false; reason: "conflict" }> {
  const [row] = await db()("schematic_revisions").where({ id: input.revisionId, status: input.from })
    .update({ status: input.to, status_changed_at: db().fn.now() }).returning("*");
  return row ? { ok: true, revision: mapRevision(row) } : { ok: false, reason: "conflict" };
}

/** Unlock an issued schematic for editing: touching the draft after the issue time is the marker. */
export async function startNewDraft(input: { schematicId: string; userId: string }): Promise<{ ok: true; lockVersion: number } | WriteRefusal> {
  const [row] = await db()("schematics").where({ id: input.schematicId })
    .update({ lock_version: db().raw("lock_version + 1"), updated_by: input.userId, updated_at: db().fn.now() })
    .returning("lock_version");
  return row ? { ok: true, lockVersion: row.lock_version } : { ok: false, reason: "not-found" };
}

export async function createSchematic(input: { projectId: string; name: string; doc: Schematic; userId: string;
  kind: "team" | "practice"; variantOf?: string | null }): Promise<{ ok: true; schematic: SchematicRecord } | WriteRefusal> {
  try {
    const [row] = await db()("schematics").insert({ project_id: input.projectId, name: input.name, kind: input.kind,
      owner_id: input.userId, variant_of: input.variantOf ?? null, draft: JSON.stringify(input.doc),
      updated_by: input.userId }).returning("*");
    return { ok: true, schematic: mapSchematic(row) };
  } catch (e) {
    if ((e as { code?: string }).code === "23505") return { ok: false, reason: "duplicate-name" };
    throw e;
  }
}

/** A name not yet used in the project: "Bypass only (variant)", "… (variant 2)", … */
export async function freeSchematicName(projectId: string, base: string): Promise<string> {
  const taken = new Set<string>((await db()("schematics").where({ project_id: projectId }).pluck("name")) as string[]);
  if (!taken.has(base)) return base;
  for (let n = 2; ; n++) if (!taken.has(`${base} ${n}`)) return `${base} ${n}`;
}
