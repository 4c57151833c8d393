import "server-only";
import { AuthError, isUuid, requireProjectRole, requireSchematicAccess } from "@/lib/auth/authorize";
import { getAttachment, listedAttachments, type AttachmentRow } from "@/db/queries/attachments";
import { publicAttachment, type PublicAttachment } from "./uploads";

// Reading attachments: every project member who may read the site sheet, limited to those
// pinned to schematics they can read (installers: issued ones only).

async function mayRead(schematicId: string): Promise<boolean> {
  try {
    await requireSchematicAccess(schematicId, "read");
    return true;
  } catch (e) {
    if (e instanceof AuthError) return false;
    throw e;
  }
}

export async function listAttachments(projectId: string): Promise<PublicAttachment[]> {
  await requireProjectRole(projectId, "site.read");
  const rows = await listedAttachments(projectId);
  const readable = new Map<string, boolean>();
  for (const id of new Set(rows.map((r) => r.schematicId).filter((x): x is string => x !== null))) readable.set(id, await mayRead(id));
  return rows.filter((r) => r.schematicId === null || readable.get(r.schematicId)).map(publicAttachment);
}

/** A listed attachment the caller may read, or 404 (ids of others' files are not confirmed). */
export async function readableAttachment(id: string): Promise<AttachmentRow> {
  const row = isUuid(id) ? await getAttachment(id) : null;
  if (!row || row.status !== "listed") throw new AuthError(404, "File not found, or you are not a member of its project.");
  await requireProjectRole(row.projectId, "site.read");
  if (row.schematicId && !(await mayRead(row.schematicId))) throw new AuthError(404, "File not found, or you are not a member of its project.");
  return row;
}
