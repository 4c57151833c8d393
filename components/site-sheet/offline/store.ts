"use client";
/**
 * What the phone keeps (IndexedDB through idb): the last site sheet and attachment list
 * it saw, and the outbox — every tick, record and photo made here, in the order made,
 * until the server has taken it. An item leaves the outbox only when the server answers
 * "applied" or "duplicate" (or lists the photo); a refusal stays, marked, with its reason.
 */
import { openDB, type DBSchema, type IDBPDatabase } from "idb";
import type { SiteEvent } from "@/lib/site/events";
import type { SiteSheet } from "@/lib/site/site-view";
import type { PublicAttachment } from "@/lib/storage/uploads";

export type OutboxState = "waiting" | "refused";
interface Common { seq?: number; schematicId: string; projectId: string; state: OutboxState; error?: string }
export type OutboxEvent = Common & { type: "event"; event: SiteEvent };
export type OutboxPhoto = Common & {
  type: "photo"; id: string; file: Blob; filename: string; contentType: string; madeAt: string;
  target: { schematicId: string; id?: string } | null;
};
export type OutboxItem = OutboxEvent | OutboxPhoto;

interface SiteDb extends DBSchema {
  sheets: { key: string; value: { schematicId: string; sheet: SiteSheet; savedAt: string } };
  attachments: { key: string; value: { projectId: string; list: PublicAttachment[]; savedAt: string } };
  outbox: { key: number; value: OutboxItem; indexes: { bySchematic: string } };
}

let dbp: Promise<IDBPDatabase<SiteDb>> | null = null;
function db() {
  dbp ??= openDB<SiteDb>("loopwright-site", 1, {
    upgrade(d) {
      d.createObjectStore("sheets", { keyPath: "schematicId" });
      d.createObjectStore("attachments", { keyPath: "projectId" });
      d.createObjectStore("outbox", { keyPath: "seq", autoIncrement: true }).createIndex("bySchematic", "schematicId");
    },
  });
  return dbp;
}

export async function keptSheet(schematicId: string) {
  return (await db()).get("sheets", schematicId);
}
export async function keepSheet(sheet: SiteSheet) {
  await (await db()).put("sheets", { schematicId: sheet.schematic.id, sheet, savedAt: new Date().toISOString() });
}
export async function keptAttachments(projectId: string) {
  return (await (await db()).get("attachments", projectId))?.list ?? null;
}
export async function keepAttachments(projectId: string, list: PublicAttachment[]) {
  await (await db()).put("attachments", { projectId, list, savedAt: new Date().toISOString() });
}

/** Queue an item; the store gives it the next sequence number, so the outbox keeps the order made. */
export async function enqueue(item: OutboxItem): Promise<void> {
  await (await db()).add("outbox", item);
}
/** The schematic's outbox, oldest first. */
export async function outbox(schematicId: string): Promise<OutboxItem[]> {
  const items = await (await db()).getAllFromIndex("outbox", "bySchematic", schematicId);
  return items.sort((a, b) => a.seq! - b.seq!);
}
export async function removeItems(seqs: number[]) {
  const tx = (await db()).transaction("outbox", "readwrite");
  await Promise.all([...seqs.map((s) => tx.store.delete(s)), tx.done]);
}
export async function markRefused(seq: number, error: string) {
  const d = await db();
  const item = await d.get("outbox", seq);
  if (item) await d.put("outbox", { ...item, state: "refused", error });
}
