import "server-only";
import { db } from "@/lib/db";
import { AuthError } from "@/lib/auth/errors";
import { requireProjectRole } from "@/lib/auth/authorize";

// The firm's rule "a reviewer may not approve a revision they authored" (on unless the
// firm turns it off). Read where approvals are made (status-move.ts); shown on a project's
// Team page; changed there by an owner of the project's firm only.

export async function noSelfApproval(projectId: string): Promise<boolean> {
  const row = await db()("projects as p").join("organisations as o", "o.id", "p.organisation_id").where("p.id", projectId).first("o.no_self_approval");
  return row?.no_self_approval !== false;
}

/** The project's firm, its rule, and whether the caller owns the firm (may change it). */
export async function firmRuleOf(projectId: string): Promise<{ firmId: string; firmName: string; noSelfApproval: boolean; mayChange: boolean; userId: string }> {
  const { user } = await requireProjectRole(projectId, "project.read");
  const row = await db()("projects as p").join("organisations as o", "o.id", "p.organisation_id")
    .leftJoin("memberships as m", (j) => j.on("m.organisation_id", "o.id").andOnVal("m.user_id", "=", user.id))
    .where("p.id", projectId).first("o.id", "o.name", "o.no_self_approval", "m.role");
  return { firmId: row.id, firmName: row.name, noSelfApproval: row.no_self_approval, mayChange: row.role === "owner", userId: user.id };
}

export async function setNoSelfApproval(projectId: string, on: boolean): Promise<{ noSelfApproval: boolean; firmId: string; actorId: string }> {
  const firm = await firmRuleOf(projectId);
  if (!firm.mayChange) throw new AuthError(403, `Only an owner of ${firm.firmName} can change the firm's review rule.`);
  await db()("organisations").where({ id: firm.firmId }).update({ no_self_approval: on });
  return { noSelfApproval: on, firmId: firm.firmId, actorId: firm.userId };
}
