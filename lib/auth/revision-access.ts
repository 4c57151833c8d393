import "server-only";
import { db } from "@/lib/db";
import { AuthError, isUuid, requireSchematicAccess, requireUser, type SchematicAccess } from "./authorize";

/**
 * May the caller read this revision? The schematic's read rule (requireSchematicAccess),
 * and for installers only issued revisions. A revision that does not exist answers as one
 * the caller may not see (404), so ids cannot be probed.
 */
export async function requireRevisionAccess(revisionId: string): Promise<SchematicAccess & { revisionStatus: string }> {
  await requireUser(); // signed out → 401 before anything is looked up
  const row = isUuid(revisionId) ? await db()("schematic_revisions").where({ id: revisionId }).first("schematic_id", "status") : undefined;
  if (!row) throw new AuthError(404, "Revision not found, or you are not a member of its project.");
  const access = await requireSchematicAccess(row.schematic_id, "read");
  if (access.issuedOnly && row.status !== "issued") throw new AuthError(403, "Installers see issued revisions only; this one is not issued.");
  return { ...access, revisionStatus: row.status };
}
