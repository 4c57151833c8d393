"use client";
import { useBoard } from "../store";
import { PartForm } from "./part-form";
import { PipeForm } from "./pipe-form";
import { DesignPanel } from "../design/design-panel";

/** Right-hand details: the selected part or pipe; a summary for several; a prompt for none. */
export function DetailsPanel() {
  const sel = useBoard((s) => s.selection);
  const part = useBoard((s) => (sel.parts.length === 1 && sel.pipes.length === 0 ? s.doc.parts.find((p) => p.id === sel.parts[0]) : undefined));
  const pipe = useBoard((s) => (sel.pipes.length === 1 && sel.parts.length === 0 ? s.doc.pipes.find((p) => p.id === sel.pipes[0]) : undefined));
  const dispatch = useBoard((s) => s.dispatch);
  return (
    <div className="h-full overflow-y-auto p-3" data-testid="details">
      <h2 className="pb-2 text-xs font-semibold uppercase tracking-wide text-ink-soft">Details</h2>
      {part && <PartForm key={part.id} part={part} />}
      {pipe && <PipeForm key={pipe.id} pipe={pipe} />}
      {!part && !pipe && sel.parts.length + sel.pipes.length > 1 && (
        <div className="text-sm text-ink-soft">
          <p>{sel.parts.length} parts and {sel.pipes.length} pipes selected.</p>
          <div className="mt-2 flex flex-wrap gap-2 text-xs">
            <button type="button" className="rounded border border-ink/15 px-2 py-1 hover:bg-paper-dark" onClick={() => dispatch("tidy-selection")}>Tidy (T)</button>
            <button type="button" className="rounded border border-ink/15 px-2 py-1 hover:bg-paper-dark" onClick={() => dispatch("duplicate-selection")}>Duplicate</button>
            <button type="button" className="rounded border border-ink/15 px-2 py-1 hover:bg-paper-dark" onClick={() => dispatch("delete-selection")}>Delete</button>
          </div>
        </div>
      )}
      {sel.parts.length + sel.pipes.length === 0 && (
        <>
          <p className="pb-3 text-sm text-ink-faint">Select a part or pipe to see its details. Drag from one port to another to lay a pipe; press ? for shortcuts.</p>
          <DesignPanel />
        </>
      )}
    </div>
  );
}
