import "server-only";
import { db } from "@/lib/db";
import { config } from "@/lib/config";
import { mentionMessage, revisionStepMessage, sendMail, type Message, type ReviewPlace, type StatusStep } from "@/lib/mail";
import { boardPath } from "./links";

// The review e-mails, sent through the same mail path as invitations (lib/mail). One
// e-mail per person per event; the person who acted gets none. A mail server that does
// not answer does not undo what was done: the failure is logged and counted.

export async function placeOf(schematicId: string, revisionId: string): Promise<ReviewPlace & { projectId: string }> {
  const row = await db()("schematics as s").join("projects as p", "p.id", "s.project_id")
    .join("schematic_revisions as r", "r.schematic_id", "s.id").where({ "s.id": schematicId, "r.id": revisionId })
    .first("p.id as project_id", "p.name as project_name", "s.name as schematic_name", "r.number");
  return { projectId: row.project_id, projectName: row.project_name, schematicName: row.schematic_name, revisionNumber: row.number };
}

export const linkTo = (projectId: string, schematicId: string, at: { thread?: string; rev?: string }) =>
  `${config.appUrl}${boardPath(projectId, schematicId, at)}`;

async function sendAll(messages: Message[]): Promise<{ sent: number; failed: number }> {
  const results = await Promise.allSettled(messages.map((m) => sendMail(m)));
  const failed = results.filter((r) => r.status === "rejected");
  for (const f of failed) console.error("[loopwright] review e-mail failed", (f as PromiseRejectedResult).reason);
  return { sent: results.length - failed.length, failed: failed.length };
}

type Recipient = { id: string; name: string; email: string };

export async function mailMentions(o: { people: Recipient[]; authorName: string; schematicId: string; revisionId: string;
  threadId: string; threadNumber: number; anchorText: string; body: string }) {
  if (o.people.length === 0) return { sent: 0, failed: 0 };
  const place = await placeOf(o.schematicId, o.revisionId);
  const link = linkTo(place.projectId, o.schematicId, { thread: o.threadId });
  return sendAll(o.people.map((p) => mentionMessage({ to: p.email, authorName: o.authorName, place, threadNumber: o.threadNumber,
    anchorText: o.anchorText, body: o.body, link })));
}

export async function mailStep(o: { people: Recipient[]; step: StatusStep; actorName: string; schematicId: string; revisionId: string;
  threadId?: string; reason?: string }) {
  if (o.people.length === 0) return { sent: 0, failed: 0 };
  const place = await placeOf(o.schematicId, o.revisionId);
  const link = linkTo(place.projectId, o.schematicId, o.threadId ? { thread: o.threadId } : { rev: o.revisionId });
  return sendAll(o.people.map((p) => revisionStepMessage({ to: p.email, step: o.step, actorName: o.actorName, place, link, reason: o.reason })));
}
