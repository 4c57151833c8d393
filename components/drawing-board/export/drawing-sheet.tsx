/**
 * The drawing as one printable SVG sheet: the drawing (drawing-body.tsx) and a
 * title block with project, schematic, revision, status and date. Plain React
 * elements from the document alone — no canvas, no store — so the browser
 * serialises it for SVG, PNG and print, and a test renders it on the server.
 */
import type { Schematic } from "@/lib/schematic";
import { DrawingBody, drawingBounds, SHEET_FONT as FONT } from "./drawing-body";

export interface TitleBlock { project: string; schematic: string; revision: string; status: string; date: string }

const MARGIN = 40;
const BLOCK = { w: 380, row: 18, head: 26 };
const INK = "#1f1d1a";
const CAUTION = "Design aid: to be checked by a competent person. Follow local codes, manufacturers' instructions and licensed practice.";

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
  const b = drawingBounds(doc);
  const drawW = b.x1 - b.x0;
  const width = Math.max(drawW, BLOCK.w) + 2 * MARGIN;
  const blockY = b.y1 - b.y0 + MARGIN + 20;
  const height = blockY + BLOCK.head + 5 * BLOCK.row + 8 + 40 + MARGIN;
  return (
    <svg xmlns="http://www.w3.org/2000/svg" width={width} height={height} viewBox={`${b.x0 - MARGIN} ${b.y0 - MARGIN} ${width} ${height}`}
      style={{ color: INK, background: "#ffffff" }}>
      <title>{`${title.project} — ${title.schematic} — ${title.revision}`}</title>
      <rect x={b.x0 - MARGIN} y={b.y0 - MARGIN} width={width} height={height} fill="#ffffff" />
      <DrawingBody doc={doc} tags={tags} hitWidth={hitWidth} />
      <Title x={b.x0 - MARGIN + width - MARGIN - BLOCK.w} y={b.y0 + blockY - MARGIN} t={title} />
      <text x={b.x0} y={b.y0 + height - MARGIN - 12} fontFamily={FONT} fontSize={9} fill="#4a453e">{CAUTION}</text>
    </svg>
  );
}
