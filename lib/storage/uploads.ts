import "server-only";
import { randomUUID } from "node:crypto";
import { z } from "zod";
import { AuthError, isUuid, requireProjectRole, requireSchematicAccess } from "@/lib/auth/authorize";
import { UserError } from "@/lib/auth/errors";
import { getAttachment, insertPending, settle, type AttachmentRow } from "@/db/queries/attachments";
import { newestIssuedRevision } from "@/db/queries/site-events";
import { getRevision } from "@/db/queries/schematics";
import { checkFile, isAccepted, kinds, limitsText, MB, SNIFF_BYTES } from "./file-check";
import { deleteObject, objectSize, presignPut, putObject, readObject } from "./s3";
import { thumbnailOf } from "./thumbnail";

// Photos and documents go straight from the browser to the object store: the server hands out
// a presigned PUT for a pending upload, then (on "complete") reads the stored bytes, checks
// what they really are and their size, makes a thumbnail of a photo, and only then lists it.
// Whatever fails the check is deleted from the store and the answer says why.

export const uploadRequestSchema = z.object({
  /** optional: the phone's own id for a photo taken offline, so a resend reuses the same upload */
  id: z.uuid().optional(),
  filename: z.string().trim().min(1).max(200),
  contentType: z.string().trim().min(1).max(120),
  size: z.number().int().min(1, "the file is empty"),
  target: z.object({ schematicId: z.string().min(1), id: z.string().trim().min(1).max(120).optional() }).nullable().optional(),
});

const safeName = (name: string) => name.replace(/[^\w.\-]+/g, "_").slice(-120) || "file";
const thumbKey = (a: { projectId: string; id: string }) => `projects/${a.projectId}/thumbnails/${a.id}.webp`;

/** A project-scoped pin (schematic and part or pipe) the caller can read, on the issued revision. */
async function checkTarget(projectId: string, target: { schematicId: string; id?: string }): Promise<void> {
  const access = await requireSchematicAccess(target.schematicId, "read");
  if (access.schematic.projectId !== projectId) throw new AuthError(404, "Schematic not found in this project.");
  if (!target.id) return;
  const issued = await newestIssuedRevision(target.schematicId);
  const doc = issued ? ((await getRevision(issued.id))?.document as { parts?: { id: string }[]; pipes?: { id: string }[] } | undefined) : undefined;
  const ids = new Set([...(doc?.parts ?? []), ...(doc?.pipes ?? [])].map((x) => x.id));
  if (!ids.has(target.id)) throw new UserError(400, `target.id: no pipe or part "${target.id}" on the issued revision of this schematic.`);
}

export async function createUpload(projectId: string, body: unknown): Promise<{ uploadId: string; url: string | null; status: string }> {
  const { user } = await requireProjectRole(projectId, "site.record");
  const req = uploadRequestSchema.parse(body);
  if (!isAccepted(req.contentType)) throw new UserError(415, `contentType: "${req.contentType}" is not taken; only ${limitsText}.`);
  const max = kinds[req.contentType].maxBytes;
  if (req.size > max) throw new UserError(413, `size: ${(req.size / MB).toFixed(1)} MB is over the limit; ${limitsText}.`);
  if (req.target) await checkTarget(projectId, req.target);
  const id = req.id ?? randomUUID();
  const storageKey = `projects/${projectId}/uploads/${id}/${safeName(req.filename)}`;
  const fresh = await insertPending({ id, projectId, schematicId: req.target?.schematicId ?? null, target: req.target?.id ?? null,
    storageKey, fileName: req.filename, declaredType: req.contentType, sizeBytes: req.size, uploadedBy: user.id });
  const row = fresh ? null : await getAttachment(id);
  if (row && (row.uploadedBy !== user.id || row.projectId !== projectId)) throw new UserError(409, "id: that id belongs to another upload; make a new one.");
  if (row && row.status !== "pending") return { uploadId: id, url: null, status: row.status };
  const key = row?.storageKey ?? storageKey;
  return { uploadId: id, url: await presignPut(key, req.contentType, row?.sizeBytes ?? req.size), status: "pending" };
}

/** The uploader (or a project owner) settles an upload: checked and listed, or refused and deleted. */
export async function completeUpload(uploadId: string): Promise<{ status: number; body: Record<string, unknown> }> {
  const row = isUuid(uploadId) ? await getAttachment(uploadId) : null;
  if (!row) throw new AuthError(404, "Upload not found, or you are not a member of its project.");
  const { user, role } = await requireProjectRole(row.projectId, "site.record");
  if (row.uploadedBy !== user.id && role !== "owner") throw new AuthError(403, "Only the person who uploaded a file (or a project owner) can complete it.");
  if (row.status === "listed") return { status: 200, body: { attachment: publicAttachment(row) } };
  if (row.status === "refused") return { status: 409, body: { error: `This upload was refused: ${row.refusedReason}` } };
  const size = await objectSize(row.storageKey);
  if (size === null) return { status: 409, body: { error: "Nothing has been uploaded for this yet: PUT the file to its url first, then complete it." } };
  const verdict = await checkFile(row.fileName, await readObject(row.storageKey, SNIFF_BYTES), size);
  let thumbnailKey: string | null = null;
  let refusal: { status: number; reason: string } | null = verdict.ok ? null : verdict;
  if (verdict.ok && verdict.type.startsWith("image/")) {
    try {
      await putObject(thumbKey(row), await thumbnailOf(await readObject(row.storageKey)), "image/webp");
      thumbnailKey = thumbKey(row);
    } catch {
      refusal = { status: 415, reason: `"${row.fileName}" could not be read as an image; it may be damaged.` };
    }
  }
  if (refusal) {
    await deleteObject(row.storageKey);
    await settle(row.id, { status: "refused", reason: refusal.reason, sizeBytes: size });
    return { status: refusal.status, body: { error: `${refusal.reason} It was deleted.` } };
  }
  await settle(row.id, { status: "listed", contentType: (verdict as { type: string }).type, sizeBytes: size, thumbnailKey });
  return { status: 200, body: { attachment: publicAttachment((await getAttachment(row.id))!) } };
}

export interface PublicAttachment {
  id: string; fileName: string; contentType: string | null; sizeBytes: number; target: { schematicId: string; id: string | null } | null;
  uploadedBy: { id: string | null; name: string | null }; createdAt: string; thumbnailUrl: string | null; url: string;
}

export function publicAttachment(a: AttachmentRow): PublicAttachment {
  return {
    id: a.id, fileName: a.fileName, contentType: a.contentType, sizeBytes: a.sizeBytes,
    target: a.schematicId ? { schematicId: a.schematicId, id: a.target } : null,
    uploadedBy: { id: a.uploadedBy, name: a.uploaderName }, createdAt: a.createdAt,
    thumbnailUrl: a.thumbnailKey ? `/api/v1/uploads/${a.id}/thumbnail` : null,
    url: `/api/v1/uploads/${a.id}/file`,
  };
}
