/**
 * The sheet as the installer sees it: the server's state with the outbox laid over it.
 * A waiting tick or untick counts when it was made after the server's latest for that row
 * (the server applies the same rule, so the screen does not jump when it is sent).
 */
import type { SiteEvent } from "@/lib/site/events";
import type { SiteGroup, TickState } from "@/lib/site/types";
import type { OutboxItem } from "./offline/store";

export type ShownTick = TickState & { waiting: boolean };

export function shownTicks(server: Record<string, TickState>, items: OutboxItem[], me: string): Record<string, ShownTick> {
  const out: Record<string, ShownTick> = {};
  for (const [id, t] of Object.entries(server)) out[id] = { ...t, waiting: false };
  const local = items.filter((i): i is Extract<OutboxItem, { type: "event" }> => i.type === "event" && i.state === "waiting"
    && (i.event.kind === "tick" || i.event.kind === "untick"));
  for (const { event } of [...local].sort((a, b) => a.event.madeAt.localeCompare(b.event.madeAt))) {
    const target = event.target!;
    const prev = out[target];
    if (prev && prev.at > event.madeAt) continue;
    out[target] = { ticked: event.kind === "tick", by: me, at: event.madeAt, eventId: event.id, waiting: true };
  }
  return out;
}

export function progress(group: SiteGroup, ticks: Record<string, ShownTick>): { done: number; total: number } {
  return { done: group.rows.filter((id) => ticks[id]?.ticked).length, total: group.rows.length };
}

/** Records made here and not yet taken by the server, of one kind. */
export function waitingRecords<K extends SiteEvent["kind"]>(items: OutboxItem[], kind: K) {
  return items.flatMap((i) => (i.type === "event" && i.event.kind === kind ? [{ event: i.event as Extract<SiteEvent, { kind: K }>, state: i.state, error: i.error }] : []));
}
