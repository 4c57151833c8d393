import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import type { RevisionStatus } from "@/lib/revisions/transitions";
import type { AnchorKind, Thread, ThreadMessage } from "@/lib/review/types";

// Review threads and their messages: rows ↔ domain objects. Writes announce themselves
// on the live channel through triggers (db/migrations/…_review_threads.ts).

type Row = Record<string, unknown>;
const iso = (v: unknown) => (v ? new Date(v as string).toISOString() : null);

/** Where an anchor is looked for: a revision's document, or the working draft. */
export type DocSource = { revisionId: string } | { draftOf: string } | null;

const PART_PATH = "$.parts[*] ? (@.id == $id)";
const PIPE_PATH = "$.pipes[*] ? (@.id == $id)";

/** The document as a scalar subquery (evaluated once per statement), with its binding. */
function docSql(source: Exclude<DocSource, null>): [string, string] {
  return "revisionId" in source
    ? ["(select document from schematic_revisions where id = ?)", source.revisionId]
    : ["(select draft from schematics where id = ?)", source.draftOf];
}

/** SQL true when the anchor (kind and id columns) names a part or pipe in the document. */
function presentSql(source: Exclude<DocSource, null>, kind: string, id: string): [string, string[]] {
  const [doc, docId] = docSql(source);
  return [`(case when ${kind} = 'schematic' then true else jsonb_path_exists(${doc},
    (case when ${kind} = 'part' then ?::jsonpath else ?::jsonpath end), jsonb_build_object('id', ${id})) end)`, [docId, PART_PATH, PIPE_PATH]];
}

export async function anchorExists(source: DocSource, kind: AnchorKind, id: string | null): Promise<boolean> {
  if (kind === "schematic") return true;
  if (!source || id === null) return false;
  const [doc, docId] = docSql(source);
  const row = await db().first(db().raw(`jsonb_path_exists(${doc}, ?::jsonpath, jsonb_build_object('id', ?::text)) as present`,
    [docId, kind === "part" ? PART_PATH : PIPE_PATH, id]));
  return row?.present === true;
}

function mapMessage(r: Row): ThreadMessage {
  const deleted = r.deleted_at !== null;
  return {
    id: r.id as string, threadId: r.thread_id as string, authorId: (r.author_id as string | null) ?? null,
    authorName: (r.author_name as string | null) ?? null, body: deleted ? "" : (r.body as string), mentions: deleted ? [] : (r.mentions as string[]),
    createdAt: iso(r.created_at)!, editedAt: iso(r.edited_at), deleted,
  };
}

function mapThread(r: Row, messages: ThreadMessage[]): Thread {
  return {
    id: r.id as string, schematicId: r.schematic_id as string, number: r.number as number, revisionId: r.revision_id as string,
    revisionNumber: r.revision_number as number, revisionStatus: r.revision_status as RevisionStatus,
    anchor: { kind: r.anchor_kind as AnchorKind, id: (r.anchor_id as string | null) ?? null },
    anchorPresent: r.anchor_present !== false, kind: r.kind as Thread["kind"],
    createdBy: (r.created_by as string | null) ?? null, createdByName: (r.created_by_name as string | null) ?? null, createdAt: iso(r.created_at)!,
    resolved: r.resolved_at !== null, resolvedAt: iso(r.resolved_at), resolvedByName: (r.resolved_by_name as string | null) ?? null, messages,
  };
}

export interface ThreadFilter {
  schematicId: string;
  /** Threads opened on this revision number or an earlier one. */
  upToNumber?: number;
  /** Installers: threads on issued revisions only. */
  issuedOnly?: boolean;
  threadId?: string;
  /** Anchors are checked against this document. */
  against: DocSource;
}

/** Newest first, each with its messages oldest first. */
export async function listThreads(f: ThreadFilter): Promise<Thread[]> {
  const k = db();
  const q = k("review_threads as t").join("schematic_revisions as r", "r.id", "t.revision_id")
    .leftJoin("users as c", "c.id", "t.created_by").leftJoin("users as v", "v.id", "t.resolved_by")
    .where("t.schematic_id", f.schematicId)
    .select("t.*", "r.number as revision_number", "r.status as revision_status", "c.name as created_by_name", "v.name as resolved_by_name")
    .orderBy("t.number", "desc");
  if (f.against) {
    const [sql, bindings] = presentSql(f.against, "t.anchor_kind", "t.anchor_id");
    q.select(k.raw(`${sql} as anchor_present`, bindings));
  }
  if (f.upToNumber !== undefined) q.where("r.number", "<=", f.upToNumber);
  if (f.issuedOnly) q.where("r.status", "issued");
  if (f.threadId) q.where("t.id", f.threadId);
  const rows = await q;
  if (rows.length === 0) return [];
  const messages = await k("thread_messages as m").leftJoin("users as u", "u.id", "m.author_id")
    .whereIn("m.thread_id", rows.map((r) => r.id)).select("m.*", "u.name as author_name").orderBy("m.created_at", "asc");
  const byThread = new Map<string, ThreadMessage[]>();
  for (const m of messages.map(mapMessage)) byThread.set(m.threadId, [...(byThread.get(m.threadId) ?? []), m]);
  return rows.map((r) => mapThread(r, byThread.get(r.id) ?? []));
}

