import "server-only";
import { z, ZodError } from "zod";
import { db } from "@/lib/db";
import { AuthError, UserError } from "@/lib/auth/errors";
import { isUuid, requireSchematicAccess, requireUser, type SchematicAccess } from "@/lib/auth/authorize";
import * as q from "@/db/queries/threads";
import type { RevisionStatus } from "@/lib/revisions/transitions";
import { readersOf, requireRevisionVisible, requireThreadAccess, requireWriteOn } from "./access";
import { editInput, newThreadInput, replyInput, resolveInput, revisionNumberParam } from "./inputs";
import { mentionedIn } from "./mentions";
import { mailMentions } from "./notify";
import type { Person, Thread } from "./types";

// Review threads: list, open, reply, resolve and reopen, edit and delete one's own
// message. Each: parse the input (zod, messages name the field), check who may (./access),
// one write, then e-mail anyone newly @mentioned. Live boards hear of every write through
// the database's triggers (lib/live).

const revisionOf = async (schematicId: string, where: { id?: string; number?: number; issuedOnly?: boolean }) => {
  const qb = db()("schematic_revisions").where({ schematic_id: schematicId }).orderBy("number", "desc").first("id", "number", "status");
  if (where.id) qb.where({ id: where.id });
  if (where.number !== undefined) qb.where({ number: where.number });
  if (where.issuedOnly) qb.where({ status: "issued" });
  return (await qb) as { id: string; number: number; status: RevisionStatus } | undefined;
};

/** Threads on a schematic, newest first: up to revision N (anchors checked in it), or all (anchors checked in the draft). */
export async function threadsOf(schematicId: string, revisionParam: unknown): Promise<{ threads: Thread[]; mentionable: Person[] }> {
  const access = await requireSchematicAccess(schematicId, "read");
  const { revision: number } = z.object({ revision: revisionNumberParam }).parse({ revision: revisionParam ?? undefined });
  let against: q.DocSource = { draftOf: schematicId };
  let status: RevisionStatus | null = null;
  if (number !== undefined) {
    const rev = await revisionOf(schematicId, { number });
    if (!rev) throw new UserError(404, `revision: this schematic has no revision ${number}.`);
    requireRevisionVisible(access, rev.status);
    against = { revisionId: rev.id };
    status = rev.status;
  } else if (access.issuedOnly) {
    const rev = await revisionOf(schematicId, { issuedOnly: true });
    against = rev ? { revisionId: rev.id } : null;
    status = "issued";
  }
  const threads = await q.listThreads({ schematicId, upToNumber: number, issuedOnly: access.issuedOnly, against });
  const mentionable = (await readersOf(access.schematic, status)).map(({ id, name }) => ({ id, name }));
  return { threads, mentionable };
}

async function oneThread(schematicId: string, threadId: string, against: q.DocSource = { draftOf: schematicId }): Promise<Thread> {
  const [t] = await q.listThreads({ schematicId, threadId, against });
  if (!t) throw new UserError(404, "That thread is gone (its last message was deleted).");
  return t;
}

const anchorWords = (a: { kind: string; id: string | null }) => (a.kind === "schematic" ? "the whole schematic" : `${a.kind} ${a.id}`);

/** The people a message mentions (readers of the revision, not its author, not mentioned before), stored and e-mailed. */
async function mentionsIn(access: SchematicAccess, status: RevisionStatus, body: string, already: string[] = []) {
  const readers = await readersOf(access.schematic, status);
  const ids = new Set(mentionedIn(body, readers));
  return readers.filter((r) => ids.has(r.id) && r.id !== access.user.id && !already.includes(r.id));
}

