import { randomUUID } from "node:crypto";
import sharp from "sharp";
import { db } from "@/lib/db";
import { putObject } from "@/lib/storage/s3";
import type { Fixture } from "./fixture";

/** A small real JPEG (and its thumbnail) in the fake S3, as a pending or listed upload of the fixture's installer. */
export async function fixturePhoto(f: Fixture, status: "pending" | "listed"): Promise<string> {
  const id = randomUUID();
  const jpeg = new Uint8Array(await sharp({ create: { width: 64, height: 48, channels: 3, background: "#b4632b" } }).jpeg().toBuffer());
  const key = `projects/${f.projectId}/uploads/${id}/photo.jpg`;
  await putObject(key, jpeg, "image/jpeg");
  const thumb = status === "listed" ? `projects/${f.projectId}/thumbnails/${id}.webp` : null;
  if (thumb) await putObject(thumb, new Uint8Array(await sharp(jpeg).webp().toBuffer()), "image/webp");
  await db()("attachments").insert({ id, project_id: f.projectId, status, storage_key: key, thumbnail_key: thumb, file_name: "photo.jpg",
    declared_type: "image/jpeg", content_type: status === "listed" ? "image/jpeg" : null, size_bytes: jpeg.byteLength, uploaded_by: "demo-installer" });
  return id;
}
