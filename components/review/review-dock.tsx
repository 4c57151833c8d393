"use client";

import { HistoryPanel } from "./history-panel";
import { NewThreadButton, NewThreadForm } from "./new-thread";
import { useReview } from "./review-context";
import { ThreadList } from "./thread-list";
import { ThreadView } from "./thread-view";
import { usePhone } from "./use-phone";

/**
 * The review panel, docked in the right-hand column with the findings (never over the
 * drawing): the threads, one open thread, a new one being started, and the history.
 * Folds to its header line. On a phone the same panel opens from a button on the canvas.
 */
export function ReviewDock({ inSheet = false, onClose }: { inSheet?: boolean; onClose?: () => void }) {
  const r = useReview();
  const phone = usePhone();
  const open = inSheet || r.panel.open;
  const openCount = r.threads.filter((t) => !t.resolved).length;
  const thread = r.selected ? r.threads.find((t) => t.id === r.selected) : undefined;
  const tab = (t: "threads" | "history", label: string) => (
    <button type="button" role="tab" aria-selected={r.panel.tab === t} onClick={() => r.setPanel({ ...r.panel, open: true, tab: t })} data-testid={`review-tab-${t}`}
      className={`rounded px-1.5 py-0.5 text-xs font-semibold uppercase tracking-wide ${r.panel.tab === t && open ? "text-copper-700" : "text-ink-soft hover:text-ink"}`}>{label}</button>
  );
  // one panel on the page: the sheet on a phone, the docked one otherwise
  if (phone !== inSheet) return null;
  return (
    <div className={`flex min-h-0 flex-col ${inSheet ? "" : "border-b border-ink/10"} ${open && !inSheet ? "max-h-[60%]" : ""}`} data-testid={inSheet ? "review-sheet-body" : "review-dock"}>
      <div className="flex shrink-0 items-center gap-1 px-2 py-1.5" role="tablist">
        {tab("threads", `Threads${openCount ? ` · ${openCount} open` : ""}`)}
        {tab("history", "History")}
        {onClose && <button type="button" onClick={onClose} className="ml-auto px-2 text-sm text-ink-soft hover:text-ink" data-testid="close-sheet">Close</button>}
        {!inSheet && (
          <button type="button" onClick={() => r.setPanel({ ...r.panel, open: !open })} aria-expanded={open} aria-label={open ? "Fold the review panel" : "Open the review panel"}
            className="ml-auto px-1 text-xs text-ink-faint hover:text-ink">{open ? "▴" : "▾"}</button>
        )}
      </div>
      {open && (
        <div className="min-h-0 overflow-y-auto pb-2" data-testid="review-body">
          {r.panel.tab === "history" ? <HistoryPanel /> : r.composing ? <NewThreadForm anchor={r.composing} />
            : thread ? <ThreadView t={thread} /> : (
              <>
                <div className="flex justify-end px-2 pb-1"><NewThreadButton /></div>
                <ThreadList />
              </>
            )}
        </div>
      )}
    </div>
  );
}
