"use client";

import { useState } from "react";
import { useBoard } from "../store";
import { viewLabel } from "./results-view";
import { legendRows } from "./velocity-bands";

/** Key to the pipe colours once sized, for this design's velocity limit; folds to one line (folded at first on a phone). */
export function VelocityLegend() {
  const max = useBoard((s) => s.doc.design.maxVelocityMps);
  const results = useBoard((s) => s.results);
  const view = useBoard((s) => s.resultsView);
  const [open, setOpen] = useState(() => typeof window === "undefined" || window.matchMedia("(min-width: 640px)").matches);
  if (!results) return null;
  return (
    <div className="rounded-md border border-ink/10 bg-white/95 text-xs shadow-sm" data-testid="velocity-legend">
      <button type="button" onClick={() => setOpen((o) => !o)} aria-expanded={open} className="flex w-full items-center gap-2 px-3 py-1.5 text-left">
        <span className="font-medium text-ink-soft">Pipe velocity</span>
        <span className="text-ink-faint">{viewLabel(results, view)} {open ? "▾" : "▸"}</span>
      </button>
      {open && (
        <ul className="space-y-0.5 px-3 pb-2">
          {legendRows(max).map((r) => (
            <li key={r.band} className="flex items-center gap-2">
              <span className="inline-block h-1 w-5 rounded" style={{ background: r.color }} aria-hidden />
              <span className="w-16 text-ink">{r.label}</span>
              <span className="num text-ink-faint">{r.range}</span>
            </li>
          ))}
          <li className="flex items-center gap-2">
            <span className="inline-block h-1.5 w-5 rounded border border-copper-500 bg-copper-100" aria-hidden />
            <span className="text-ink">index circuit</span>
          </li>
        </ul>
      )}
    </div>
  );
}
