"use client";

import { useState } from "react";
import { setRevisionStatus, startNewDraft } from "@/components/drawing-board/actions";
import { StatusBadge } from "@/components/projects/status-badge";
import { Button } from "@/components/ui/button";
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
  const latest = session.revisions[0];

  const move = async (to: RevisionStatus) => {
    if (!latest) return;
    setBusy(true);
    const r = await setRevisionStatus({ revisionId: latest.id, status: to });
    setBusy(false);
    if (!r.ok) return setError(r.error);
    setError(null);
    session.setRevisions(session.revisions.map((x) => (x.id === r.data.id ? { ...x, ...r.data, authorName: x.authorName } : x)));
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
        <Button key={t.to} variant="secondary" className="px-2 py-1 text-xs" disabled={busy} onClick={() => move(t.to)}>{t.label}</Button>
      ))}
      {session.canEdit && <Button variant="secondary" className="px-2 py-1 text-xs" onClick={() => setDialog(true)}>Save revision</Button>}
      {session.readOnlyReason === "issued" && session.mayEdit && (
        <Button className="px-2 py-1 text-xs" disabled={busy} onClick={newDraft}>Start a new draft</Button>
      )}
      {error && <span role="alert" className="text-xs text-fault">{error}</span>}
      {session.canEdit && <SaveRevisionDialog open={dialog} onClose={() => setDialog(false)} />}
    </div>
  );
}
