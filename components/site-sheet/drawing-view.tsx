"use client";
/**
 * The issued drawing, read-only (the exported sheet's SVG): installed pipes drawn green, the
 * chosen one in copper. Tap a pipe or part to jump to its row on the sheet; "Back to the row"
 * returns to where you came from.
 */
import { useEffect, useMemo, useRef, useState } from "react";
import { DrawingSheet } from "@/components/drawing-board/export/drawing-sheet";
import type { SiteSheet } from "@/lib/site/site-view";
import type { ShownTick } from "./overlay";

const esc = (id: string) => (typeof CSS !== "undefined" && CSS.escape ? CSS.escape(id) : id.replace(/["\\]/g, "\\$&"));

export function DrawingView({ sheet, ticks, focus, onPick, onBack }: {
  sheet: SiteSheet; ticks: Record<string, ShownTick>; focus: string | null; onPick: (id: string) => void; onBack: (() => void) | null;
}) {
  const box = useRef<HTMLDivElement>(null);
  const [zoom, setZoom] = useState(1);
  const title = { project: sheet.project.name, schematic: sheet.schematic.name, revision: `Rev ${sheet.revision.number}`, status: "Issued",
    date: new Date(sheet.revision.issuedAt).toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric" }) };
  const svg = useMemo(() => <DrawingSheet doc={sheet.document} title={title} tags="id" hitWidth={18} />,
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [sheet.document, sheet.revision.id]);
  const installed = Object.entries(ticks).filter(([, t]) => t.ticked).map(([id]) => id);
  const css = [
    installed.length ? `${installed.map((id) => `[data-pipe="${esc(id)}"] [data-run]`).join(",")}{stroke:#2f7d4f;stroke-width:4}` : "",
    focus ? `[data-pipe="${esc(focus)}"] [data-run]{stroke:#b4632b;stroke-width:7} [data-part="${esc(focus)}"]{outline:3px solid #b4632b}` : "",
  ].join("\n");

  useEffect(() => {
    const el = focus ? box.current?.querySelector(`[data-pipe="${esc(focus)}"],[data-part="${esc(focus)}"]`) : null;
    if (!el || !box.current) return;
    // centre it inside the drawing's own scroll box (scrollIntoView would move the page too)
    const b = box.current.getBoundingClientRect();
    const r = el.getBoundingClientRect();
    box.current.scrollLeft += r.left + r.width / 2 - (b.left + b.width / 2);
    box.current.scrollTop += r.top + r.height / 2 - (b.top + b.height / 2);
  }, [focus, zoom]);

  useEffect(() => { // fit the sheet's height to the box first: readable, scrolled sideways with a thumb
    const svgEl = box.current?.querySelector("svg");
    const h = Number(svgEl?.getAttribute("height"));
    if (h && box.current) setZoom(Math.min(1, box.current.clientHeight / h));
  }, [sheet.revision.id]);

  const pick = (e: React.MouseEvent) => {
    const hit = (e.target as Element).closest("[data-pipe],[data-part]");
    const id = hit?.getAttribute("data-pipe") ?? hit?.getAttribute("data-part");
    if (id) onPick(id);
  };
  return (
    <div>
      <div className="flex flex-wrap items-center gap-2 px-3 py-2">
        {onBack && <button type="button" onClick={onBack} className="min-h-11 rounded-md bg-ink px-3 text-sm font-semibold text-white">← Back to the row</button>}
        <span className="text-sm text-ink-soft">Tap a pipe or part to open its row.</span>
        <span className="ml-auto flex gap-1">
          <button type="button" aria-label="Zoom out" onClick={() => setZoom((z) => z / 1.5)} className="h-11 w-11 rounded-md border border-ink/25 bg-white text-xl font-bold">−</button>
          <button type="button" aria-label="Zoom in" onClick={() => setZoom((z) => z * 1.5)} className="h-11 w-11 rounded-md border border-ink/25 bg-white text-xl font-bold">+</button>
        </span>
      </div>
      <style>{css}</style>
      <div ref={box} onClick={pick} data-testid="site-drawing" className="h-[65vh] overflow-auto border-y border-ink/15 bg-white [&_[data-pipe]]:cursor-pointer"
        style={{ ["--zoom" as string]: zoom }}>
        <div style={{ zoom }}>{svg}</div>
      </div>
    </div>
  );
}
