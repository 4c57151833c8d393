"use client";

import { useBoard } from "../store";
import { legendRows } from "./velocity-bands";

/** Key to the pipe colours once sized, for this design's velocity limit. */
export function VelocityLegend() {
  const max = useBoard((s) => s.doc.design.maxVelocityMps);
  const sized = useBoard((s) => s.results !== null);
  if (!sized) return null;
  return (
    <div className="rounded-md border border-ink/10 bg-white/95 px-3 py-2 text-xs shadow-sm" data-testid="velocity-legend">
      <p className="mb-1 font-medium text-ink-soft">Pipe velocity</p>
      <ul className="space-y-0.5">
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
    </div>
  );
}
