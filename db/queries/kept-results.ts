import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";

// Sizing results kept with what was sized: per revision and engine version
// (revision_results), and the draft's last sizing with the document it was for (draft_results).

export interface KeptResults {
  engineVersion: string;
  /** The Results document as stored (JSON). */
  results: unknown;
  computedAt: string;
}

const iso = (v: unknown) => new Date(v as string).toISOString();

/** Every stored sizing of a revision, newest engine run first. */
export async function revisionResultRows(revisionId: string): Promise<KeptResults[]> {
  const rows = await db()("revision_results").where({ revision_id: revisionId }).orderBy("computed_at", "desc")
    .select("engine_version", "results", "computed_at");
  return rows.map((r) => ({ engineVersion: r.engine_version, results: r.results, computedAt: iso(r.computed_at) }));
}

/** Store a revision's results for an engine version; a row already there is kept (same engine, same answer). */
export async function putRevisionResults(revisionId: string, engineVersion: string, resultsJson: string, trx: Knex = db()): Promise<void> {
  await trx("revision_results").insert({ revision_id: revisionId, engine_version: engineVersion, results: resultsJson })
    .onConflict(["revision_id", "engine_version"]).ignore();
}

export interface KeptDraftResults extends KeptResults {
  /** The document as it was when sized. */
  document: unknown;
  sizedBy: string | null;
}

export async function draftResultRow(schematicId: string): Promise<KeptDraftResults | null> {
  const r = await db()("draft_results as d").leftJoin("users as u", "u.id", "d.sized_by").where("d.schematic_id", schematicId)
    .first("d.engine_version", "d.document", "d.results", "d.sized_at", "u.name as sized_by");
  return r ? { engineVersion: r.engine_version, document: r.document, results: r.results, computedAt: iso(r.sized_at), sizedBy: r.sized_by ?? null } : null;
}

/** The draft's last sizing replaces the one before. */
export async function putDraftResults(input: { schematicId: string; engineVersion: string; documentJson: string; resultsJson: string; userId: string }): Promise<void> {
  const row = { schematic_id: input.schematicId, engine_version: input.engineVersion, document: input.documentJson,
    results: input.resultsJson, sized_by: input.userId, sized_at: db().fn.now() };
  await db()("draft_results").insert(row).onConflict("schematic_id").merge();
}
