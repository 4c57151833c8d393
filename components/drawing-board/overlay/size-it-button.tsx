"use client";

import { useState } from "react";
import { sizeSchematic } from "@/components/drawing-board/actions";
import { actionErrorMessage } from "@/lib/action-error";
import { Button } from "@/components/ui/button";
import { useBoardSession } from "../persistence/session-context";
import { useBoardStore, useBoard } from "../store";

/** "Size it": runs the sizing server action on the document as drawn now and puts the answer in the store. */
export function SizeItButton() {
  const store = useBoardStore();
  const { schematicId, canSize, setSizing } = useBoardSession();
  const stale = useBoard((s) => s.resultsStale);
  const sized = useBoard((s) => s.results !== null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  if (!canSize) return null;

  const run = async () => {
    setBusy(true);
    setError(null);
    try {
      const doc = store.getState().doc;
      const r = await sizeSchematic({ schematicId, doc });
      if (r.ok) {
        // the results belong to the drawing as sent, even if it changed while sizing ran
        store.getState().setResults(r.data, doc);
        setSizing({ engineVersion: r.data.engine, sizedAt: new Date().toISOString(), sizedBy: null, fromRevision: null, recomputed: null });
      } else setError(r.error);
    } catch (e) {
      setError(actionErrorMessage(e, "Could not reach the server to size the schematic."));
    } finally {
      setBusy(false);
    }
  };

  return (
    <span className="inline-flex items-center gap-2">
      <Button onClick={run} disabled={busy} className="px-3 py-1.5" data-testid="size-it">
        {busy ? "Sizing…" : sized && stale ? "Size it again" : "Size it"}
      </Button>
      {error && <span role="alert" className="max-w-xs truncate text-xs text-fault" title={error}>{error}</span>}
    </span>
  );
}
