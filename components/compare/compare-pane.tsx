"use client";
/**
 * One read-only side of side by side: the drawing (the exported sheet's body) in an xyflow
 * pane that only pans and zooms. The view is controlled from outside, so both panes share it.
 */
import "@xyflow/react/dist/style.css";
import { memo } from "react";
import { Background, BackgroundVariant, ReactFlow, ViewportPortal, type Viewport } from "@xyflow/react";
import type { Schematic } from "@/lib/schematic";
import { DrawingBody, type Bounds, type Mark } from "@/components/drawing-board/export/drawing-body";
import { MAX_ZOOM, MIN_ZOOM } from "./view-math";

const NONE: never[] = [];

/** What the other side had and this one lost, drawn faintly where it was (same view, same coordinates). */
export interface Ghost { doc: Schematic; ids: ReadonlySet<string>; marks: ReadonlyMap<string, Mark> }

const Drawing = memo(function Drawing({ doc, bounds, marks, only, ghost }: {
  doc: Schematic; bounds: Bounds; marks: ReadonlyMap<string, Mark>; only: ReadonlySet<string> | null; ghost: Ghost | null;
}) {
  const w = bounds.x1 - bounds.x0;
  const h = bounds.y1 - bounds.y0;
  return (
    <svg className="lw-compare-drawing" style={{ position: "absolute", left: bounds.x0, top: bounds.y0, overflow: "visible" }}
      width={w} height={h} viewBox={`${bounds.x0} ${bounds.y0} ${w} ${h}`} data-testid="compare-drawing">
      {ghost && ghost.ids.size > 0 && <g opacity={0.35} strokeDasharray="5 4" data-testid="compare-ghost"><DrawingBody doc={ghost.doc} tags="id" marks={ghost.marks} only={ghost.ids} /></g>}
      <DrawingBody doc={doc} tags="label" marks={marks} only={only} />
    </svg>
  );
});

export function ComparePane(props: {
  side: "a" | "b"; name: string; doc: Schematic; bounds: Bounds; marks: ReadonlyMap<string, Mark>; only: ReadonlySet<string> | null;
  ghost: Ghost | null; viewport: Viewport; onViewport: (v: Viewport) => void; empty: string | null;
}) {
  return (
    <section className="relative h-full min-h-0 overflow-hidden rounded-lg border border-ink/10 bg-white" data-testid={`compare-canvas-${props.side}`}
      aria-label={`${props.side.toUpperCase()}: ${props.name} (read-only)`}>
      <ReactFlow nodes={NONE} edges={NONE} viewport={props.viewport} onViewportChange={props.onViewport} minZoom={MIN_ZOOM} maxZoom={MAX_ZOOM}
        nodesDraggable={false} nodesConnectable={false} elementsSelectable={false} deleteKeyCode={null} selectionKeyCode={null}>
        <Background variant={BackgroundVariant.Dots} gap={20} size={1} color="#e4ddd1" />
        <ViewportPortal>
          <Drawing doc={props.doc} bounds={props.bounds} marks={props.marks} only={props.only} ghost={props.ghost} />
        </ViewportPortal>
      </ReactFlow>
      <p className="pointer-events-none absolute left-2 top-2 z-10 max-w-[85%] truncate rounded bg-white/90 px-2 py-0.5 text-xs shadow-sm">
        <span className="mr-1 font-semibold text-copper-700">{props.side.toUpperCase()}</span>{props.name}
      </p>
      {props.empty && <p className="pointer-events-none absolute inset-x-0 top-1/2 z-10 text-center text-sm text-ink-faint">{props.empty}</p>}
    </section>
  );
}
