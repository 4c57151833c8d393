/**
 * The drawing as one printable SVG sheet: parts in their symbols and
 * orientation, pipes as the same orthogonal runs the canvas draws (red flow,
 * blue return) captioned "size · length", part labels (or ids), and a title
 * block with project, schematic, revision, status and date. Plain React
 * elements from the document alone — no canvas, no store — so the browser
 * serialises it for SVG, PNG and print, and a test renders it on the server.
 */
import { getSmoothStepPath } from "@xyflow/react";
import { splitPortRef, type Part, type Schematic } from "@/lib/schematic";
import { layoutOf, symbols } from "../parts";
import { autoOrient, explicitOrientation, IDENTITY, orientedLayout, svgTransform, type Orientation } from "../parts/orientation";
import { portPoint } from "../parts/port-point";
import { partTag } from "../parts/tag";
import { pipeSides } from "../pipes/flow-side";
import { PIPE_STEP, pipeCaption, sideColour } from "../pipes/pipe-edge";

export interface TitleBlock { project: string; schematic: string; revision: string; status: string; date: string }

const MARGIN = 40;
const BLOCK = { w: 380, row: 18, head: 26 };
const FONT = "'IBM Plex Sans', Arial, sans-serif";
const INK = "#1f1d1a";
const CAUTION = "Design aid: to be checked by a competent person. Follow local codes, manufacturers' instructions and licensed practice.";

function bounds(doc: Schematic, orient: (p: Part) => Orientation) {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (const p of doc.parts) {
    const l = orientedLayout(layoutOf(p.type, p.props), orient(p));
    x0 = Math.min(x0, p.x - l.w / 2 - 20); x1 = Math.max(x1, p.x + l.w / 2 + 20);
    y0 = Math.min(y0, p.y - l.h / 2 - 20); y1 = Math.max(y1, p.y + l.h / 2 + 24);
  }
  return Number.isFinite(x0) ? { x0, y0, x1, y1 } : { x0: 0, y0: 0, x1: 400, y1: 200 };
}

function Title({ x, y, t }: { x: number; y: number; t: TitleBlock }) {
  const rows: [string, string][] = [["Project", t.project], ["Schematic", t.schematic], ["Revision", t.revision], ["Status", t.status], ["Date", t.date]];
  const h = BLOCK.head + rows.length * BLOCK.row + 8;
  return (
    <g transform={`translate(${x} ${y})`} data-title-block="">
      <rect width={BLOCK.w} height={h} fill="#fffdf9" stroke={INK} strokeWidth={1} />
      <text x={10} y={18} fontFamily={FONT} fontSize={13} fontWeight={600} fill="#7c411b">Loopwright</text>
      <line x1={0} y1={BLOCK.head} x2={BLOCK.w} y2={BLOCK.head} stroke={INK} strokeWidth={0.75} />
      {rows.map(([k, v], i) => (
        <text key={k} x={10} y={BLOCK.head + 13 + i * BLOCK.row} fontFamily={FONT} fontSize={11} fill={INK}>
          <tspan fill="#4a453e">{k}: </tspan><tspan fontWeight={600}>{v}</tspan>
        </text>
      ))}
    </g>
  );
}

/** `hitWidth`: an invisible wider stroke under each pipe, so a finger can tap it (site sheet's drawing). */
export function DrawingSheet({ doc, title, tags, hitWidth }: { doc: Schematic; title: TitleBlock; tags: "label" | "id"; hitWidth?: number }) {
  const auto = autoOrient(doc);
  const orient = (p: Part) => explicitOrientation(p) ?? auto.get(p.id) ?? IDENTITY;
  const byId = new Map(doc.parts.map((p) => [p.id, p]));
  const sides = pipeSides(doc);
  const b = bounds(doc, orient);
  const drawW = b.x1 - b.x0;
  const width = Math.max(drawW, BLOCK.w) + 2 * MARGIN;
  const blockY = b.y1 - b.y0 + MARGIN + 20;
  const height = blockY + BLOCK.head + 5 * BLOCK.row + 8 + 40 + MARGIN;
  const end = (ref: string) => {
    const { partId, port } = splitPortRef(ref);
    const part = byId.get(partId);
    return part ? portPoint(part, orient(part), part, port) : null;
  };
  return (
    <svg xmlns="http://www.w3.org/2000/svg" width={width} height={height} viewBox={`${b.x0 - MARGIN} ${b.y0 - MARGIN} ${width} ${height}`}
      style={{ color: INK, background: "#ffffff" }}>
      <title>{`${title.project} — ${title.schematic} — ${title.revision}`}</title>
      <rect x={b.x0 - MARGIN} y={b.y0 - MARGIN} width={width} height={height} fill="#ffffff" />
      {doc.pipes.map((pipe) => {
        const a = end(pipe.from);
        const z = end(pipe.to);
        if (!a || !z) return null;
        const [d, lx, ly] = getSmoothStepPath({ sourceX: a.x, sourceY: a.y, targetX: z.x, targetY: z.y, sourcePosition: a.position, targetPosition: z.position, ...PIPE_STEP });
        return (
          <g key={pipe.id} data-pipe={pipe.id}>
            {hitWidth ? <path d={d} fill="none" stroke="transparent" strokeWidth={hitWidth} data-hit="" /> : null}
            <path d={d} fill="none" stroke={sideColour[sides.get(pipe.id) ?? "none"]} strokeWidth={2} data-run="" />
            <text x={lx} y={ly - 4} textAnchor="middle" fontFamily={FONT} fontSize={8} fill="#4a453e" stroke="#ffffff" strokeWidth={2.5} paintOrder="stroke">
              {pipeCaption(pipe)}
            </text>
          </g>
        );
      })}
      {doc.parts.map((p) => {
        const base = layoutOf(p.type, p.props);
        const o = orient(p);
        const l = orientedLayout(base, o);
        const Symbol = symbols[p.type];
        const tag = partTag(p, tags);
        return (
          <g key={p.id} transform={`translate(${p.x - l.w / 2} ${p.y - l.h / 2})`} data-part={p.id}>
            <g transform={svgTransform(base, o)}><Symbol w={base.w} h={base.h} props={p.props as Record<string, unknown>} /></g>
            {tag && <text x={l.w / 2} y={l.h + 11} textAnchor="middle" fontFamily={FONT} fontSize={9} fill={INK}>{tag}</text>}
          </g>
        );
      })}
      <Title x={b.x0 - MARGIN + width - MARGIN - BLOCK.w} y={b.y0 + blockY - MARGIN} t={title} />
      <text x={b.x0} y={b.y0 + height - MARGIN - 12} fontFamily={FONT} fontSize={9} fill="#4a453e">{CAUTION}</text>
    </svg>
  );
}