export async function openThread(schematicId: string, input: unknown): Promise<Thread> {
  const access0 = await requireSchematicAccess(schematicId, "read");
  const i = newThreadInput.parse(input);
  const rev = await revisionOf(schematicId, { id: i.revisionId, issuedOnly: !i.revisionId && access0.issuedOnly });
  if (!rev) {
    if (i.revisionId) throw new UserError(404, "revisionId: no such revision of this schematic.");
    throw new UserError(409, "This schematic has no saved revision yet: threads are pinned to a revision, so save one first.");
  }
  const access = await requireWriteOn(schematicId, rev.status);
  const anchor = { kind: i.anchor.kind, id: i.anchor.kind === "schematic" ? null : i.anchor.id };
  if (!(await q.anchorExists({ revisionId: rev.id }, anchor.kind, anchor.id))) {
    throw fieldError(["anchor", "id"], `Rev ${rev.number} has no ${anchor.kind} "${anchor.id}": pin the thread to a part or pipe in that revision.`);
  }
  const people = await mentionsIn(access, rev.status, i.body);
  const made = await db().transaction((trx) => q.insertThread(trx, { schematicId, revisionId: rev.id, anchor, kind: "comment",
    authorId: access.user.id, body: i.body, mentions: people.map((p) => p.id) }));
  await mailMentions({ people, authorName: access.user.name, schematicId, revisionId: rev.id, threadId: made.threadId,
    threadNumber: made.number, anchorText: anchorWords(anchor), body: i.body });
  return oneThread(schematicId, made.threadId, { revisionId: rev.id });
}

export async function replyToThread(threadId: string, input: unknown): Promise<Thread> {
  const { access, place } = await requireThreadAccess(threadId, "write");
  const i = replyInput.parse(input);
  const people = await mentionsIn(access, place.revisionStatus, i.body);
  await q.insertMessage(db(), { threadId, authorId: access.user.id, body: i.body, mentions: people.map((p) => p.id) });
  const thread = await oneThread(place.schematicId, threadId);
  await mailMentions({ people, authorName: access.user.name, schematicId: place.schematicId, revisionId: place.revisionId, threadId,
    threadNumber: thread.number, anchorText: anchorWords(thread.anchor), body: i.body });
  return thread;
}

export async function resolveThread(threadId: string, input: unknown): Promise<Thread> {
  const { access, place } = await requireThreadAccess(threadId, "write");
  const i = resolveInput.parse(input);
  if (i.resolved !== place.resolved) await q.setResolved(threadId, access.user.id, i.resolved);
  return oneThread(place.schematicId, threadId);
}

async function ownMessage(messageId: string) {
  await requireUser();
  const m = isUuid(messageId) ? await q.messagePlace(messageId) : null;
  if (!m || m.deleted) throw new AuthError(404, "Message not found (or already deleted).");
  const { access, place } = await requireThreadAccess(m.threadId, "write");
  if (m.authorId !== access.user.id) throw new AuthError(403, "You can edit or delete only your own messages.");
  return { m, access, place };
}

export async function editMessage(messageId: string, input: unknown): Promise<Thread> {
  const { m, access, place } = await ownMessage(messageId);
  const i = editInput.parse(input);
  const fresh = await mentionsIn(access, place.revisionStatus, i.body, m.mentions);
  const still = (await readersOf(access.schematic, place.revisionStatus)).filter((r) => m.mentions.includes(r.id) && mentionedIn(i.body, [r]).length > 0);
  await q.updateMessage(messageId, i.body, [...still, ...fresh].map((p) => p.id));
  const thread = await oneThread(place.schematicId, m.threadId);
  await mailMentions({ people: fresh, authorName: access.user.name, schematicId: place.schematicId, revisionId: place.revisionId,
    threadId: m.threadId, threadNumber: thread.number, anchorText: anchorWords(thread.anchor), body: i.body });
  return thread;
}

export async function deleteOwnMessage(messageId: string): Promise<{ thread: Thread | null }> {
  const { m, place } = await ownMessage(messageId);
  const r = await q.deleteMessage(messageId, m.threadId);
  return { thread: r.threadDeleted ? null : await oneThread(place.schematicId, m.threadId) };
}

/** A refusal of one field, answered like any zod refusal: 400 {error, issues: [{path, message}]}. */
export function fieldError(path: string[], message: string): ZodError {
  return new ZodError([{ code: "custom", path, message, input: undefined }]);
}
