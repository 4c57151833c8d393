"use client";
import { useEffect, useState } from "react";
import type { SiteSheet } from "@/lib/site/site-view";
import { progress, type ShownTick } from "./overlay";
import { SiteRowView } from "./site-row";

/** The sheet by circuit: progress per circuit, every row tickable, filter to what is left. */
export function SheetList({ sheet, ticks, highlight, onToggle, onDrawing, onPhoto }: {
  sheet: SiteSheet; ticks: Record<string, ShownTick>; highlight: string | null;
  onToggle: (id: string) => void; onDrawing: (id: string) => void; onPhoto: (id: string) => void;
}) {
  const [leftOnly, setLeftOnly] = useState(false);
  useEffect(() => { if (highlight) setLeftOnly(false); }, [highlight]); // a jump to a row shows it, ticked or not
  const all = sheet.groups.flatMap((g) => g.rows);
  const done = all.filter((id) => ticks[id]?.ticked).length;
  return (
    <div>
      <div className="flex items-center justify-between gap-2 px-3 py-2">
        <p className="text-base font-semibold" data-testid="overall-progress"><span className="num">{done}</span> of <span className="num">{all.length}</span> installed</p>
        <div role="group" aria-label="Show" className="flex overflow-hidden rounded-md border border-ink/25">
          {[false, true].map((v) => (
            <button key={String(v)} type="button" aria-pressed={leftOnly === v} onClick={() => setLeftOnly(v)}
              className={`min-h-11 px-3 text-sm font-semibold ${leftOnly === v ? "bg-ink text-white" : "bg-white text-ink"}`}>
              {v ? "Left to do" : "All"}
            </button>
          ))}
        </div>
      </div>
      {sheet.groups.map((g) => {
        const p = progress(g, ticks);
        const rows = leftOnly ? g.rows.filter((id) => !ticks[id]?.ticked) : g.rows;
        if (leftOnly && rows.length === 0) return null;
        return (
          <section key={g.id} className="mb-3" data-group={g.id} aria-label={g.title}>
            <header className="flex items-center justify-between gap-2 border-y border-ink/15 bg-paper px-3 py-2">
              <h2 className="min-w-0 text-base font-bold">{g.title}</h2>
              <span className="num shrink-0 text-sm font-semibold" data-testid={`progress-${g.id}`}>{p.done} of {p.total}</span>
            </header>
            <div className="h-1.5 bg-ink/10"><div className="h-1.5 bg-ok" style={{ width: `${(100 * p.done) / Math.max(1, p.total)}%` }} /></div>
            <ul>
              {rows.map((id) => {
                const row = sheet.rows[id];
                if (!row) return null;
                return (
                  <SiteRowView key={id} row={row} tick={ticks[id]} mayRecord={sheet.me.mayRecord} highlighted={highlight === id}
                    onToggle={() => onToggle(id)} onDrawing={() => onDrawing(id)} onPhoto={() => onPhoto(id)} />
                );
              })}
            </ul>
          </section>
        );
      })}
    </div>
  );
}
