import "server-only";
import { db } from "@/lib/db";
import { audit } from "@/lib/audit";
import { AuthError, UserError } from "@/lib/auth/errors";
import { isUuid, requireProjectRole, requireSchematicAccess, requireUser } from "@/lib/auth/authorize";
import { requestIp } from "@/lib/auth/request-context";
import { getRevision, type RevisionRecord } from "@/db/queries/schematics";
import { mapRevision } from "@/db/queries/schematic-rows";
import { insertThread } from "@/db/queries/threads";
import { findTransition, type RevisionStatus } from "@/lib/revisions/transitions";
import type { StatusStep } from "@/lib/mail";
import { noSelfApproval } from "./firm-rule";
import { statusInput } from "./inputs";
import { mailStep } from "./notify";
import { fieldError } from "./threads";

// The approval path, told: submit, approve, send back (a reason is required and becomes a
// thread on the whole schematic) and issue. Each move is one transaction — the status, the
// history row, the send-back thread — then one e-mail to each member concerned (not the
// person who acted) and an audit entry. The firm's rule "a reviewer may not approve a
// revision they authored" is checked here, on the server.

/** The step each target status is (the workflow's only move back to draft is a send-back). */
const stepTo: Record<RevisionStatus, StatusStep> = { "in-review": "submitted", approved: "approved", issued: "issued", draft: "sent-back" };

type Person = { id: string; name: string; email: string };

/** Who is told: the designer who submitted hears of approval and send-back; reviewers of submissions; issue reaches both, and installers. */
async function concerned(revision: RevisionRecord & { projectId: string }, step: StatusStep): Promise<Person[]> {
  const members = await db()("project_members as m").join("users as u", "u.id", "m.user_id").where("m.project_id", revision.projectId)
    .select("u.id", "u.name", "u.email", "m.role");
  const submit = await db()("revision_events").where({ revision_id: revision.id, kind: "status", to_status: "in-review" })
    .orderBy("at", "desc").first("actor_id");
  const submitter = members.filter((m) => m.id === (submit?.actor_id ?? revision.authorId));
  const reviewers = members.filter((m) => m.role === "reviewer");
  const deciders = reviewers.length > 0 ? reviewers : members.filter((m) => m.role === "owner");
  if (step === "submitted") return deciders;
  if (step === "issued") return [...submitter, ...deciders, ...members.filter((m) => m.role === "installer")];
  return submitter;
}

export async function moveRevisionStatus(revisionId: string, input: unknown): Promise<{ revision: RevisionRecord; threadId: string | null; mailed: { sent: number; failed: number } }> {
  await requireUser();
  const revision = isUuid(revisionId) ? await getRevision(revisionId) : null;
  if (!revision) throw new AuthError(404, "Revision not found, or you are not a member of its project.");
  const access = await requireSchematicAccess(revision.schematicId, "read");
  // an installer reads issued revisions only: nothing about another (not even its status) is told
  if (access.issuedOnly && revision.status !== "issued") throw new AuthError(404, "Revision not found, or you are not a member of its project.");
  const i = statusInput.parse(input);
  const move = findTransition(revision.status, i.status);
  if (!move) throw new UserError(409, `status: a revision cannot move from ${revision.status} to ${i.status} (Rev ${revision.number} is ${revision.status}).`);
  const { user } = await requireProjectRole(revision.projectId, move.action);
  const step = stepTo[i.status];
  const reason = i.reason?.trim() ?? "";
  if (step === "sent-back" && !reason) throw fieldError(["reason"], "say why it is sent back: the reason becomes a thread the designer answers");
  if (step === "approved" && revision.authorId === user.id && (await noSelfApproval(revision.projectId))) {
    throw new AuthError(403, `Your firm's rule: a reviewer may not approve a revision they authored. You saved Rev ${revision.number}; ask another reviewer to approve it.`);
  }

  const out = await db().transaction(async (trx) => {
    const [row] = await trx("schematic_revisions").where({ id: revisionId, status: revision.status })
      .update({ status: i.status, status_changed_at: trx.fn.now() }).returning("*");
    if (!row) return null;
    const thread = step === "sent-back"
      ? await insertThread(trx, { schematicId: revision.schematicId, revisionId, anchor: { kind: "schematic", id: null }, kind: "send-back",
        authorId: user.id, body: reason, mentions: [] })
      : null;
    await trx("revision_events").insert({ schematic_id: revision.schematicId, revision_id: revisionId, kind: "status", from_status: revision.status,
      to_status: i.status, thread_id: thread?.threadId ?? null, actor_id: user.id });
    return { revision: { ...mapRevision(row), authorName: revision.authorName }, threadId: thread?.threadId ?? null };
  });
  if (!out) throw new UserError(409, "Someone changed this revision's status first; reload to see it.");

  await audit({ actorId: user.id, action: "revision.status", projectId: revision.projectId, target: revisionId,
    detail: { schematicId: revision.schematicId, number: revision.number, from: revision.status, to: i.status }, ip: await requestIp() });
  const people = (await concerned(revision, step)).filter((p, k, all) => p.id !== user.id && all.findIndex((q) => q.id === p.id) === k);
  const mailed = await mailStep({ people, step, actorName: user.name, schematicId: revision.schematicId, revisionId,
    threadId: out.threadId ?? undefined, reason: step === "sent-back" ? reason : undefined });
  return { ...out, mailed };
}
