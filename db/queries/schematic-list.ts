import "server-only";
import { db } from "@/lib/db";
import { can, type ProjectRole } from "@/lib/auth/policy";
import { mapRevision, type SchematicSummary } from "./schematic-rows";

/**
 * The project page's list: team schematics and their variants for every member,
 * practice variants for the trainee who made them and for the roles that read others'
 * (lib/auth/policy.ts "variant.read-practice", the rule requireSchematicAccess applies), each
 * with its revisions newest first. Installers, who work only from issued revisions,
 * get only schematics with an issued revision and only the issued revisions (messages
 * included), as the API serves them. Two queries, grouped here, instead of one per schematic.
 */
const issued = () => db()("schematic_revisions as i").where("i.status", "issued").select(db().raw("1"));

export async function listProjectSchematics(projectId: string, userId: string, role: ProjectRole): Promise<SchematicSummary[]> {
  const issuedOnly = role === "installer";
  const list = db()("schematics as s").leftJoin("users as u", "u.id", "s.owner_id")
    .where("s.project_id", projectId)
    .select("s.id", "s.name", "s.kind", "s.owner_id", "u.name as owner_name", "s.variant_of", "s.updated_at")
    .orderBy([{ column: "s.kind", order: "asc" }, { column: "s.created_at", order: "asc" }]);
  if (!can(role, "variant.read-practice")) list.andWhere((q) => q.where("s.kind", "team").orWhere("s.owner_id", userId));
  if (issuedOnly) list.where("s.kind", "team").whereExists(issued().whereRaw("i.schematic_id = s.id"));
  const rows = await list;
  const ids = rows.map((r) => r.id as string);
  const revList = db()("schematic_revisions as r").leftJoin("users as u", "u.id", "r.author_id")
    .whereIn("r.schematic_id", ids)
    .select("r.id", "r.schematic_id", "r.number", "r.status", "r.message", "r.author_id", "u.name as author_name",
      "r.created_at", "r.status_changed_at")
    .orderBy("r.number", "desc");
  if (issuedOnly) revList.where("r.status", "issued");
  const revs = ids.length === 0 ? [] : await revList;
  const bySchematic = new Map<string, ReturnType<typeof mapRevision>[]>();
  for (const r of revs.map(mapRevision)) bySchematic.set(r.schematicId, [...(bySchematic.get(r.schematicId) ?? []), r]);
  return rows.map((r) => {
    const list = bySchematic.get(r.id) ?? [];
    const top = list[0];
    return {
      id: r.id, name: r.name, kind: r.kind, ownerId: r.owner_id ?? null, ownerName: r.owner_name ?? null,
      variantOf: r.variant_of ?? null, updatedAt: new Date(r.updated_at).toISOString(),
      latest: top ? { number: top.number, status: top.status, message: top.message } : null,
      revisions: list.map(({ id, number, status, message, authorName, createdAt }) => ({ id, number, status, message, authorName, createdAt })),
    };
  });
}
