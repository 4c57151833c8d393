"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import useSWR from "swr";
import { useBoardSession } from "@/components/drawing-board/persistence/session-context";
import { StatusBadge } from "@/components/projects/status-badge";
import { fetchJson } from "@/lib/fetch-json";
import { boardPath } from "@/lib/review/links";
import type { HistoryEntry, RevisionEvent } from "@/lib/review/types";
import { useReview } from "./review-context";
import { stamp } from "./when";

export const historyKey = (schematicId: string) => `/api/v1/schematics/${schematicId}/revisions`;

const verbs: Record<string, string> = { "in-review": "submitted", approved: "approved", draft: "sent back", issued: "issued" };

/** Every revision, newest first: who, when, why, its status moves, what changed from the one before; open it or restore it as the draft. */
export function HistoryPanel() {
  const session = useBoardSession();
  const { data, error } = useSWR(historyKey(session.schematicId), (u: string) => fetchJson<HistoryEntry[]>(u), { revalidateOnFocus: false });
  if (error) return <p role="alert" className="px-2 text-xs text-fault">{(error as Error).message}</p>;
  if (!data) return <p className="px-2 text-xs text-ink-faint">Loading the history…</p>;
  if (data.length === 0) return <p className="px-2 text-xs text-ink-soft">No saved revisions yet: “Save revision” freezes the drawing as Rev 1.</p>;
  return <ol className="space-y-1 px-1 text-sm" data-testid="history">{data.map((h) => <Entry key={h.id} h={h} />)}</ol>;
}

function Entry({ h }: { h: HistoryEntry }) {
  const session = useBoardSession();
  const review = useReview();
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const opened = session.viewing.kind === "revision" && session.viewing.revision.id === h.id;
  const c = h.changes;
  const counts = [c.added.length && `+${c.added.length} added`, c.removed.length && `−${c.removed.length} removed`,
    c.changed.length && `${c.changed.length} changed`, c.settings.length && "settings"].filter(Boolean).join(" · ") || "no changes";
  const restore = async () => {
    if (!window.confirm(`Make Rev ${h.number} the working draft? The draft as it is now is replaced (every saved revision stays as it is).`)) return;
    setBusy(true);
    try {
      await fetchJson(`/api/v1/revisions/${h.id}/restore`, { method: "POST" });
      if (session.viewing.kind === "draft") await session.reload();
      else router.push(boardPath(session.projectId, session.schematicId, { rev: "draft" }));
      setError(null);
    } catch (e) {
      setError((e as Error).message);
    }
    setBusy(false);
  };
  return (
    <li className={`rounded-md px-2 py-1.5 ${opened ? "bg-copper-50" : "hover:bg-paper-dark"}`} data-testid="history-entry" data-number={h.number}>
      <div className="flex flex-wrap items-center gap-1.5">
        <span className="num font-semibold">Rev {h.number}</span>
        <StatusBadge status={h.status} />
        <span className="ml-auto text-[11px] text-ink-faint">{h.authorName ?? "—"} · {stamp(h.createdAt)}</span>
      </div>
      <p className="mt-0.5 text-ink">{h.message || <span className="text-ink-faint">no message</span>}</p>
      {h.events.length > 0 && <ul className="mt-0.5 space-y-0.5">{h.events.map((e, i) => <EventLine key={i} e={e} />)}</ul>}
      <details className="mt-0.5 text-xs" data-testid="history-changes">
        <summary className="cursor-pointer text-ink-soft">{h.number === 1 ? "first revision" : `from Rev ${h.number - 1}`}: {counts}</summary>
        <ul className="mt-1 space-y-0.5 text-ink-soft">
          {c.added.length > 0 && <li><span className="text-ok">added</span> {c.added.join(", ")}</li>}
          {c.removed.length > 0 && <li><span className="text-fault">removed</span> {c.removed.join(", ")}</li>}
          {c.changed.map((x) => <li key={x.id}><span className="text-warn">changed</span> {x.id}: {x.fields.join(", ")}</li>)}
          {c.settings.length > 0 && <li>settings: {c.settings.join(", ")}</li>}
        </ul>
      </details>
      <div className="mt-1 flex gap-3 text-xs">
        {!opened && <Link href={boardPath(session.projectId, session.schematicId, { rev: h.id })} className="text-copper-700 underline" data-testid="history-open">Open (read-only)</Link>}
        {session.mayEdit && <button type="button" className="text-copper-700 underline disabled:opacity-50" disabled={busy} onClick={restore} data-testid="history-restore">Restore as draft</button>}
        {h.events.some((e) => e.threadId) && (
          <button type="button" className="text-copper-700 underline" onClick={() => { review.setPanel({ ...review.panel, tab: "threads" }); review.select(h.events.findLast((e) => e.threadId)!.threadId); }}>
            Reason thread
          </button>
        )}
      </div>
      {error && <p role="alert" className="text-xs text-fault">{error}</p>}
    </li>
  );
}

function EventLine({ e }: { e: RevisionEvent }) {
  const what = e.kind === "restored" ? "restored as the draft" : e.kind === "handover" ? `handover report sent to ${e.detail?.to ?? "the client"}`
    : verbs[e.to ?? ""] ?? `moved to ${e.to}`;
  return (
    <li className="text-[11px] text-ink-soft">
      {what} by {e.actorName ?? "someone"}, {stamp(e.at)}{e.reason ? <>: <span className="text-ink">“{e.reason.length > 120 ? `${e.reason.slice(0, 120)}…` : e.reason}”</span></> : null}
    </li>
  );
}
