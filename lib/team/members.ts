import "server-only";
import { db } from "@/lib/db";
import { audit } from "@/lib/audit";
import { requireProjectRole } from "@/lib/auth/authorize";
import { UserError } from "@/lib/auth/errors";
import type { ProjectRole } from "@/lib/auth/policy";
import { requestIp } from "@/lib/auth/request-context";

// Project members and their roles. Every function checks the caller's role first.

export type Member = { userId: string; name: string; email: string; role: ProjectRole; since: string };

export async function listMembers(projectId: string): Promise<Member[]> {
  await requireProjectRole(projectId, "project.read");
  const rows = await db()("project_members as m").join("users as u", "u.id", "m.user_id")
    .where("m.project_id", projectId)
    .select("m.user_id", "u.name", "u.email", "m.role", "m.created_at")
    .orderByRaw("array_position(array['owner','designer','reviewer','installer','trainee']::project_role[], m.role), u.name");
  return rows.map((r) => ({ userId: r.user_id, name: r.name, email: r.email, role: r.role, since: new Date(r.created_at).toISOString() }));
}

async function ownerCount(projectId: string): Promise<number> {
  const row = await db()("project_members").where({ project_id: projectId, role: "owner" }).count<{ n: string }[]>("* as n").first();
  return Number(row?.n ?? 0);
}

export async function changeMemberRole(projectId: string, userId: string, role: ProjectRole): Promise<void> {
  const { user } = await requireProjectRole(projectId, "members.manage");
  const current = await db()("project_members").where({ project_id: projectId, user_id: userId }).first("role");
  if (!current) throw new UserError(404, "That person is not a member of this project.");
  if (current.role === role) return;
  if (current.role === "owner" && (await ownerCount(projectId)) <= 1) {
    throw new UserError(409, "A project needs at least one owner: make someone else owner first.");
  }
  await db()("project_members").where({ project_id: projectId, user_id: userId }).update({ role });
  await audit({ actorId: user.id, action: "member.role", projectId, target: userId, detail: { from: current.role, to: role }, ip: await requestIp() });
}

export async function removeMember(projectId: string, userId: string): Promise<void> {
  const { user } = await requireProjectRole(projectId, "members.manage");
  const current = await db()("project_members").where({ project_id: projectId, user_id: userId }).first("role");
  if (!current) throw new UserError(404, "That person is not a member of this project.");
  if (current.role === "owner" && (await ownerCount(projectId)) <= 1) {
    throw new UserError(409, "A project needs at least one owner: make someone else owner before removing this one.");
  }
  await db()("project_members").where({ project_id: projectId, user_id: userId }).delete();
  await audit({ actorId: user.id, action: "member.removed", projectId, target: userId, detail: { role: current.role }, ip: await requestIp() });
}
