/**
 * Where a pipe meets a part's port in flow coordinates, from the part's own
 * layout and orientation (as its handles are placed on the canvas). Shared by
 * the far-out overview canvas and the drawing export. Pure.
 */
import { Position } from "@xyflow/system";
import type { Part } from "@/lib/schematic";
import { layoutOf } from "./layout";
import { orientedLayout, type Orientation } from "./orientation";

export interface PortPoint { x: number; y: number; position: Position }

export function portPoint(part: Pick<Part, "type" | "props">, orientation: Orientation, at: { x: number; y: number }, port: string | null | undefined): PortPoint | null {
  if (!port) return null;
  const layout = orientedLayout(layoutOf(part.type, part.props), orientation);
  const spot = layout.ports[port];
  if (!spot) return null;
  const left = at.x - layout.w / 2;
  const top = at.y - layout.h / 2;
  switch (spot.side) {
    case "left": return { x: left, y: top + spot.at * layout.h, position: Position.Left };
    case "right": return { x: left + layout.w, y: top + spot.at * layout.h, position: Position.Right };
    case "top": return { x: left + spot.at * layout.w, y: top, position: Position.Top };
    default: return { x: left + spot.at * layout.w, y: top + layout.h, position: Position.Bottom };
  }
}
