/**
 * The drawing itself as plain SVG elements from the document alone (no canvas, no store):
 * parts in their symbols and orientation, pipes as the same orthogonal runs the canvas
 * draws (red flow, blue return) captioned "size · length", part labels (or ids). The
 * printed sheet (drawing-sheet.tsx) frames it with a title block; side by side draws two
 * of them with the differences marked (`marks`) and, on request, only those (`only`).
 */
import { getSmoothStepPath } from "@xyflow/system";
import { splitPortRef, type Part, type Schematic } from "@/lib/schematic";
import { layoutOf, symbols } from "../parts";
import { autoOrient, explicitOrientation, IDENTITY, orientedLayout, svgTransform, type Orientation } from "../parts/orientation";
import { portPoint } from "../parts/port-point";
import { partTag } from "../parts/tag";
import { pipeSides } from "../pipes/flow-side";
import { PIPE_STEP, pipeCaption, sideColour } from "../pipes/pipe-style";

export const SHEET_FONT = "'IBM Plex Sans', Arial, sans-serif";
const INK = "#1f1d1a";

/** A part or pipe drawn marked: a halo in `colour`, `note` as its tooltip, `kind` as data-mark. */
export interface Mark { colour: string; note: string; kind: string }

export interface Bounds { x0: number; y0: number; x1: number; y1: number }

function orienter(doc: Schematic): (p: Part) => Orientation {
  const auto = autoOrient(doc);
  return (p) => explicitOrientation(p) ?? auto.get(p.id) ?? IDENTITY;
}

function boundsWith(doc: Schematic, orient: (p: Part) => Orientation): Bounds {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (const p of doc.parts) {
    const l = orientedLayout(layoutOf(p.type, p.props), orient(p));
    x0 = Math.min(x0, p.x - l.w / 2 - 20); x1 = Math.max(x1, p.x + l.w / 2 + 20);
    y0 = Math.min(y0, p.y - l.h / 2 - 20); y1 = Math.max(y1, p.y + l.h / 2 + 24);
  }
  return Number.isFinite(x0) ? { x0, y0, x1, y1 } : { x0: 0, y0: 0, x1: 400, y1: 200 };
}

/** The box the drawing fills (parts with their tags), in drawing coordinates. */
export const drawingBounds = (doc: Schematic): Bounds => boundsWith(doc, orienter(doc));

/** `hitWidth`: an invisible wider stroke under each pipe, so a finger can tap it. */
export function DrawingBody({ doc, tags, marks, only, hitWidth }: {
  doc: Schematic; tags: "label" | "id"; marks?: ReadonlyMap<string, Mark>; only?: ReadonlySet<string> | null; hitWidth?: number;
}) {
  const orient = orienter(doc);
  const byId = new Map(doc.parts.map((p) => [p.id, p]));
  const sides = pipeSides(doc);
  const shown = (id: string) => !only || only.has(id);
  const end = (ref: string) => {
    const { partId, port } = splitPortRef(ref);
    const part = byId.get(partId);
    return part ? portPoint(part, orient(part), part, port) : null;
  };
  return (
    <g>
      {doc.pipes.filter((p) => shown(p.id)).map((pipe) => {
        const a = end(pipe.from);
        const z = end(pipe.to);
        if (!a || !z) return null;
        const [d, lx, ly] = getSmoothStepPath({ sourceX: a.x, sourceY: a.y, targetX: z.x, targetY: z.y, sourcePosition: a.position, targetPosition: z.position, ...PIPE_STEP });
        const mark = marks?.get(pipe.id);
        return (
          <g key={pipe.id} data-pipe={pipe.id} data-mark={mark?.kind}>
            {mark && <path d={d} fill="none" stroke={mark.colour} strokeWidth={10} strokeOpacity={0.35} strokeLinecap="round"><title>{mark.note}</title></path>}
            {hitWidth ? <path d={d} fill="none" stroke="transparent" strokeWidth={hitWidth} data-hit="" /> : null}
            <path d={d} fill="none" stroke={sideColour[sides.get(pipe.id) ?? "none"]} strokeWidth={2} data-run="" />
            <text x={lx} y={ly - 4} textAnchor="middle" fontFamily={SHEET_FONT} fontSize={8} fill="#4a453e" stroke="#ffffff" strokeWidth={2.5} paintOrder="stroke">
              {pipeCaption(pipe)}
            </text>
          </g>
        );
      })}
      {doc.parts.filter((p) => shown(p.id)).map((p) => {
        const base = layoutOf(p.type, p.props);
        const o = orient(p);
        const l = orientedLayout(base, o);
        const Symbol = symbols[p.type];
        const tag = partTag(p, tags);
        const mark = marks?.get(p.id);
        return (
          <g key={p.id} transform={`translate(${p.x - l.w / 2} ${p.y - l.h / 2})`} data-part={p.id} data-mark={mark?.kind}>
            {mark && (
              <rect x={-6} y={-6} width={l.w + 12} height={l.h + 12} rx={6} fill={mark.colour} fillOpacity={0.14} stroke={mark.colour} strokeWidth={2.5}>
                <title>{mark.note}</title>
              </rect>
            )}
            <g transform={svgTransform(base, o)}><Symbol w={base.w} h={base.h} props={p.props as Record<string, unknown>} /></g>
            {tag && <text x={l.w / 2} y={l.h + 11} textAnchor="middle" fontFamily={SHEET_FONT} fontSize={9} fill={INK}>{tag}</text>}
          </g>
        );
      })}
    </g>
  );
}
