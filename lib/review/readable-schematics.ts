import "server-only";
import { db } from "@/lib/db";
import { requireProjectRole } from "@/lib/auth/authorize";
import { can } from "@/lib/auth/policy";
import type { RevisionStatus } from "@/lib/revisions/transitions";

// GET /api/v1/projects/{id}/schematics: the schematics of a project the caller may read,
// by the same rule as lib/auth's requireSchematicAccess (a test holds the two together):
// team schematics for every member (installers: once a revision is issued, and then the
// newest issued one is their latest); practice variants for their maker and the roles with
// "variant.read-practice" (the project's owners and reviewers).

export interface ReadableSchematic {
  id: string; name: string; kind: "team" | "practice"; ownerId: string | null; variantOf: string | null;
  latestRevision: { id: string; number: number; status: RevisionStatus } | null;
}

export async function readableSchematics(projectId: string): Promise<ReadableSchematic[]> {
  const { user, role } = await requireProjectRole(projectId, "schematic.read");
  const installer = role === "installer";
  type Row = { id: string; name: string; kind: "team" | "practice"; owner_id: string | null; variant_of: string | null; latest: ReadableSchematic["latestRevision"] };
  const rows: Row[] = await db()("schematics as s").where("s.project_id", projectId)
    .modify((q) => { if (!can(role, "variant.read-practice")) q.andWhere((w) => w.where("s.kind", "team").orWhere("s.owner_id", user.id)); })
    .select("s.id", "s.name", "s.kind", "s.owner_id", "s.variant_of",
      db().raw(`(select json_build_object('id', r.id, 'number', r.number, 'status', r.status) from schematic_revisions r
        where r.schematic_id = s.id ${installer ? "and r.status = 'issued'" : ""} order by r.number desc limit 1) as latest`))
    .orderBy([{ column: "s.kind", order: "asc" }, { column: "s.created_at", order: "asc" }]);
  return rows
    .filter((r) => !(installer && r.kind === "team" && !r.latest))
    .map((r) => ({ id: r.id, name: r.name, kind: r.kind, ownerId: r.owner_id ?? null, variantOf: r.variant_of ?? null, latestRevision: r.latest ?? null }));
}
