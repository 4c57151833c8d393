import "server-only";
import { db } from "@/lib/db";
import { audit } from "@/lib/audit";
import { requestIp } from "@/lib/auth/request-context";
import { AuthError, UserError } from "@/lib/auth/errors";
import { requireSchematicAccess } from "@/lib/auth/authorize";
import { requireRevisionAccess } from "@/lib/auth/revision-access";
import { getRevision } from "@/db/queries/schematics";
import { parseSchematic, type Schematic } from "@/lib/schematic";

// Restore an old revision as a new draft: the working draft becomes that revision's
// document (the revision itself, like every revision, stays as it is). Like "start a new
// draft", it also opens an issued schematic for editing again. Anyone editing the draft
// meanwhile is told by autosave's conflict check (the lock version moves on), and live
// boards reload it (the draft trigger announces it).

export interface RestoredDraft { schematicId: string; lockVersion: number; updatedAt: string; document: Schematic; restoredFrom: { id: string; number: number } }

export async function restoreRevision(revisionId: string): Promise<RestoredDraft> {
  const { schematic } = await requireRevisionAccess(revisionId);
  const { user } = await requireSchematicAccess(schematic.id, "edit");
  const revision = await getRevision(revisionId);
  if (!revision) throw new AuthError(404, "Revision not found, or you are not a member of its project.");
  const parsed = parseSchematic(revision.document);
  if (!parsed.ok) throw new UserError(409, `Rev ${revision.number} cannot be restored: its stored document is not valid (${parsed.issues[0]?.message}).`);
  const restored = await db().transaction(async (trx) => {
    const [row] = await trx("schematics").where({ id: schematic.id })
      .update({ draft: JSON.stringify(parsed.doc), lock_version: trx.raw("lock_version + 1"), updated_by: user.id, updated_at: trx.fn.now() })
      .returning(["lock_version", "updated_at"]);
    await trx("revision_events").insert({ schematic_id: schematic.id, revision_id: revisionId, kind: "restored", actor_id: user.id });
    return { schematicId: schematic.id, lockVersion: row.lock_version, updatedAt: new Date(row.updated_at).toISOString(), document: parsed.doc,
      restoredFrom: { id: revisionId, number: revision.number } };
  });
  await audit({ actorId: user.id, action: "revision.restored", projectId: schematic.projectId, target: revisionId,
    detail: { schematicId: schematic.id, number: revision.number }, ip: await requestIp() });
  return restored;
}