/** The thread's place: which schematic, project and revision, for the access checks. */
export async function threadPlace(threadId: string): Promise<{ id: string; schematicId: string; projectId: string; revisionId: string;
  revisionStatus: RevisionStatus; resolved: boolean } | null> {
  const row = await db()("review_threads as t").join("schematics as s", "s.id", "t.schematic_id")
    .join("schematic_revisions as r", "r.id", "t.revision_id").where("t.id", threadId)
    .first("t.id", "t.schematic_id", "s.project_id", "t.revision_id", "r.status", "t.resolved_at");
  return row ? { id: row.id, schematicId: row.schematic_id, projectId: row.project_id, revisionId: row.revision_id,
    revisionStatus: row.status, resolved: row.resolved_at !== null } : null;
}

export async function messagePlace(messageId: string): Promise<{ id: string; threadId: string; authorId: string | null; deleted: boolean;
  mentions: string[] } | null> {
  const row = await db()("thread_messages").where({ id: messageId }).first("id", "thread_id", "author_id", "deleted_at", "mentions");
  return row ? { id: row.id, threadId: row.thread_id, authorId: row.author_id, deleted: row.deleted_at !== null, mentions: row.mentions } : null;
}

export interface NewThread {
  schematicId: string; revisionId: string; anchor: { kind: AnchorKind; id: string | null }; kind: "comment" | "send-back";
  authorId: string; body: string; mentions: string[];
}

/** Insert a thread and its first message; the number is the schematic's next (the schematic row is locked meanwhile). */
export async function insertThread(trx: Knex.Transaction, t: NewThread): Promise<{ threadId: string; messageId: string; number: number }> {
  await trx("schematics").where({ id: t.schematicId }).forUpdate().first("id");
  const top = await trx("review_threads").where({ schematic_id: t.schematicId }).max<{ n: number | null }>("number as n").first();
  const number = (top?.n ?? 0) + 1;
  const [row] = await trx("review_threads").insert({ schematic_id: t.schematicId, revision_id: t.revisionId, number,
    anchor_kind: t.anchor.kind, anchor_id: t.anchor.id, kind: t.kind, created_by: t.authorId }).returning("id");
  const messageId = await insertMessage(trx, { threadId: row.id, authorId: t.authorId, body: t.body, mentions: t.mentions });
  return { threadId: row.id as string, messageId, number };
}

export async function insertMessage(k: Knex, m: { threadId: string; authorId: string; body: string; mentions: string[] }): Promise<string> {
  const [row] = await k("thread_messages").insert({ thread_id: m.threadId, author_id: m.authorId, body: m.body, mentions: m.mentions }).returning("id");
  return row.id as string;
}

export async function updateMessage(id: string, body: string, mentions: string[]): Promise<void> {
  await db()("thread_messages").where({ id }).whereNull("deleted_at").update({ body, mentions, edited_at: db().fn.now() });
}

/**
 * Delete one's message: the text goes, its place in the conversation stays. A thread
 * whose every message is deleted goes with them. Returns whether the thread went.
 */
export async function deleteMessage(id: string, threadId: string): Promise<{ threadDeleted: boolean }> {
  return db().transaction(async (trx) => {
    await trx("thread_messages").where({ id }).update({ body: "", mentions: [], deleted_at: trx.fn.now() });
    const left = await trx("thread_messages").where({ thread_id: threadId }).whereNull("deleted_at").first("id");
    if (left) return { threadDeleted: false };
    await trx("review_threads").where({ id: threadId }).delete();
    return { threadDeleted: true };
  });
}

export async function setResolved(threadId: string, userId: string, resolved: boolean): Promise<void> {
  await db()("review_threads").where({ id: threadId })
    .update(resolved ? { resolved_at: db().fn.now(), resolved_by: userId } : { resolved_at: null, resolved_by: null });
}
