import "server-only";
import { db } from "@/lib/db";

// Creating, changing and deleting projects (the list is in ./projects.ts).

export type NewProject = { name: string; client: string; clientEmail?: string; site: string; design: Record<string, unknown> };
export type ProjectChange = { name?: string; client?: string; clientEmail?: string; site?: string; design?: Record<string, unknown>; archived?: boolean };

export interface ProjectHead {
  id: string;
  name: string;
  client: string;
  /** Where the handover report is sent ("" when not given). */
  clientEmail: string;
  site: string;
  firm: string;
  organisationId: string;
  /** Design defaults as stored (lib/projects/design-defaults reads them). */
  design: unknown;
  archivedAt: string | null;
}

/** The firm a new project of this user belongs to: the first one they joined. */
export async function firmOfUser(userId: string): Promise<string | null> {
  const row = await db()("memberships").where({ user_id: userId }).orderBy("created_at").first("organisation_id");
  return row?.organisation_id ?? null;
}

export async function projectNameTaken(organisationId: string, name: string): Promise<boolean> {
  return !!(await db()("projects").where({ organisation_id: organisationId }).whereRaw("lower(name) = lower(?)", [name]).first("id"));
}

/** Whether the person may start projects in the firm: its owners, and whoever holds one of `roles` on a project of it. */
export async function mayCreateProjects(organisationId: string, userId: string, roles: readonly string[]): Promise<boolean> {
  const owner = await db()("memberships").where({ organisation_id: organisationId, user_id: userId, role: "owner" }).first("user_id");
  if (owner) return true;
  const role = await db()("project_members as m").join("projects as p", "p.id", "m.project_id")
    .where({ "p.organisation_id": organisationId, "m.user_id": userId }).whereIn("m.role", roles).first("m.role");
  return !!role;
}

/**
 * The project, its creator as owner, and any starting schematics (drafts), in one transaction; null
 * when the firm already has a project of that name (any case; the unique index decides races).
 */
export async function insertProject(organisationId: string, userId: string, p: NewProject, schematics: { name: string; doc: unknown }[] = []):
  Promise<{ id: string; name: string } | null> {
  try {
    return await db().transaction(async (trx) => {
      const [row] = await trx("projects").insert({ organisation_id: organisationId, name: p.name, client: p.client, client_email: p.clientEmail ?? "", site: p.site,
        design_conditions: JSON.stringify(p.design), created_by: userId }).returning(["id", "name"]);
      await trx("project_members").insert({ project_id: row.id, user_id: userId, role: "owner" });
      for (const s of schematics) {
        await trx("schematics").insert({ project_id: row.id, name: s.name, kind: "team", owner_id: userId, draft: JSON.stringify(s.doc), updated_by: userId });
      }
      return { id: row.id, name: row.name };
    });
  } catch (e) {
    if ((e as { code?: string }).code === "23505") return null;
    throw e;
  }
}

/** Rename, change client, site or design conditions, archive or restore: any subset. */
export async function updateProjectRow(projectId: string, c: ProjectChange): Promise<void> {
  const row: Record<string, unknown> = { updated_at: db().fn.now() };
  if (c.name !== undefined) row.name = c.name;
  if (c.client !== undefined) row.client = c.client;
  if (c.clientEmail !== undefined) row.client_email = c.clientEmail;
  if (c.site !== undefined) row.site = c.site;
  if (c.design !== undefined) row.design_conditions = JSON.stringify(c.design);
  if (c.archived !== undefined) row.archived_at = c.archived ? db().fn.now() : null;
  await db()("projects").where({ id: projectId }).update(row);
}

/** How many issued revisions the project's schematics hold (they cannot be deleted). */
export async function issuedRevisionCount(projectId: string): Promise<number> {
  const row = await db()("schematic_revisions as r").join("schematics as s", "s.id", "r.schematic_id")
    .where({ "s.project_id": projectId, "r.status": "issued" }).count<{ n: string }[]>("* as n").first();
  return Number(row?.n ?? 0);
}

export async function archiveProjectRow(projectId: string): Promise<void> {
  await db()("projects").where({ id: projectId }).whereNull("archived_at").update({ archived_at: db().fn.now(), updated_at: db().fn.now() });
}

export async function getProjectHead(projectId: string): Promise<ProjectHead | null> {
  const row = await db()("projects as p").join("organisations as o", "o.id", "p.organisation_id")
    .where("p.id", projectId).first("p.id", "p.name", "p.client", "p.client_email", "p.site", "o.name as firm", "p.organisation_id", "p.design_conditions", "p.archived_at");
  return row ? { id: row.id, name: row.name, client: row.client, clientEmail: row.client_email, site: row.site, firm: row.firm, organisationId: row.organisation_id,
    design: row.design_conditions, archivedAt: row.archived_at ? new Date(row.archived_at).toISOString() : null } : null;
}

export async function deleteProjectRow(projectId: string): Promise<number> {
  return db()("projects").where({ id: projectId }).delete();
}
