"use client";
/**
 * Sending the outbox when there is a network: in the order made, consecutive events in
 * batches (at most MAX_EVENTS_PER_BATCH), each photo on its own (ask for an upload with the
 * photo's own id, PUT it straight to the store, complete). Safe to repeat: the server applies
 * an event once and reuses a photo's upload, so an answer lost on the way only means a resend.
 * Stops at the first network failure and keeps the rest waiting.
 */
import { MAX_EVENTS_PER_BATCH, type EventResult } from "@/lib/site/events";
import { markRefused, outbox, removeItems, type OutboxEvent, type OutboxPhoto } from "./store";

export class NoNetwork extends Error {}
export class SignedOut extends Error {}

async function send(url: string, init: RequestInit): Promise<Response> {
  let res: Response;
  try {
    res = await fetch(url, { ...init, cache: "no-store" });
  } catch {
    throw new NoNetwork("no network");
  }
  if (res.status === 401) throw new SignedOut("signed out");
  return res;
}

const errorOf = async (res: Response) => ((await res.json().catch(() => ({}))) as { error?: string }).error ?? `${res.status} ${res.statusText}`;

async function sendEvents(schematicId: string, items: OutboxEvent[]) {
  const res = await send(`/api/v1/schematics/${schematicId}/site/events`, {
    method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ events: items.map((i) => i.event) }),
  });
  if (res.status >= 500) throw new NoNetwork(await errorOf(res)); // try again later
  if (!res.ok) {
    const error = await errorOf(res);
    for (const i of items) await markRefused(i.seq!, error);
    return;
  }
  const { results } = (await res.json()) as { results: EventResult[] };
  const done: number[] = [];
  for (const [k, r] of results.entries()) {
    const item = items[k]!;
    if (r.status === "error") await markRefused(item.seq!, r.error);
    else done.push(item.seq!);
  }
  await removeItems(done);
}

async function sendPhoto(p: OutboxPhoto) {
  const created = await send(`/api/v1/projects/${p.projectId}/uploads`, {
    method: "POST", headers: { "content-type": "application/json" },
    body: JSON.stringify({ id: p.id, filename: p.filename, contentType: p.contentType, size: p.file.size, target: p.target }),
  });
  if (created.status >= 500) throw new NoNetwork(await errorOf(created));
  if (!created.ok) return markRefused(p.seq!, await errorOf(created));
  const { url, status } = (await created.json()) as { url: string | null; status: string };
  if (status === "refused") return markRefused(p.seq!, "The server refused this file earlier.");
  if (url) {
    try {
      const put = await fetch(url, { method: "PUT", body: p.file, headers: { "content-type": p.contentType } });
      if (!put.ok) throw new NoNetwork(`store answered ${put.status}`);
    } catch (e) {
      throw e instanceof NoNetwork ? e : new NoNetwork("no network");
    }
    const done = await send(`/api/v1/uploads/${p.id}/complete`, { method: "POST" });
    if (done.status >= 500) throw new NoNetwork(await errorOf(done));
    if (!done.ok) return markRefused(p.seq!, await errorOf(done)); // 413/415: refused and deleted, with the reason
  }
  await removeItems([p.seq!]);
}

let running: Promise<void> | null = null;

/** Send what waits for this schematic; one run at a time. */
export function syncOutbox(schematicId: string): Promise<void> {
  running ??= (async () => {
    try {
      const items = (await outbox(schematicId)).filter((i) => i.state === "waiting");
      for (let k = 0; k < items.length;) {
        const item = items[k]!;
        if (item.type === "photo") { await sendPhoto(item); k++; continue; }
        const batch: OutboxEvent[] = [];
        while (k < items.length && items[k]!.type === "event" && batch.length < MAX_EVENTS_PER_BATCH) batch.push(items[k++] as OutboxEvent);
        await sendEvents(schematicId, batch);
      }
    } finally {
      running = null;
    }
  })();
  return running;
}
