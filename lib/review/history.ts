import "server-only";
import { LRUCache } from "lru-cache";
import { db } from "@/lib/db";
import { requireSchematicAccess, type SchematicAccess } from "@/lib/auth/authorize";
import { listRevisions } from "@/db/queries/schematics";
import { parseSchematic, type Schematic } from "@/lib/schematic";
import { diffFromNothing, docDiff, type DocDiff } from "@/lib/schematic/doc-diff";
import type { RevisionStatus } from "@/lib/revisions/transitions";
import type { HistoryEntry, RevisionEvent } from "./types";

// The revision history: every revision the caller may read, newest first, with its
// status moves and what changed from the revision before it (computed here from the two
// documents; positions and labels count). Revisions are immutable, so a pair's changes
// are kept per process, keyed by the two ids.

const diffs = new LRUCache<string, DocDiff>({ max: 2000 });

async function documents(ids: string[]): Promise<Map<string, Schematic | null>> {
  const rows = ids.length ? await db()("schematic_revisions").whereIn("id", ids).select("id", "document") : [];
  return new Map(rows.map((r) => {
    const p = parseSchematic(r.document);
    return [r.id as string, p.ok ? p.doc : null];
  }));
}

async function changesBetween(pairs: [string | null, string][]): Promise<Map<string, DocDiff>> {
  const key = ([a, b]: [string | null, string]) => `${a ?? "-"}:${b}`;
  const missing = pairs.filter((p) => !diffs.has(key(p)));
  const docs = await documents([...new Set(missing.flatMap(([a, b]) => (a ? [a, b] : [b])))]);
  for (const p of missing) {
    const before = p[0] ? docs.get(p[0]) : null;
    const after = docs.get(p[1]);
    // a stored document that no longer parses: nothing can be said about it
    const diff = !after ? { added: [], removed: [], changed: [], settings: [] } : before ? docDiff(before, after, { layout: true }) : diffFromNothing(after);
    diffs.set(key(p), diff);
  }
  return new Map(pairs.map((p) => [p[1], diffs.get(key(p))!]));
}

async function eventsOf(schematicId: string): Promise<Map<string, RevisionEvent[]>> {
  // a send-back's reason is its thread's first message (unless its author deleted it)
  const reason = db().raw(`(select body from thread_messages m where m.thread_id = e.thread_id and m.deleted_at is null
    and m.created_at = (select min(created_at) from thread_messages where thread_id = e.thread_id)) as reason`);
  const rows = await db()("revision_events as e").leftJoin("users as u", "u.id", "e.actor_id")
    .where("e.schematic_id", schematicId).orderBy("e.at", "asc")
    .select("e.revision_id", "e.kind", "e.from_status", "e.to_status", "e.actor_id", "u.name as actor_name", "e.at", "e.thread_id", "e.detail", reason);
  const out = new Map<string, RevisionEvent[]>();
  for (const r of rows) {
    const e: RevisionEvent = { kind: r.kind, from: r.from_status as RevisionStatus | null, to: r.to_status as RevisionStatus | null, actorId: r.actor_id,
      actorName: r.actor_name, at: new Date(r.at).toISOString(), threadId: r.thread_id, reason: r.reason ?? null, detail: r.detail ?? null };
    out.set(r.revision_id, [...(out.get(r.revision_id) ?? []), e]);
  }
  return out;
}

export async function historyOf(access: SchematicAccess): Promise<HistoryEntry[]> {
  let revisions = await listRevisions(access.schematic.id);
  if (access.issuedOnly) revisions = revisions.filter((r) => r.status === "issued");
  // each against the one before it in the list the caller sees (oldest has nothing before)
  const pairs = revisions.map((r, k): [string | null, string] => [revisions[k + 1]?.id ?? null, r.id]);
  const [changes, events] = await Promise.all([changesBetween(pairs), eventsOf(access.schematic.id)]);
  return revisions.map((r) => ({
    id: r.id, number: r.number, status: r.status, authorId: r.authorId, authorName: r.authorName, createdAt: r.createdAt,
    statusChangedAt: r.statusChangedAt, message: r.message, changes: changes.get(r.id)!, events: events.get(r.id) ?? [],
  }));
}

export async function historyOfSchematic(schematicId: string): Promise<HistoryEntry[]> {
  return historyOf(await requireSchematicAccess(schematicId, "read"));
}
