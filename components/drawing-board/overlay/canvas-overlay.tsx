"use client";

import { useState } from "react";
import { useBoard } from "../store";
import { FindingsList } from "./findings-list";
import { VelocityLegend } from "./velocity-legend";

/** Over the canvas once sized: the velocity legend (bottom left, beside the zoom controls) and the findings panel (top right, foldable). */
export function CanvasOverlay() {
  const count = useBoard((s) => s.results?.findings.length ?? null);
  // folded on a phone, where the list would cover most of the drawing (rendered client-side only, after Size it)
  const [open, setOpen] = useState(() => typeof window === "undefined" || window.matchMedia("(min-width: 640px)").matches);
  if (count === null) return null;
  return (
    <>
      <div className="pointer-events-auto absolute bottom-3 left-14 z-10 hidden sm:block"><VelocityLegend /></div>
      <div className="pointer-events-auto absolute top-2 right-2 z-10 w-[min(22rem,calc(100%-1rem))]">
        <div className="rounded-md border border-ink/10 bg-white/95 shadow-sm">
          <button type="button" onClick={() => setOpen((o) => !o)} aria-expanded={open}
            className="flex w-full items-center justify-between px-3 py-1.5 text-sm font-medium">
            Findings <span className="num text-xs text-ink-faint">{count} {open ? "▴" : "▾"}</span>
          </button>
          {open && <div className="max-h-[40vh] overflow-auto border-t border-ink/10 px-1 py-1"><FindingsList /></div>}
        </div>
      </div>
    </>
  );
}
