"use client";

import { useState } from "react";
import { saveRevision } from "@/components/drawing-board/actions";
import { actionErrorMessage } from "@/lib/action-error";
import { Button } from "@/components/ui/button";
import { useBoardStore } from "../store";
import { Modal } from "./modal";
import { useBoardSession } from "./session-context";

/** Freeze the current drawing as the next numbered revision, with a message saying what changed. */
export function SaveRevisionDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const session = useBoardSession();
  const store = useBoardStore();
  const [message, setMessage] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const next = (session.revisions[0]?.number ?? 0) + 1;

  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    if (!message.trim()) return setError("Say in a few words what changed.");
    setBusy(true);
    const { doc } = store.getState();
    const r = await saveRevision({ schematicId: session.schematicId, lockVersion: session.save.lockVersion(), doc, message })
      .catch((err: unknown) => ({ ok: false as const, error: actionErrorMessage(err, "Could not reach the server; the revision was not saved. Try again.") }));
    setBusy(false);
    if (!r.ok) return setError(r.error);
    session.save.markSaved(r.data.lockVersion);
    // saving a revision sized it: show those results
    if (r.data.results) {
      store.getState().setResults(r.data.results, doc);
      session.setSizing({ engineVersion: r.data.results.engine, sizedAt: new Date().toISOString(), sizedBy: null, fromRevision: null, recomputed: null });
    }
    session.setRevisions([r.data.revision, ...session.revisions]);
    setMessage("");
    setError(null);
    onClose();
  };

  return (
    <Modal open={open} title={`Save revision ${next}`} onClose={onClose} testId="save-revision-dialog">
      <form onSubmit={submit}>
        <label htmlFor="revision-message" className="block font-medium">What changed</label>
        <textarea id="revision-message" rows={3} maxLength={2000} value={message} onChange={(e) => setMessage(e.target.value)}
          className="mt-1 w-full rounded-md border border-ink/15 bg-white p-2 text-sm focus:outline-2 focus:outline-copper-500"
          placeholder="e.g. Upsized the primary to 28 mm after sizing" aria-invalid={error ? true : undefined} />
        {error && <p role="alert" className="mt-1 text-fault">{error}</p>}
        <p className="mt-2 text-xs text-ink-faint">A saved revision is kept exactly as it is now; later edits go into the draft.</p>
        <div className="mt-4 flex justify-end gap-2">
          <Button type="button" variant="secondary" onClick={onClose}>Cancel</Button>
          <Button type="submit" disabled={busy}>{busy ? "Saving…" : "Save revision"}</Button>
        </div>
      </form>
    </Modal>
  );
}
