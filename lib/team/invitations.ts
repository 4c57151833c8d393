import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { audit } from "@/lib/audit";
import { config } from "@/lib/config";
import { invitationMessage, sendMail } from "@/lib/mail";
import { requireProjectRole } from "@/lib/auth/authorize";
import { insertUser } from "@/lib/auth/accounts";
import { UserError } from "@/lib/auth/errors";
import type { ProjectRole } from "@/lib/auth/policy";
import { requestIp } from "@/lib/auth/request-context";
import { startSession, type SessionUser } from "@/lib/auth/session";
import { hashToken, newToken } from "@/lib/auth/tokens";

// Invitations by e-mail: the owner picks the role; the link (token stored hashed) lets a
// new person sign up straight into the project, or an existing one accept. It expires
// after INVITE_TTL_MS and works once; the owner can revoke it while it is pending.

export const INVITE_TTL_MS = 7 * 24 * 60 * 60 * 1000;

export type PendingInvitation = { id: string; email: string; role: ProjectRole; invitedBy: string | null; expiresAt: string; expired: boolean };

export async function listPendingInvitations(projectId: string): Promise<PendingInvitation[]> {
  await requireProjectRole(projectId, "members.manage");
  const rows = await db()("invitations as i").leftJoin("users as u", "u.id", "i.invited_by")
    .where("i.project_id", projectId).whereNull("i.accepted_at").whereNull("i.revoked_at")
    .select("i.id", "i.email", "i.role", "u.name as invited_by", "i.expires_at").orderBy("i.created_at", "desc");
  return rows.map((r) => ({ id: r.id, email: r.email, role: r.role, invitedBy: r.invited_by, expiresAt: new Date(r.expires_at).toISOString(),
    expired: new Date(r.expires_at).getTime() <= Date.now() }));
}

export async function inviteMember(projectId: string, email: string, role: ProjectRole): Promise<{ id: string; expiresAt: string }> {
  const { user } = await requireProjectRole(projectId, "members.manage");
  const already = await db()("project_members as m").join("users as u", "u.id", "m.user_id")
    .where({ "m.project_id": projectId, "u.email": email }).first("m.role");
  if (already) throw new UserError(409, `${email} is already a member of this project (as ${already.role}).`);
  const project = await db()("projects as p").join("organisations as o", "o.id", "p.organisation_id")
    .where("p.id", projectId).first("p.name", "o.name as firm");
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + INVITE_TTL_MS);
  const id = await db().transaction(async (trx) => {
    // a new invitation to the same address replaces the pending one
    await trx("invitations").where({ project_id: projectId, email }).whereNull("accepted_at").whereNull("revoked_at").update({ revoked_at: trx.fn.now() });
    const [row] = await trx("invitations").insert({ project_id: projectId, email, role, token_hash: hash, invited_by: user.id, expires_at: expiresAt }).returning("id");
    return row.id as string;
  });
  try {
    await sendMail(invitationMessage({ to: email, inviterName: user.name, projectName: project.name, firmName: project.firm, role,
      link: `${config.appUrl}/invite/${token}`, expiresAt }));
  } catch (err) {
    console.error("[loopwright] invitation e-mail failed", err);
    await db()("invitations").where({ id }).delete();
    throw new UserError(502, "The invitation e-mail could not be sent (the mail server did not answer). Nothing was saved; please try again.");
  }
  await audit({ actorId: user.id, action: "invitation.sent", projectId, target: email, detail: { role, invitationId: id }, ip: await requestIp() });
  return { id, expiresAt: expiresAt.toISOString() };
}

export async function revokeInvitation(projectId: string, invitationId: string): Promise<void> {
  const { user } = await requireProjectRole(projectId, "members.manage");
  const n = /^[0-9a-f-]{36}$/i.test(invitationId)
    ? await db()("invitations").where({ id: invitationId, project_id: projectId }).whereNull("accepted_at").whereNull("revoked_at").update({ revoked_at: db().fn.now() })
    : 0;
  if (!n) throw new UserError(404, "That invitation is not pending any more (accepted, revoked, or never sent).");
  await audit({ actorId: user.id, action: "invitation.revoked", projectId, target: invitationId, ip: await requestIp() });
}

export type InvitationView =
  | { ok: true; id: string; email: string; role: ProjectRole; projectId: string; projectName: string; firmName: string; invitedBy: string | null; expiresAt: string; hasAccount: boolean }
  | { ok: false; reason: string };

