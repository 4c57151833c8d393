"use client";

import { Button } from "@/components/ui/button";
import { useBoard } from "../store";
import { suggestedSizeChanges, applySuggestedSizes } from "./apply-suggested-sizes";

/** Changes every pipe the engine would size differently, as one undoable step (board's apply-doc). */
export function ApplySizesButton() {
  const doc = useBoard((s) => s.doc);
  const results = useBoard((s) => s.results);
  const readOnly = useBoard((s) => s.readOnly);
  const dispatch = useBoard((s) => s.dispatch);
  const changes = suggestedSizeChanges(doc, results);
  if (readOnly || changes.length === 0) return null;
  return (
    <Button variant="secondary" className="px-2 py-1 text-xs" data-testid="apply-sizes"
      title={changes.map((c) => `${c.id}: ${c.from} → ${c.to}`).join("\n")}
      onClick={() => dispatch("apply-doc", { doc: applySuggestedSizes(doc, results).doc })}>
      Apply suggested sizes ({changes.length})
    </Button>
  );
}
