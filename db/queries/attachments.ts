import "server-only";
import { db } from "@/lib/db";

// Attachments (photos and documents): pending until their bytes are checked, then listed or refused.

export interface AttachmentRow {
  id: string; projectId: string; schematicId: string | null; target: string | null; status: "pending" | "listed" | "refused";
  storageKey: string; thumbnailKey: string | null; fileName: string; declaredType: string; contentType: string | null;
  sizeBytes: number; refusedReason: string | null; uploadedBy: string | null; uploaderName: string | null; createdAt: string; completedAt: string | null;
}

const iso = (v: unknown) => (v ? new Date(v as string).toISOString() : null);
function map(r: Record<string, unknown>): AttachmentRow {
  return {
    id: r.id as string, projectId: r.project_id as string, schematicId: (r.schematic_id as string) ?? null, target: (r.target as string) ?? null,
    status: r.status as AttachmentRow["status"], storageKey: r.storage_key as string, thumbnailKey: (r.thumbnail_key as string) ?? null,
    fileName: r.file_name as string, declaredType: r.declared_type as string, contentType: (r.content_type as string) ?? null,
    sizeBytes: Number(r.size_bytes), refusedReason: (r.refused_reason as string) ?? null, uploadedBy: (r.uploaded_by as string) ?? null,
    uploaderName: (r.uploader_name as string) ?? null, createdAt: iso(r.created_at)!, completedAt: iso(r.completed_at),
  };
}

const base = () => db()("attachments as a").leftJoin("users as u", "u.id", "a.uploaded_by").select("a.*", "u.name as uploader_name");

export async function getAttachment(id: string): Promise<AttachmentRow | null> {
  const r = await base().where("a.id", id).first();
  return r ? map(r) : null;
}

export async function listedAttachments(projectId: string): Promise<AttachmentRow[]> {
  return (await base().where({ "a.project_id": projectId, "a.status": "listed" }).orderBy("a.created_at", "desc")).map(map);
}

export async function insertPending(a: { id: string; projectId: string; schematicId: string | null; target: string | null; storageKey: string;
  fileName: string; declaredType: string; sizeBytes: number; uploadedBy: string }): Promise<boolean> {
  const rows = await db()("attachments").insert({
    id: a.id, project_id: a.projectId, schematic_id: a.schematicId, target: a.target, storage_key: a.storageKey, file_name: a.fileName,
    declared_type: a.declaredType, size_bytes: a.sizeBytes, uploaded_by: a.uploadedBy,
  }).onConflict("id").ignore().returning("id");
  return rows.length === 1;
}

/** Pending → listed or refused, once: false when another call settled it first. */
export async function settle(id: string, s: { status: "listed"; contentType: string; sizeBytes: number; thumbnailKey: string | null } | { status: "refused"; reason: string; sizeBytes: number }): Promise<boolean> {
  const n = await db()("attachments").where({ id, status: "pending" }).update(s.status === "listed"
    ? { status: "listed", content_type: s.contentType, size_bytes: s.sizeBytes, thumbnail_key: s.thumbnailKey, completed_at: db().fn.now() }
    : { status: "refused", refused_reason: s.reason, size_bytes: s.sizeBytes, completed_at: db().fn.now() });
  return n === 1;
}
