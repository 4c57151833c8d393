"use client";

import { useState } from "react";
import { Modal } from "@/components/drawing-board/persistence/modal";
import { Button } from "@/components/ui/button";

/** Sending back needs a reason: it becomes a thread on the whole schematic that the designer answers. */
export function SendBackDialog({ open, revisionNumber, onClose, onSend }: {
  open: boolean; revisionNumber: number; onClose(): void; onSend(reason: string): Promise<string | null>;
}) {
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    if (!reason.trim()) return setError("Say why it goes back: the designer answers in a thread.");
    setBusy(true);
    const err = await onSend(reason);
    setBusy(false);
    setError(err);
    if (!err) {
      setReason("");
      onClose();
    }
  };
  return (
    <Modal open={open} title={`Send Rev ${revisionNumber} back`} onClose={onClose} testId="send-back-dialog">
      <form onSubmit={submit}>
        <label htmlFor="send-back-reason" className="block font-medium">Why</label>
        <textarea id="send-back-reason" rows={4} value={reason} onChange={(e) => setReason(e.target.value)} aria-invalid={error ? true : undefined}
          className="mt-1 w-full rounded-md border border-ink/15 bg-white p-2 text-sm focus:outline-2 focus:outline-copper-500"
          placeholder="e.g. The bypass opens below the zones' design Δp; see the thread on bp." />
        {error && <p role="alert" className="mt-1 text-fault">{error}</p>}
        <p className="mt-2 text-xs text-ink-faint">The reason becomes a thread on the whole schematic, and the designer who submitted gets an e-mail.</p>
        <div className="mt-4 flex justify-end gap-2">
          <Button type="button" variant="secondary" onClick={onClose}>Cancel</Button>
          <Button type="submit" disabled={busy}>{busy ? "Sending…" : "Send back"}</Button>
        </div>
      </form>
    </Modal>
  );
}
