"use client";
/**
 * The site sheet's data on the phone: the sheet and attachments last fetched (kept in
 * IndexedDB for the plant room with no signal), the outbox of work not yet sent, whether
 * there is a network, and the sending. Everything made here is queued first and sent
 * when it can be; the screen shows the server's state with the outbox laid over it.
 */
import { useCallback, useEffect, useRef, useState } from "react";
import type { SiteEvent, SiteEventKind } from "@/lib/site/events";
import type { SiteSheet } from "@/lib/site/site-view";
import type { PublicAttachment } from "@/lib/storage/uploads";
import { enqueue, keepAttachments, keepSheet, keptAttachments, keptSheet, outbox, removeItems, type OutboxItem, type OutboxPhoto } from "./store";
import { NoNetwork, SignedOut, syncOutbox } from "./sync";

/** A v4 uuid even where crypto.randomUUID is missing (plain-http pages on a phone). */
export function newId(): string {
  if (typeof crypto.randomUUID === "function") return crypto.randomUUID();
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = (b[6]! & 0x0f) | 0x40;
  b[8] = (b[8]! & 0x3f) | 0x80;
  const h = [...b].map((x) => x.toString(16).padStart(2, "0")).join("");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

export type Link = "online" | "offline" | "no-signal" | "signed-out";
const RETRY_MS = 20_000;

export function useSiteData(initial: SiteSheet) {
  const schematicId = initial.schematic.id;
  const projectId = initial.project.id;
  const [sheet, setSheet] = useState(initial);
  const [attachments, setAttachments] = useState<PublicAttachment[] | null>(null);
  const [items, setItems] = useState<OutboxItem[]>([]);
  const [link, setLink] = useState<Link>("online");
  const [sending, setSending] = useState(false);
  const alive = useRef(true);

  const reloadItems = useCallback(async () => setItems(await outbox(schematicId)), [schematicId]);

  const fetchLatest = useCallback(async () => {
    const [s, a] = await Promise.all([
      fetch(`/api/v1/schematics/${schematicId}/site`, { cache: "no-store" }),
      fetch(`/api/v1/projects/${projectId}/attachments`, { cache: "no-store" }),
    ]);
    if (s.status === 401) throw new SignedOut("signed out");
    if (s.ok) { const fresh = (await s.json()) as SiteSheet; setSheet(fresh); await keepSheet(fresh); }
    if (a.ok) { const { attachments: list } = (await a.json()) as { attachments: PublicAttachment[] }; setAttachments(list); await keepAttachments(projectId, list); }
  }, [schematicId, projectId]);

  /** Send what waits, then read the server's state back. */
  const sync = useCallback(async () => {
    if (!navigator.onLine) { setLink("offline"); return; }
    setSending(true);
    try {
      await syncOutbox(schematicId);
      await fetchLatest();
      setLink("online");
    } catch (e) {
      setLink(e instanceof SignedOut ? "signed-out" : e instanceof NoNetwork || e instanceof TypeError ? "no-signal" : "no-signal");
    } finally {
      if (alive.current) { setSending(false); await reloadItems(); }
    }
  }, [schematicId, fetchLatest, reloadItems]);

  useEffect(() => {
    alive.current = true;
    void (async () => {
      const kept = await keptSheet(schematicId);
      if (kept && kept.sheet.asOf > initial.asOf) setSheet(kept.sheet);
      else await keepSheet(initial);
      setAttachments(await keptAttachments(projectId));
      await reloadItems();
      void sync();
    })();
    const onOnline = () => void sync();
    const onOffline = () => setLink("offline");
    window.addEventListener("online", onOnline);
    window.addEventListener("offline", onOffline);
    const timer = window.setInterval(() => { if (navigator.onLine) void sync(); }, RETRY_MS);
    return () => { alive.current = false; window.removeEventListener("online", onOnline); window.removeEventListener("offline", onOffline); window.clearInterval(timer); };
  }, [schematicId, projectId, initial, reloadItems, sync]);

  const record = useCallback(async (kind: SiteEventKind, target: string | null, data: unknown) => {
    const event = { id: newId(), kind, target: target ?? undefined, data, madeAt: new Date().toISOString() } as SiteEvent;
    await enqueue({ type: "event", schematicId, projectId, state: "waiting", event });
    await reloadItems();
    void sync();
  }, [schematicId, projectId, reloadItems, sync]);

  const addPhoto = useCallback(async (file: File, target: OutboxPhoto["target"]) => {
    await enqueue({ type: "photo", id: newId(), schematicId, projectId, state: "waiting", file, filename: file.name || "photo.jpg",
      contentType: file.type || "application/octet-stream", madeAt: new Date().toISOString(), target });
    await reloadItems();
    void sync();
  }, [schematicId, projectId, reloadItems, sync]);

  /** A refused item, read and put aside by the installer. */
  const dismiss = useCallback(async (seq: number) => { await removeItems([seq]); await reloadItems(); }, [reloadItems]);

  return { sheet, attachments, items, link, sending, record, addPhoto, sync, dismiss };
}

export type SiteData = ReturnType<typeof useSiteData>;
