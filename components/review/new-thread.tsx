"use client";

import { useBoardSession } from "@/components/drawing-board/persistence/session-context";
import { useBoard } from "@/components/drawing-board/store";
import { Button } from "@/components/ui/button";
import { anchorText } from "./anchor-text";
import { Composer } from "./composer";
import { useReview, type Anchor } from "./review-context";

/** What a new thread would be pinned to: the one part or pipe selected, else the whole schematic. */
export function useSelectedAnchor(): Anchor {
  const sel = useBoard((s) => s.selection);
  if (sel.parts.length === 1 && sel.pipes.length === 0) return { kind: "part", id: sel.parts[0]! };
  if (sel.pipes.length === 1 && sel.parts.length === 0) return { kind: "pipe", id: sel.pipes[0]! };
  return { kind: "schematic", id: null };
}

/** The revision new threads go on: the one open, else the newest saved one. */
function useTargetRevision() {
  const r = useReview();
  const session = useBoardSession();
  return r.viewing ?? session.revisions[0] ?? null;
}

export function NewThreadButton() {
  const r = useReview();
  const anchor = useSelectedAnchor();
  const target = useTargetRevision();
  const block = r.writeBlock(target?.status ?? null);
  if (block) return <p className="px-2 text-[11px] text-ink-faint" data-testid="write-block">{block}</p>;
  return (
    <Button variant="secondary" className="px-2 py-0.5 text-xs" onClick={() => { r.compose(anchor); r.select(null); }} data-testid="new-thread"
      title={anchor.kind === "schematic" ? "Select a part or pipe first to pin the thread to it" : undefined}>
      + Thread{anchor.kind === "schematic" ? "" : ` on ${anchor.id}`}
    </Button>
  );
}

export function NewThreadForm({ anchor }: { anchor: Anchor }) {
  const r = useReview();
  const doc = useBoard((s) => s.doc);
  const target = useTargetRevision();
  if (!target) return null;
  return (
    <div className="px-2 pb-2 text-sm" data-testid="new-thread-form">
      <p className="mb-1 flex flex-wrap items-center gap-1 text-xs text-ink-soft">
        <span>New thread on <strong className="text-ink">{anchorText(anchor, doc)}</strong>, Rev {target.number}</span>
        {anchor.kind !== "schematic" && (
          <button type="button" className="ml-auto text-copper-700 hover:underline" onClick={() => r.compose({ kind: "schematic", id: null })}>whole schematic instead</button>
        )}
      </p>
      <Composer people={r.mentionable} label="What should be looked at" submitLabel="Start thread" autoFocus onCancel={() => r.compose(null)} testId="thread-composer"
        onSubmit={async (body) => {
          const out = await r.write("POST", `/api/v1/schematics/${r.schematicId}/threads`,
            { anchor: anchor.kind === "schematic" ? { kind: "schematic" } : anchor, body, revisionId: target.id });
          if (!out.ok) return out.error;
          r.compose(null);
          r.setFilter({ ...r.filter, state: "open" });
          if (out.thread) r.select(out.thread.id, false);
          return null;
        }} />
    </div>
  );
}
