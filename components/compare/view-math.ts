/**
 * The shared view of side by side's two canvases: one xyflow viewport (x, y, zoom) both
 * panes use, fitted to the union of both drawings, zoomed about the panes' centre, or
 * centred on one part or pipe. Pure.
 */
import type { Viewport } from "@xyflow/react";
import { splitPortRef, type Schematic } from "@/lib/schematic";
import type { Bounds } from "@/components/drawing-board/export/drawing-body";

export const MIN_ZOOM = 0.05;
export const MAX_ZOOM = 3;
const clamp = (z: number) => Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, z));

export interface Size { width: number; height: number }

export function unionBounds(a: Bounds, b: Bounds): Bounds {
  return { x0: Math.min(a.x0, b.x0), y0: Math.min(a.y0, b.y0), x1: Math.max(a.x1, b.x1), y1: Math.max(a.y1, b.y1) };
}

/** The whole of `b` in a pane of `size`, centred, with a margin; never above 150 %. */
export function fitViewport(b: Bounds, size: Size, margin = 0.06): Viewport {
  const w = Math.max(1, b.x1 - b.x0);
  const h = Math.max(1, b.y1 - b.y0);
  const zoom = clamp(Math.min(1.5, (size.width * (1 - 2 * margin)) / w, (size.height * (1 - 2 * margin)) / h));
  return { zoom, x: (size.width - w * zoom) / 2 - b.x0 * zoom, y: (size.height - h * zoom) / 2 - b.y0 * zoom };
}

/** Zoom by `factor` keeping the pane's centre where it is. */
export function zoomAbout(v: Viewport, factor: number, size: Size): Viewport {
  const zoom = clamp(v.zoom * factor);
  const cx = size.width / 2;
  const cy = size.height / 2;
  return { zoom, x: cx - ((cx - v.x) / v.zoom) * zoom, y: cy - ((cy - v.y) / v.zoom) * zoom };
}

/** A part's centre, or the middle of a pipe's two end parts; null for an id the document lacks. */
export function itemPoint(doc: Pick<Schematic, "parts" | "pipes">, id: string): { x: number; y: number } | null {
  const part = doc.parts.find((p) => p.id === id);
  if (part) return { x: part.x, y: part.y };
  const pipe = doc.pipes.find((p) => p.id === id);
  if (!pipe) return null;
  const ends = [pipe.from, pipe.to].map((r) => doc.parts.find((p) => p.id === splitPortRef(r).partId)).filter((p) => p !== undefined);
  if (ends.length === 0) return null;
  return { x: ends.reduce((s, p) => s + p.x, 0) / ends.length, y: ends.reduce((s, p) => s + p.y, 0) / ends.length };
}

/** `point` in the middle of the pane, at least at 100 %. */
export function centreOn(point: { x: number; y: number }, size: Size, zoom: number): Viewport {
  const z = clamp(Math.max(zoom, 1));
  return { zoom: z, x: size.width / 2 - point.x * z, y: size.height / 2 - point.y * z };
}

/** The box around the given parts and the end parts of the given pipes; null when none is drawn. */
export function boundsOfItems(doc: Pick<Schematic, "parts" | "pipes">, ids: ReadonlySet<string>, measure: (parts: Schematic["parts"]) => Bounds): Bounds | null {
  const ends = new Set<string>();
  for (const p of doc.pipes) if (ids.has(p.id)) for (const r of [p.from, p.to]) ends.add(splitPortRef(r).partId);
  const parts = doc.parts.filter((p) => ids.has(p.id) || ends.has(p.id));
  return parts.length > 0 ? measure(parts) : null;
}
