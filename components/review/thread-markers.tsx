"use client";

import { useEffect, useMemo } from "react";
import { useStore, ViewportPortal } from "@xyflow/react";
import { useBoardApi } from "@/components/drawing-board/board-api";
import { layoutOf } from "@/components/drawing-board/parts/layout";
import { explicitOrientation, orientedLayout, IDENTITY, type Orientation } from "@/components/drawing-board/parts/orientation";
import { portPoint } from "@/components/drawing-board/parts/port-point";
import { useBoard } from "@/components/drawing-board/store";
import { splitPortRef, type Part, type Schematic } from "@/lib/schematic";
import type { Thread } from "@/lib/review/types";
import { useReview } from "./review-context";

interface Marker { key: string; x: number; y: number; threads: Thread[]; open: number }

/** Where a marker sits: a part's top-right corner, a pipe's middle (flow coordinates). */
function spot(doc: Schematic, parts: Map<string, Part>, auto: Map<string, Orientation>, kind: "part" | "pipe", id: string): { x: number; y: number } | null {
  const orient = (id: string) => { const p = parts.get(id)!; return explicitOrientation(p) ?? auto.get(id) ?? IDENTITY; };
  if (kind === "part") {
    const p = parts.get(id);
    if (!p) return null;
    const l = orientedLayout(layoutOf(p.type, p.props), orient(id));
    return { x: p.x + l.w / 2, y: p.y - l.h / 2 };
  }
  const pipe = doc.pipes.find((x) => x.id === id);
  if (!pipe) return null;
  const end = (ref: string) => {
    const { partId, port } = splitPortRef(ref);
    const p = parts.get(partId);
    return p ? portPoint(p, orient(partId), p, port) : null;
  };
  const a = end(pipe.from);
  const b = end(pipe.to);
  return a && b ? { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 } : null;
}

/** Numbered markers on the drawing at each part and pipe with threads, showing how many are open. */
export function ThreadMarkers() {
  const r = useReview();
  const api = useBoardApi();
  const doc = useBoard((s) => s.doc);
  const auto = useBoard((s) => s.autoOrient);
  const zoom = useStore((s) => s.transform[2]);

  const markers = useMemo(() => {
    const groups = new Map<string, Thread[]>();
    for (const t of r.threads) {
      if (t.anchor.kind === "schematic" || !t.anchor.id) continue;
      const k = `${t.anchor.kind}:${t.anchor.id}`;
      groups.set(k, [...(groups.get(k) ?? []), t]);
    }
    const out: Marker[] = [];
    const parts = new Map(doc.parts.map((p) => [p.id, p]));
    for (const [key, threads] of groups) {
      const [kind, id] = [key.slice(0, key.indexOf(":")), key.slice(key.indexOf(":") + 1)] as ["part" | "pipe", string];
      const at = spot(doc, parts, auto, kind, id);
      if (at) out.push({ key, ...at, threads: threads.sort((a, b) => a.number - b.number), open: threads.filter((t) => !t.resolved).length });
    }
    return out;
  }, [r.threads, doc, auto]);

  // bring a thread's part or pipe into view when it is chosen (list, marker, e-mail link)
  const focus = r.focus;
  useEffect(() => { if (focus) api.selectRefs(focus.ids); }, [focus, api]);

  return (
    <ViewportPortal>
      {markers.map((m) => {
        const shown = m.threads.slice(0, 2).map((t) => `#${t.number}`).join(" ") + (m.threads.length > 2 ? " …" : "");
        const first = m.threads.find((t) => !t.resolved) ?? m.threads[0]!;
        return (
          <button key={m.key} type="button" data-testid="thread-marker" data-anchor={m.key} data-open={m.open}
            title={`${m.threads.length} thread${m.threads.length === 1 ? "" : "s"}, ${m.open} open — click to read`}
            onClick={() => { r.show("threads"); r.compose(null); r.select(first.id); }}
            className={`nodrag nopan pointer-events-auto absolute flex items-center gap-1 rounded-full rounded-bl-none border px-1.5 py-0.5 text-[11px] font-semibold shadow-sm ${
              m.open > 0 ? "border-copper-600 bg-copper-500 text-white" : "border-ink/20 bg-white text-ink-faint"} ${m.threads.some((t) => t.id === r.selected) ? "ring-2 ring-copper-300" : ""}`}
            style={{ transform: `translate(${m.x}px, ${m.y}px) translate(-10%, -100%) scale(${1 / Math.max(zoom, 0.4)})`, transformOrigin: "0 100%", zIndex: 1000 }}>
            <span className="num">{shown}</span>
            {m.open > 0 && <span className="num rounded-full bg-white px-1 text-[10px] text-copper-700" aria-label={`${m.open} open`}>{m.open}</span>}
          </button>
        );
      })}
    </ViewportPortal>
  );
}
