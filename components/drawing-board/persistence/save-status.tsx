"use client";

import { useBoardSession } from "./session-context";

const text = { saved: "Saved", unsaved: "Unsaved changes", saving: "Saving…", conflict: "Not saved: conflict", error: "Not saved" } as const;
const tone = { saved: "text-ok", unsaved: "text-ink-soft", saving: "text-ink-soft", conflict: "text-fault", error: "text-fault" } as const;

/** Autosave state beside the revision bar; the error is in the tooltip and for screen readers. */
export function SaveStatus() {
  const { save, readOnlyReason, canEdit } = useBoardSession();
  if (!canEdit) return <span className="text-xs text-ink-faint" data-testid="save-status">{readOnlyReason === "issued" ? "Read-only (issued)" : readOnlyReason === "revision" ? "Read-only (saved revision)" : "Read-only"}</span>;
  return (
    <span role="status" aria-live="polite" title={save.error ?? undefined} data-testid="save-status"
      className={`inline-flex items-center gap-1 text-xs ${tone[save.status]}`}>
      <span aria-hidden className={`inline-block h-1.5 w-1.5 rounded-full ${save.status === "saved" ? "bg-ok" : save.status === "error" || save.status === "conflict" ? "bg-fault" : "bg-copper-300"}`} />
      {text[save.status]}
      {save.error && save.status === "error" && <span className="sr-only">: {save.error}</span>}
    </span>
  );
}
