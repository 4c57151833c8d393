import "server-only";
import { db } from "@/lib/db";
import { AuthError } from "@/lib/auth/errors";
import { requireUser } from "@/lib/auth/authorize";

// The firm's rule "a reviewer may not approve a revision they authored" (on unless the
// firm turns it off). Read where approvals are made; changed by a firm owner only.

export async function noSelfApproval(projectId: string): Promise<boolean> {
  const row = await db()("projects as p").join("organisations as o", "o.id", "p.organisation_id").where("p.id", projectId).first("o.no_self_approval");
  return row?.no_self_approval !== false;
}

/** The caller's firm (the one they own) and its rule; null when they own none. */
export async function ownedFirm(): Promise<{ id: string; name: string; noSelfApproval: boolean } | null> {
  const user = await requireUser();
  const row = await db()("memberships as m").join("organisations as o", "o.id", "m.organisation_id")
    .where({ "m.user_id": user.id, "m.role": "owner" }).orderBy("o.created_at").first("o.id", "o.name", "o.no_self_approval");
  return row ? { id: row.id, name: row.name, noSelfApproval: row.no_self_approval } : null;
}

export async function setNoSelfApproval(on: boolean): Promise<{ noSelfApproval: boolean; firmId: string; actorId: string }> {
  const user = await requireUser();
  const firm = await ownedFirm();
  if (!firm) throw new AuthError(403, "Only an owner of the firm can change the firm's review rule; you are not one.");
  await db()("organisations").where({ id: firm.id }).update({ no_self_approval: on });
  return { noSelfApproval: on, firmId: firm.id, actorId: user.id };
}
