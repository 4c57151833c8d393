import "server-only";
import { db } from "@/lib/db";

// Append-only audit log. Action names are dotted: auth.sign-in, auth.sign-in-failed,
// auth.sign-out, auth.password-changed, auth.password-reset, invitation.sent,
// invitation.revoked, invitation.accepted, member.role, member.removed, project.created,
// project.deleted, revision.status. Never throws: a failed audit write is logged, not
// allowed to break the action it records.
export type AuditEntry = {
  actorId: string | null;
  action: string;
  projectId?: string | null;
  target?: string | null;
  detail?: Record<string, unknown>;
  ip?: string | null;
};

export async function audit(e: AuditEntry): Promise<void> {
  try {
    await db()("audit_log").insert({
      actor_id: e.actorId, action: e.action.slice(0, 80), project_id: e.projectId ?? null,
      target: e.target?.slice(0, 200) ?? null, detail: JSON.stringify(e.detail ?? {}), ip: e.ip?.slice(0, 64) ?? null,
    });
  } catch (err) {
    console.error("[loopwright] audit write failed", e.action, err);
  }
}