export async function lookupInvitation(token: string, trx: Knex = db(), lock = false): Promise<InvitationView & { organisationId?: string }> {
  const q = trx("invitations as i").join("projects as p", "p.id", "i.project_id").join("organisations as o", "o.id", "p.organisation_id")
    .leftJoin("users as u", "u.id", "i.invited_by")
    .where("i.token_hash", hashToken(token))
    .first("i.id", "i.email", "i.role", "i.project_id", "i.expires_at", "i.accepted_at", "i.revoked_at", "p.name as project_name",
      "o.name as firm_name", "o.id as organisation_id", "u.name as invited_by");
  const row = await (lock ? q.forUpdate("i") : q);
  if (!row) return { ok: false, reason: "This invitation link is not valid. Check it was copied whole, or ask the project owner to send a new one." };
  if (row.accepted_at) return { ok: false, reason: "This invitation has already been used. If it was yours, sign in to open the project." };
  if (row.revoked_at) return { ok: false, reason: "This invitation was withdrawn by the project owner. Ask them for a new one if you need it." };
  if (new Date(row.expires_at).getTime() <= Date.now()) return { ok: false, reason: "This invitation has expired (invitations last 7 days). Ask the project owner to send a new one." };
  const hasAccount = !!(await trx("users").where({ email: row.email }).first("id"));
  return { ok: true, id: row.id, email: row.email, role: row.role, projectId: row.project_id, projectName: row.project_name, firmName: row.firm_name,
    invitedBy: row.invited_by, expiresAt: new Date(row.expires_at).toISOString(), hasAccount, organisationId: row.organisation_id };
}

async function join(trx: Knex, token: string, userId: string): Promise<{ projectId: string; role: ProjectRole; email: string }> {
  const inv = await lookupInvitation(token, trx, true);
  if (!inv.ok) throw new UserError(400, inv.reason);
  await trx("memberships").insert({ organisation_id: inv.organisationId, user_id: userId, role: "member" }).onConflict(["organisation_id", "user_id"]).ignore();
  await trx("project_members").insert({ project_id: inv.projectId, user_id: userId, role: inv.role }).onConflict(["project_id", "user_id"]).ignore();
  await trx("invitations").where({ id: inv.id }).update({ accepted_at: trx.fn.now() });
  return { projectId: inv.projectId, role: inv.role, email: inv.email };
}

/** Whether an invitation is for this person: its address, compared case-insensitively. */
export const invitedIs = (invitedEmail: string, user: { email: string }) => invitedEmail.toLowerCase() === user.email.toLowerCase();

export function notYourInvitation(invitedEmail: string, user: { email: string }): UserError {
  return new UserError(403, `This invitation was sent to ${invitedEmail}, and you are signed in as ${user.email}. `
    + "Sign out, then sign in (or create an account) with the invited address to join.");
}

/** A signed-in person accepts, only when the invitation was sent to their own address. Returns the project id. */
export async function acceptInvitation(user: SessionUser, token: string): Promise<string> {
  const r = await db().transaction(async (trx) => {
    const inv = await lookupInvitation(token, trx, true);
    if (inv.ok && !invitedIs(inv.email, user)) throw notYourInvitation(inv.email, user);
    return join(trx, token, user.id);
  });
  await audit({ actorId: user.id, action: "invitation.accepted", projectId: r.projectId, target: r.email, detail: { role: r.role }, ip: await requestIp() });
  return r.projectId;
}

/** A new person signs up from the link: account, firm membership, project role, session. */
export async function signUpWithInvitation(input: { token: string; name: string; password: string }): Promise<string> {
  const r = await db().transaction(async (trx) => {
    const inv = await lookupInvitation(input.token, trx, true);
    if (!inv.ok) throw new UserError(400, inv.reason);
    const userId = await insertUser(trx, { name: input.name, email: inv.email, password: input.password });
    return { userId, ...(await join(trx, input.token, userId)) };
  });
  await startSession(r.userId);
  const ip = await requestIp();
  await audit({ actorId: r.userId, action: "auth.sign-up", target: r.email, ip, detail: { viaInvitation: true } });
  await audit({ actorId: r.userId, action: "invitation.accepted", projectId: r.projectId, target: r.email, detail: { role: r.role }, ip });
  return r.projectId;
}
