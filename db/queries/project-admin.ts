import "server-only";
import { db } from "@/lib/db";

// Creating and deleting projects (the list is in ./projects.ts).

export type NewProject = { name: string; client: string; site: string };

/** The firm a new project of this user belongs to: the first one they joined. */
export async function firmOfUser(userId: string): Promise<string | null> {
  const row = await db()("memberships").where({ user_id: userId }).orderBy("created_at").first("organisation_id");
  return row?.organisation_id ?? null;
}

export async function projectNameTaken(organisationId: string, name: string): Promise<boolean> {
  return !!(await db()("projects").where({ organisation_id: organisationId }).whereRaw("lower(name) = lower(?)", [name]).first("id"));
}

export async function insertProject(organisationId: string, userId: string, p: NewProject): Promise<{ id: string; name: string }> {
  return db().transaction(async (trx) => {
    const [row] = await trx("projects").insert({ organisation_id: organisationId, name: p.name, client: p.client, site: p.site, created_by: userId })
      .returning(["id", "name"]);
    await trx("project_members").insert({ project_id: row.id, user_id: userId, role: "owner" });
    return { id: row.id, name: row.name };
  });
}

export async function getProjectHead(projectId: string): Promise<{ id: string; name: string; client: string; site: string; firm: string } | null> {
  const row = await db()("projects as p").join("organisations as o", "o.id", "p.organisation_id")
    .where("p.id", projectId).first("p.id", "p.name", "p.client", "p.site", "o.name as firm");
  return row ?? null;
}

export async function deleteProjectRow(projectId: string): Promise<number> {
  return db()("projects").where({ id: projectId }).delete();
}
