"use client";

import { useState } from "react";
import { startNewDraft } from "@/components/drawing-board/actions";
import { SendBackDialog } from "@/components/review/send-back-dialog";
import { StatusBadge } from "@/components/projects/status-badge";
import { Button } from "@/components/ui/button";
import { fetchJson } from "@/lib/fetch-json";
import type { RevisionRecord } from "@/db/queries/schematic-rows";
import { transitionsFor, type RevisionStatus } from "@/lib/revisions/transitions";
import { SaveRevisionDialog } from "./save-revision-dialog";
import { SaveStatus } from "./save-status";
import { useBoardSession } from "./session-context";

/** Latest revision and its status, the moves this role may make, "Save revision" and "Start a new draft". */
export function RevisionStatusBar() {
  const session = useBoardSession();
  const [dialog, setDialog] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [sendBack, setSendBack] = useState(false);
  const latest = session.revisions[0];

  /** POST /api/v1/revisions/{id}/status (lib/review/status-move.ts); the server's message when refused. */
  const move = async (to: RevisionStatus, reason?: string): Promise<string | null> => {
    if (!latest) return null;
    setBusy(true);
    try {
      const r = await fetchJson<{ revision: RevisionRecord }>(`/api/v1/revisions/${latest.id}/status`, { method: "POST", body: JSON.stringify({ status: to, reason }) });
      setError(null);
      session.setRevisions(session.revisions.map((x) => (x.id === r.revision.id ? { ...x, ...r.revision, authorName: x.authorName } : x)));
      return null;
    } catch (e) {
      if (!reason) setError((e as Error).message);
      return (e as Error).message;
    } finally {
      setBusy(false);
    }
  };
  const newDraft = async () => {
    setBusy(true);
    const r = await startNewDraft({ schematicId: session.schematicId });
    setBusy(false);
    if (!r.ok) return setError(r.error);
    session.unlock(r.data.lockVersion);
  };

  return (
    <div className="flex flex-wrap items-center gap-2 text-sm" data-testid="revision-status-bar">
      {latest ? (
        <span className="flex items-center gap-1.5" title={latest.message}>
          <span className="text-ink-soft">Rev <span className="num">{latest.number}</span></span>
          <StatusBadge status={latest.status} />
        </span>
      ) : <span className="text-ink-faint">No revision yet</span>}
      <SaveStatus />
      {latest && transitionsFor(latest.status, session.role).map((t) => (
        <Button key={t.to} variant="secondary" className="px-2 py-1 text-xs" disabled={busy} data-testid={`move-${t.to}`}
          onClick={() => (t.to === "draft" ? setSendBack(true) : void move(t.to))}>{t.label}</Button>
      ))}
      {session.canEdit && <Button variant="secondary" className="px-2 py-1 text-xs" onClick={() => setDialog(true)}>Save revision</Button>}
      {session.readOnlyReason === "issued" && session.mayEdit && (
        <Button className="px-2 py-1 text-xs" disabled={busy} onClick={newDraft}>Start a new draft</Button>
      )}
      {error && <span role="alert" className="text-xs text-fault">{error}</span>}
      {session.canEdit && <SaveRevisionDialog open={dialog} onClose={() => setDialog(false)} />}
      {latest && <SendBackDialog open={sendBack} revisionNumber={latest.number} onClose={() => setSendBack(false)} onSend={(reason) => move("draft", reason)} />}
    </div>
  );
}
