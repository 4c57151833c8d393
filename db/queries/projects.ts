import "server-only";
import { db } from "@/lib/db";

export type ProjectSummary = {
  id: string;
  name: string;
  client: string;
  site: string;
  role: string;
  schematicCount: number;
  latestStatus: string | null;
  updatedAt: string;
  /** Set when the project was archived (kept for its issued revisions instead of deleted). */
  archivedAt: string | null;
};

// Projects the user is a member of, with their role and the newest revision's status.
// What a role may not see is left out of the counts too: installers see only team
// schematics with an issued revision, and only issued revisions' statuses.
export async function listProjectsForUser(userId: string): Promise<ProjectSummary[]> {
  const q = db()("projects as p")
    .join("project_members as m", function () {
      this.on("m.project_id", "p.id").andOn("m.user_id", db().raw("?", [userId]));
    })
    .select(
      "p.id", "p.name", "p.client", "p.site", "p.updated_at", "p.archived_at", "m.role",
      db().raw(`(select count(*)::int from schematics s where s.project_id = p.id and s.kind = 'team'
                 and (m.role <> 'installer' or exists (select 1 from schematic_revisions i where i.schematic_id = s.id and i.status = 'issued'))) as schematic_count`),
      db().raw(`(select r.status from schematic_revisions r join schematics s on s.id = r.schematic_id
                 where s.project_id = p.id and (m.role <> 'installer' or r.status = 'issued')
                   and (s.kind = 'team' or s.owner_id = m.user_id)
                 order by r.created_at desc limit 1) as latest_status`),
    )
    .orderByRaw("p.archived_at is not null, p.name");
  const rows = await q;
  return rows.map((r) => ({
    id: r.id, name: r.name, client: r.client, site: r.site, role: r.role,
    schematicCount: r.schematic_count, latestStatus: r.latest_status ?? null,
    updatedAt: new Date(r.updated_at).toISOString(), archivedAt: r.archived_at ? new Date(r.archived_at).toISOString() : null,
  }));
}
