"use client";

import type { Thread } from "@/lib/review/types";
import { useBoard } from "@/components/drawing-board/store";
import { anchorText } from "./anchor-text";
import { isMine, useReview } from "./review-context";
import { ago } from "./when";

/** The threads of the board, newest first: open or resolved, all or mine. */
export function ThreadList() {
  const r = useReview();
  const doc = useBoard((s) => s.doc);
  const shown = r.threads.filter((t) => t.resolved === (r.filter.state === "resolved") && (!r.filter.mine || isMine(t, r.userId)));
  const open = r.threads.filter((t) => !t.resolved).length;
  const tab = (state: "open" | "resolved", label: string) => (
    <button type="button" role="tab" aria-selected={r.filter.state === state} onClick={() => r.setFilter({ ...r.filter, state })}
      className={`rounded px-2 py-0.5 ${r.filter.state === state ? "bg-copper-50 text-copper-700" : "text-ink-soft hover:text-ink"}`}>{label}</button>
  );
  return (
    <div className="text-sm" data-testid="thread-list">
      <div className="flex flex-wrap items-center gap-1 px-2 pb-1 text-xs">
        <div role="tablist" className="flex rounded-md border border-ink/10 p-0.5">
          {tab("open", `Open ${open}`)}
          {tab("resolved", `Resolved ${r.threads.length - open}`)}
        </div>
        <label className="ml-auto flex items-center gap-1 text-ink-soft">
          <input type="checkbox" checked={r.filter.mine} onChange={(e) => r.setFilter({ ...r.filter, mine: e.target.checked })} data-testid="filter-mine" />
          Mine
        </label>
      </div>
      {r.loadError && <p role="alert" className="px-2 text-xs text-fault">{r.loadError}</p>}
      {shown.length === 0 && !r.loadError && (
        <p className="px-2 py-1 text-xs text-ink-soft">
          {r.threads.length === 0 ? "No threads yet. Select a part or pipe and start one, or comment on the whole schematic." : `No ${r.filter.state} threads${r.filter.mine ? " of yours" : ""}.`}
        </p>
      )}
      <ul className="space-y-0.5">
        {shown.map((t) => <Row key={t.id} t={t} where={anchorText(t.anchor, doc)} />)}
      </ul>
    </div>
  );
}

function Row({ t, where }: { t: Thread; where: string }) {
  const r = useReview();
  const first = t.messages.find((m) => !m.deleted) ?? t.messages[0];
  const replies = t.messages.length - 1;
  return (
    <li>
      <button type="button" onClick={() => r.select(t.id)} data-testid="thread-row" data-thread={t.id} data-number={t.number}
        className={`w-full rounded px-2 py-1 text-left hover:bg-paper-dark ${r.selected === t.id ? "bg-copper-50" : ""}`}>
        <span className="flex items-baseline gap-1.5 text-xs">
          <span className={`num rounded-full px-1.5 font-semibold text-white ${t.resolved ? "bg-ink-faint" : "bg-copper-500"}`}>{t.number}</span>
          <span className={`min-w-0 flex-1 truncate ${t.anchorPresent ? "text-ink-soft" : "text-ink-faint line-through"}`}>{where}</span>
          {t.kind === "send-back" && <span className="rounded bg-warn/15 px-1 text-[10px] font-semibold uppercase text-warn">sent back</span>}
          <span className="whitespace-nowrap text-ink-faint">{ago(t.createdAt)}</span>
        </span>
        <span className="mt-0.5 line-clamp-2 block text-ink">{first?.deleted ? <em className="text-ink-faint">message deleted</em> : first?.body}</span>
        <span className="block text-[11px] text-ink-faint">{t.createdByName ?? "someone"} · Rev {t.revisionNumber}{replies > 0 ? ` · ${replies} repl${replies === 1 ? "y" : "ies"}` : ""}</span>
      </button>
    </li>
  );
}
