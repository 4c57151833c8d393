import "server-only";
import { db } from "@/lib/db";

// The site-event log (append-only; a database trigger refuses updates). Rows ↔ domain.

export interface StoredEvent {
  id: string;
  schematicId: string;
  revisionId: string;
  revisionNumber: number;
  kind: string;
  target: string | null;
  data: Record<string, unknown>;
  context: Record<string, unknown>;
  madeAt: string;
  receivedAt: string;
  authorId: string | null;
  authorName: string | null;
  seq: number;
}

export interface NewEvent {
  id: string; projectId: string; schematicId: string; revisionId: string; kind: string; target: string | null;
  data: unknown; context: unknown; madeAt: string; authorId: string;
}

/** Insert once: true when this call stored it, false when an event with that id was already there. */
export async function insertEventOnce(e: NewEvent): Promise<boolean> {
  const rows = await db()("site_events").insert({
    id: e.id, project_id: e.projectId, schematic_id: e.schematicId, revision_id: e.revisionId, kind: e.kind, target: e.target,
    data: JSON.stringify(e.data), context: JSON.stringify(e.context), made_at: e.madeAt, author_id: e.authorId,
  }).onConflict("id").ignore().returning("id");
  return rows.length === 1;
}

export async function eventOwner(id: string): Promise<{ schematicId: string; authorId: string | null; kind: string } | null> {
  const r = await db()("site_events").where({ id }).first("schematic_id", "author_id", "kind");
  return r ? { schematicId: r.schematic_id, authorId: r.author_id, kind: r.kind } : null;
}

const iso = (v: unknown) => new Date(v as string).toISOString();

/** Events of a schematic (or of one revision), in the order they were made (received order breaks ties). */
export async function listEvents(where: { schematicId: string } | { revisionId: string }, kinds?: string[]): Promise<StoredEvent[]> {
  const q = db()("site_events as e").join("schematic_revisions as r", "r.id", "e.revision_id").leftJoin("users as u", "u.id", "e.author_id")
    .select("e.*", "r.number as revision_number", "u.name as author_name").orderBy([{ column: "e.made_at" }, { column: "e.seq" }]);
  if ("schematicId" in where) q.where("e.schematic_id", where.schematicId);
  else q.where("e.revision_id", where.revisionId);
  if (kinds) q.whereIn("e.kind", kinds);
  const rows = await q;
  return rows.map((r) => ({
    id: r.id, schematicId: r.schematic_id, revisionId: r.revision_id, revisionNumber: r.revision_number, kind: r.kind, target: r.target,
    data: r.data, context: r.context, madeAt: iso(r.made_at), receivedAt: iso(r.received_at), authorId: r.author_id,
    authorName: r.author_name ?? null, seq: Number(r.seq),
  }));
}

/** The newest issued revision of a schematic, or null. */
export async function newestIssuedRevision(schematicId: string): Promise<{ id: string; number: number } | null> {
  const r = await db()("schematic_revisions").where({ schematic_id: schematicId, status: "issued" }).orderBy("number", "desc").first("id", "number");
  return r ? { id: r.id, number: r.number } : null;
}

/** The firm's site rules (jsonb, {} until set) for a project. */
export async function firmSiteRules(projectId: string): Promise<{ organisationId: string; rules: unknown } | null> {
  const r = await db()("projects as p").join("organisations as o", "o.id", "p.organisation_id").where("p.id", projectId)
    .first("o.id", "o.site_rules");
  return r ? { organisationId: r.id, rules: r.site_rules } : null;
}

export async function saveFirmSiteRules(organisationId: string, rules: unknown): Promise<void> {
  await db()("organisations").where({ id: organisationId }).update({ site_rules: JSON.stringify(rules) });
}
