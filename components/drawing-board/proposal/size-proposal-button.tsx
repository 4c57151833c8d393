"use client";

import { useState } from "react";
import { useBoardSession } from "../persistence/session-context";
import { SizeProposal } from "./size-proposal";

/** Top-bar toggle for the "Cheapest sizes" panel, which floats over the canvas on the left. */
export function SizeProposalButton() {
  const { canSize } = useBoardSession();
  const [open, setOpen] = useState(false);
  if (!canSize) return null;
  return (
    <>
      <button type="button" onClick={() => setOpen((o) => !o)} aria-expanded={open} data-testid="open-proposal"
        className={`rounded-md border px-2 py-1 text-sm ${open ? "border-copper-300 bg-copper-50 text-copper-700" : "border-ink/15 bg-white text-ink-soft hover:text-ink"}`}>
        Cheapest sizes
      </button>
      {open && (
        <aside aria-label="Cheapest sizes" className="fixed top-28 left-2 z-30 max-h-[calc(100dvh-8rem)] w-[min(24rem,calc(100vw-1rem))] overflow-auto rounded-md border border-ink/10 bg-white p-3 shadow-lg md:left-60">
          <div className="mb-2 flex items-center justify-between">
            <h2 className="text-sm font-semibold">Cheapest sizes for the whole network</h2>
            <button type="button" onClick={() => setOpen(false)} aria-label="Close" className="rounded px-1 text-ink-soft hover:bg-paper-dark">✕</button>
          </div>
          <SizeProposal />
        </aside>
      )}
    </>
  );
}
