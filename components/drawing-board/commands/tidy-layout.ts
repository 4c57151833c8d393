/**
 * A small layered layout for "tidy": pipes point from → to, parts go in
 * columns by longest path from a source, rows keep their old top-to-bottom
 * order. Heating circuits are loops, so a cycle is broken at its leftmost part
 * (where a designer usually starts drawing). No layout library: a plant room
 * selection is tens of parts, and this keeps the result predictable.
 */
import { splitPortRef, type Schematic } from "@/lib/schematic";

export const COLUMN = 140;
export const ROW = 120;

export function layeredLayout(doc: Schematic, ids: Set<string>): Map<string, { x: number; y: number }> {
  const parts = doc.parts.filter((p) => ids.has(p.id));
  const succ = new Map<string, string[]>(parts.map((p) => [p.id, []]));
  const indeg = new Map<string, number>(parts.map((p) => [p.id, 0]));
  for (const pipe of doc.pipes) {
    const a = splitPortRef(pipe.from).partId;
    const b = splitPortRef(pipe.to).partId;
    if (a === b || !succ.has(a) || !succ.has(b)) continue;
    succ.get(a)!.push(b);
    indeg.set(b, (indeg.get(b) ?? 0) + 1);
  }
  const layer = new Map<string, number>();
  const done = new Set<string>();
  const byX = [...parts].sort((p, q) => p.x - q.x || p.y - q.y);
  while (done.size < parts.length) {
    let ready = byX.filter((p) => !done.has(p.id) && (indeg.get(p.id) ?? 0) === 0);
    // a cycle: start it at its leftmost part
    if (ready.length === 0) ready = [byX.find((p) => !done.has(p.id))!];
    for (const p of ready) {
      done.add(p.id);
      const l = layer.get(p.id) ?? 0;
      layer.set(p.id, l);
      for (const s of succ.get(p.id) ?? []) {
        indeg.set(s, (indeg.get(s) ?? 0) - 1);
        if (!done.has(s)) layer.set(s, Math.max(layer.get(s) ?? 0, l + 1));
      }
    }
  }
  const x0 = Math.min(...parts.map((p) => p.x));
  const y0 = Math.min(...parts.map((p) => p.y));
  const columns = new Map<number, typeof parts>();
  for (const p of parts) {
    const l = layer.get(p.id) ?? 0;
    columns.set(l, [...(columns.get(l) ?? []), p]);
  }
  const out = new Map<string, { x: number; y: number }>();
  for (const [l, col] of columns) {
    col.sort((p, q) => p.y - q.y || p.x - q.x);
    col.forEach((p, i) => out.set(p.id, { x: x0 + l * COLUMN, y: y0 + i * ROW }));
  }
  return out;
}
