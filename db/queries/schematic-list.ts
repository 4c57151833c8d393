import "server-only";
import { db } from "@/lib/db";
import { mapRevision, type SchematicSummary } from "./schematic-rows";

/**
 * The project page's list: team schematics and their variants for every member,
 * practice variants only for the trainee who made them (they are private), each
 * with its revisions newest first. Two queries, grouped here, instead of one per schematic.
 */
export async function listProjectSchematics(projectId: string, userId: string): Promise<SchematicSummary[]> {
  const rows = await db()("schematics as s").leftJoin("users as u", "u.id", "s.owner_id")
    .where("s.project_id", projectId)
    .andWhere((q) => q.where("s.kind", "team").orWhere("s.owner_id", userId))
    .select("s.id", "s.name", "s.kind", "s.owner_id", "u.name as owner_name", "s.variant_of", "s.updated_at")
    .orderBy([{ column: "s.kind", order: "asc" }, { column: "s.created_at", order: "asc" }]);
  const ids = rows.map((r) => r.id as string);
  const revs = ids.length === 0 ? [] : await db()("schematic_revisions as r").leftJoin("users as u", "u.id", "r.author_id")
    .whereIn("r.schematic_id", ids)
    .select("r.id", "r.schematic_id", "r.number", "r.status", "r.message", "r.author_id", "u.name as author_name",
      "r.created_at", "r.status_changed_at")
    .orderBy("r.number", "desc");
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
