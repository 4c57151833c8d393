"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { saveAsVariant } from "@/components/drawing-board/actions";
import { actionErrorMessage } from "@/lib/action-error";
import { Button } from "@/components/ui/button";
import { useBoardStore } from "../store";
import { Modal } from "./modal";
import { useBoardSession } from "./session-context";

/**
 * Shown when autosave finds a newer draft than the one this board opened.
 * Nothing is lost either way: "Reload theirs" opens the stored draft (ours is
 * dropped only on that explicit choice), "Save mine as a variant" keeps ours as
 * a new schematic beside theirs and opens it.
 */
export function ConflictDialog({ open }: { open: boolean }) {
  const session = useBoardSession();
  const store = useBoardStore();
  const router = useRouter();
  const [busy, setBusy] = useState<"reload" | "variant" | null>(null);
  const [error, setError] = useState<string | null>(null);

  const reload = async () => {
    setBusy("reload");
    try {
      await session.reload();
    } catch (e) {
      setError((e as Error).message);
      setBusy(null);
    }
  };
  const variant = async () => {
    setBusy("variant");
    const r = await saveAsVariant({ schematicId: session.schematicId, doc: store.getState().doc, name: `${session.name} (my changes)` })
      .catch((err: unknown) => ({ ok: false as const, error: actionErrorMessage(err, "Could not reach the server; the variant was not saved. Try again.") }));
    if (!r.ok) {
      setError(r.error);
      setBusy(null);
      return;
    }
    session.save.markSaved(1); // the old board is left behind; stop the unload warning
    router.push(`/projects/${r.data.projectId}/schematics/${r.data.id}`);
  };

  return (
    <Modal open={open} title="Someone else saved this schematic since you opened it" testId="conflict-dialog">
      <p className="text-ink-soft">
        Your changes have not been saved over theirs. Open their version, or keep yours as a separate variant of{" "}
        <span className="font-medium text-ink">{session.name}</span> so both are kept.
      </p>
      {error && <p role="alert" className="mt-2 text-fault">{error}</p>}
      <div className="mt-4 flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={reload} disabled={busy !== null}>{busy === "reload" ? "Opening…" : "Reload theirs"}</Button>
        <Button onClick={variant} disabled={busy !== null}>{busy === "variant" ? "Saving…" : "Save mine as a variant"}</Button>
      </div>
    </Modal>
  );
}
