"use client";

import { useState } from "react";
import { mutate } from "swr";
import { useBoardSession } from "@/components/drawing-board/persistence/session-context";
import { fetchJson } from "@/lib/fetch-json";
import type { HistoryEntry } from "@/lib/review/types";
import { historyKey } from "./history-panel";
import { useLive, useLiveMessages } from "./live-board";

/**
 * Keeps the open board in step with what others do, as the live stream tells it: a status
 * move or a new revision refreshes the revisions (status bar, banner, history); a draft
 * saved by someone else is loaded when this board has nothing unsaved (else autosave's
 * conflict check will ask, and this says so).
 */
export function LiveSessionSync() {
  const session = useBoardSession();
  const live = useLive();
  const [note, setNote] = useState<string | null>(null);

  const refreshRevisions = async () => {
    const list = await fetchJson<HistoryEntry[]>(historyKey(session.schematicId));
    void mutate(historyKey(session.schematicId), list, { revalidate: false });
    session.setRevisions(list.map((h) => ({ id: h.id, schematicId: session.schematicId, number: h.number, status: h.status, message: h.message,
      authorId: h.authorId, authorName: h.authorName, createdAt: h.createdAt, statusChangedAt: h.statusChangedAt })));
  };

  useLiveMessages((m) => {
    // issued: the draft locks ("start a new draft" to edit): open it again as the server now sees it
    if (m.type === "revision" && m.status === "issued" && session.viewing.kind === "draft" && session.canEdit) return void session.reload().catch(() => {});
    if (m.type === "revision" || m.type === "resync") void refreshRevisions().catch(() => {});
    if (m.type === "resync" || m.type === "draft") void mutate(historyKey(session.schematicId));
    if (m.type !== "draft" || session.viewing.kind !== "draft") return;
    // our own saves (autosave, a revision, a restore) are handled where they are made
    if (m.by === live?.you || m.lockVersion <= session.save.lockVersion()) return;
    // the board is remade with the stored draft (this component with it)
    if (session.save.status === "saved") void session.reload().catch(() => setNote("Someone saved the draft; reload the page to see it"));
    else {
      setNote("Someone else saved the draft; your unsaved changes will ask before they overwrite it");
    }
  });

  return note ? <span role="status" className="max-w-[14rem] truncate text-xs text-ink-soft" title={note} data-testid="live-note">{note}</span> : null;
}
