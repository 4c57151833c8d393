/**
 * Where a part clicked in from the parts bin goes: the free spot nearest the
 * view's centre, searched ring by ring on the grid, so parts added one after
 * another line up beside each other instead of piling on one spot. Pure.
 */
import type { PartType, Schematic } from "@/lib/schematic";
import { layoutOf } from "../parts/layout";

/** Clear space kept around each part, px (one grid step). */
const MARGIN = 20;
const MAX_RINGS = 60;

type Box = { x0: number; y0: number; x1: number; y1: number };

function boxAt(type: PartType, props: unknown, x: number, y: number): Box {
  const l = layoutOf(type, props);
  // a turned part swaps its sides: keep the larger of the two free either way
  const half = Math.max(l.w, l.h) / 2 + MARGIN / 2;
  return { x0: x - half, y0: y - half, x1: x + half, y1: y + half };
}

const overlaps = (a: Box, b: Box) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

export function freeSpotNear(doc: Pick<Schematic, "parts">, type: PartType, x: number, y: number, grid = 20): { x: number; y: number } {
  const taken = doc.parts.map((p) => boxAt(p.type, p.props, p.x, p.y));
  const snap = (v: number) => Math.round(v / grid) * grid;
  const cx = snap(x);
  const cy = snap(y);
  const free = (px: number, py: number) => !taken.some((b) => overlaps(b, boxAt(type, undefined, px, py)));
  const step = grid * 2;
  for (let r = 0; r <= MAX_RINGS; r++) {
    // the ring at Chebyshev distance r, nearest points first
    const ring: [number, number][] = [];
    for (let i = -r; i <= r; i++) for (let j = -r; j <= r; j++) if (Math.max(Math.abs(i), Math.abs(j)) === r) ring.push([i, j]);
    ring.sort((a, b) => Math.hypot(a[0], a[1]) - Math.hypot(b[0], b[1]));
    for (const [i, j] of ring) if (free(cx + i * step, cy + j * step)) return { x: cx + i * step, y: cy + j * step };
  }
  return { x: cx, y: cy };
}
