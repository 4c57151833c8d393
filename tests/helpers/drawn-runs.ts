/**
 * Test support: the runs the drawing board draws for a document's pipes —
 * each port placed from the part's own symbol layout and orientation
 * (components/drawing-board/parts), the run between two ports from xyflow's
 * getSmoothStepPath with the board's step settings — as polylines, with the
 * side (flow / return) the board colours them. Used to check that a generated
 * layout draws no flow run across a return run.
 */
import { getSmoothStepPath, Position } from "@xyflow/react";
import { explicitOrientation, IDENTITY, autoOrient, orientedLayout } from "@/components/drawing-board/parts/orientation";
import { layoutOf } from "@/components/drawing-board/parts/layout";
import { pipeSides, type PipeSide } from "@/components/drawing-board/pipes/flow-side";
import { PIPE_STEP } from "@/components/drawing-board/pipes/pipe-edge";
import { splitPortRef, type Schematic } from "@/lib/schematic";

type Pt = { x: number; y: number };
const sides = { left: Position.Left, right: Position.Right, top: Position.Top, bottom: Position.Bottom } as const;

export function drawnRuns(doc: Schematic): { id: string; side: PipeSide; points: Pt[] }[] {
  const auto = autoOrient(doc);
  const parts = new Map(doc.parts.map((p) => [p.id, p]));
  const port = (ref: string) => {
    const { partId, port: name } = splitPortRef(ref);
    const part = parts.get(partId)!;
    const layout = orientedLayout(layoutOf(part.type, part.props), explicitOrientation(part) ?? auto.get(part.id) ?? IDENTITY);
    const spot = layout.ports[name]!;
    const left = part.x - layout.w / 2;
    const top = part.y - layout.h / 2;
    const x = spot.side === "left" ? left : spot.side === "right" ? left + layout.w : left + spot.at * layout.w;
    const y = spot.side === "top" ? top : spot.side === "bottom" ? top + layout.h : top + spot.at * layout.h;
    return { x, y, position: sides[spot.side] };
  };
  const side = pipeSides(doc);
  return doc.pipes.map((p) => {
    const a = port(p.from);
    const b = port(p.to);
    const [d] = getSmoothStepPath({ sourceX: a.x, sourceY: a.y, targetX: b.x, targetY: b.y, sourcePosition: a.position, targetPosition: b.position, ...PIPE_STEP });
    const nums = (d.match(/-?\d+(\.\d+)?(e-?\d+)?/g) ?? []).map(Number);
    const points: Pt[] = [];
    for (let i = 0; i + 1 < nums.length; i += 2) points.push({ x: nums[i]!, y: nums[i + 1]! });
    return { id: p.id, side: side.get(p.id) ?? "none", points };
  });
}

/** Do two polylines (of horizontal and vertical pieces, corners as drawn) meet anywhere? */
export function runsMeet(a: Pt[], b: Pt[]): boolean {
  const eps = 1e-6;
  for (let i = 0; i + 1 < a.length; i++) {
    for (let j = 0; j + 1 < b.length; j++) {
      const [p, q, r, s] = [a[i]!, a[i + 1]!, b[j]!, b[j + 1]!];
      const overlapX = Math.min(Math.max(p.x, q.x), Math.max(r.x, s.x)) + eps >= Math.max(Math.min(p.x, q.x), Math.min(r.x, s.x));
      const overlapY = Math.min(Math.max(p.y, q.y), Math.max(r.y, s.y)) + eps >= Math.max(Math.min(p.y, q.y), Math.min(r.y, s.y));
      if (overlapX && overlapY) return true;
    }
  }
  return false;
}
