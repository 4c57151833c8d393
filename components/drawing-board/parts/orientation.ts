/**
 * Orientation of a drawn part: quarter turns and mirror, stored on the part as
 * layout fields (`rotation`, `flipX`; the schema keeps unknown fields). Parts
 * without them are auto-oriented: of the orientations their layout allows, the
 * one whose ports face the parts they are piped to (seed documents carry no
 * orientation, and a return tee should open upwards towards its radiators).
 */
import { splitPortRef, type Part, type Schematic } from "@/lib/schematic";
import { layoutOf, type Side, type SymbolLayout } from "./layout";

export interface Orientation {
  rotation: 0 | 90 | 180 | 270;
  flipX: boolean;
}
export const IDENTITY: Orientation = { rotation: 0, flipX: false };

/** The box size and port sides after orientation. */
export function orientedLayout(layout: SymbolLayout, o: Orientation): SymbolLayout {
  if (o.rotation === 0 && !o.flipX) return layout;
  const quarter = o.rotation === 90 || o.rotation === 270;
  const w = quarter ? layout.h : layout.w;
  const h = quarter ? layout.w : layout.h;
  const ports: SymbolLayout["ports"] = {};
  for (const [name, spot] of Object.entries(layout.ports)) {
    const [x, y] = transformPoint(layout, o, pointOf(layout, spot.side, spot.at));
    ports[name] = spotAt(w, h, x, y);
  }
  return { ...layout, w, h, ports };
}

function pointOf(l: { w: number; h: number }, side: Side, at: number): [number, number] {
  if (side === "left") return [0, at * l.h];
  if (side === "right") return [l.w, at * l.h];
  if (side === "top") return [at * l.w, 0];
  return [at * l.w, l.h];
}

function spotAt(w: number, h: number, x: number, y: number) {
  const e = 0.01;
  if (Math.abs(x) < e) return { side: "left" as const, at: y / h };
  if (Math.abs(x - w) < e) return { side: "right" as const, at: y / h };
  if (Math.abs(y) < e) return { side: "top" as const, at: x / w };
  return { side: "bottom" as const, at: x / w };
}

/** Mirror first, then turn clockwise: the same order as `svgTransform`. */
export function transformPoint(l: { w: number; h: number }, o: Orientation, [x0, y]: [number, number]): [number, number] {
  const x = o.flipX ? l.w - x0 : x0;
  if (o.rotation === 90) return [l.h - y, x];
  if (o.rotation === 180) return [l.w - x, l.h - y];
  if (o.rotation === 270) return [y, l.w - x];
  return [x, y];
}

export function svgTransform(l: { w: number; h: number }, o: Orientation): string | undefined {
  const flip = o.flipX ? `matrix(-1 0 0 1 ${l.w} 0)` : "";
  const turn =
    o.rotation === 90 ? `matrix(0 1 -1 0 ${l.h} 0)` : o.rotation === 180 ? `matrix(-1 0 0 -1 ${l.w} ${l.h})` : o.rotation === 270 ? `matrix(0 -1 1 0 0 ${l.w})` : "";
  const t = `${turn} ${flip}`.trim();
  return t || undefined;
}

const normal: Record<Side, [number, number]> = { left: [-1, 0], right: [1, 0], top: [0, -1], bottom: [0, 1] };

const candidates = (turns: SymbolLayout["turns"]): Orientation[] =>
  turns === "all"
    ? [0, 90, 180, 270].flatMap((rotation) => [false, true].map((flipX) => ({ rotation, flipX }) as Orientation))
    : [IDENTITY, { rotation: 0, flipX: true }, { rotation: 180, flipX: true }, { rotation: 180, flipX: false }];

/** Explicit orientation fields of a part, if it has any. */
export function explicitOrientation(part: Part): Orientation | null {
  if (part.rotation === undefined && part.flipX === undefined) return null;
  const r = Number(part.rotation ?? 0);
  return { rotation: ([0, 90, 180, 270].includes(r) ? r : 0) as Orientation["rotation"], flipX: part.flipX === true };
}

/** Auto orientation of every part without explicit fields; O(parts + pipes). */
export function autoOrient(doc: Schematic): Map<string, Orientation> {
  const byId = new Map(doc.parts.map((p) => [p.id, p]));
  const partners = new Map<string, { port: string; other: Part }[]>();
  const add = (ref: string, otherRef: string) => {
    const { partId, port } = splitPortRef(ref);
    const other = byId.get(splitPortRef(otherRef).partId);
    if (!other) return;
    const list = partners.get(partId) ?? [];
    list.push({ port, other });
    partners.set(partId, list);
  };
  for (const pipe of doc.pipes) {
    add(pipe.from, pipe.to);
    add(pipe.to, pipe.from);
  }
  const out = new Map<string, Orientation>();
  for (const part of doc.parts) {
    const links = partners.get(part.id);
    if (!links || explicitOrientation(part)) continue;
    const layout = layoutOf(part.type, part.props);
    let best = IDENTITY;
    let bestScore = score(layout, IDENTITY, part, links) + 0.25; // keep upright unless clearly better
    for (const o of candidates(layout.turns).slice(1)) {
      const s = score(layout, o, part, links);
      if (s > bestScore) [best, bestScore] = [o, s];
    }
    if (best !== IDENTITY) out.set(part.id, best);
  }
  return out;
}

function score(layout: SymbolLayout, o: Orientation, part: Part, links: { port: string; other: Part }[]): number {
  const oriented = orientedLayout(layout, o);
  let s = 0;
  for (const { port, other } of links) {
    const spot = oriented.ports[port];
    if (!spot) continue;
    const dx = other.x - part.x;
    const dy = other.y - part.y;
    const len = Math.hypot(dx, dy) || 1;
    const [nx, ny] = normal[spot.side];
    s += (nx * dx + ny * dy) / len;
  }
  return s;
}
