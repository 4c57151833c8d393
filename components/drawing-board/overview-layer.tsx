"use client";
/**
 * Far out (below LOD_ZOOM, level-of-detail.ts) the drawing is a picture: parts
 * as plain boxes and pipes as coloured runs on one canvas, and the parts' and
 * pipes are hidden from xyflow (Canvas). Their 2,200 elements and components
 * cost 15–30 ms of store checks, style and paint per frame of a pan or zoom;
 * one canvas redraw a few. Redrawn from xyflow's store on every view change,
 * outside React. This far out nothing is dragged; a click selects a part
 * (Canvas, onPaneClick).
 */
import { useEffect, useMemo, useRef } from "react";
import { getSmoothStepPath, Position, useStoreApi } from "@xyflow/react";
import { layoutOf } from "./parts";
import { orientedLayout } from "./parts/orientation";
import { useBoard } from "./store";
import type { PartNode } from "./nodes/part-node";
import { sideColour, type PipeEdge } from "./pipes/pipe-edge";

const INK = "#1f1d1a";
const SELECTED = "#9a5222";
const PAPER = "#fffdf9";
const MARK = { error: "#b42318", warning: "#b7791f" } as const;

/** The drawn box of a part: the node's frame inset 15 % each side, as .lw-part-box. */
export function boxOf(n: PartNode): { x: number; y: number; w: number; h: number } {
  const w = n.width ?? 0;
  const h = n.height ?? 0;
  return { x: n.position.x - w / 2 + 0.15 * w, y: n.position.y - h / 2 + 0.15 * h, w: 0.7 * w, h: 0.7 * h };
}

/** Where a pipe meets a port, from the part's own layout (as its handles are placed). */
function portPoint(node: PartNode | undefined, port: string | null | undefined) {
  if (!node || !port) return null;
  const layout = orientedLayout(layoutOf(node.data.part.type, node.data.part.props), node.data.orientation);
  const spot = layout.ports[port];
  if (!spot) return null;
  const left = node.position.x - layout.w / 2;
  const top = node.position.y - layout.h / 2;
  switch (spot.side) {
    case "left": return { x: left, y: top + spot.at * layout.h, position: Position.Left };
    case "right": return { x: left + layout.w, y: top + spot.at * layout.h, position: Position.Right };
    case "top": return { x: left + spot.at * layout.w, y: top, position: Position.Top };
    default: return { x: left + spot.at * layout.w, y: top + layout.h, position: Position.Bottom };
  }
}

/** The pipes as one path per colour, the same orthogonal runs as pipe-edge.tsx. */
function pipePaths(edges: PipeEdge[], nodes: PartNode[]): Map<string, Path2D> {
  const byId = new Map(nodes.map((n) => [n.id, n]));
  const out = new Map<string, Path2D>();
  for (const e of edges) {
    const a = portPoint(byId.get(e.source), e.sourceHandle);
    const b = portPoint(byId.get(e.target), e.targetHandle);
    if (!a || !b || !e.data) continue;
    const [d] = getSmoothStepPath({ sourceX: a.x, sourceY: a.y, targetX: b.x, targetY: b.y, sourcePosition: a.position, targetPosition: b.position, borderRadius: 6, offset: 16 });
    const colour = e.selected ? SELECTED : (e.data.overlay?.color ?? sideColour[e.data.side]);
    let p = out.get(colour);
    if (!p) out.set(colour, (p = new Path2D()));
    p.addPath(new Path2D(d));
  }
  return out;
}

export function OverviewLayer({ nodes, edges }: { nodes: PartNode[]; edges: PipeEdge[] }) {
  const ref = useRef<HTMLCanvasElement>(null);
  const api = useStoreApi();
  const findings = useBoard((s) => s.findings);
  // built once per change of the drawing, reused by every frame of a pan or zoom
  const pipes = useMemo(() => pipePaths(edges, nodes), [edges, nodes]);
  useEffect(() => {
    const canvas = ref.current;
    const ctx = canvas?.getContext("2d");
    if (!canvas || !ctx) return;
    const draw = () => {
      const { transform, width, height } = api.getState();
      const [tx, ty, zoom] = transform;
      const dpr = window.devicePixelRatio || 1;
      const cw = Math.round(width * dpr);
      const ch = Math.round(height * dpr);
      if (canvas.width !== cw || canvas.height !== ch) {
        canvas.width = cw;
        canvas.height = ch;
      }
      ctx.setTransform(1, 0, 0, 1, 0, 0);
      ctx.clearRect(0, 0, cw, ch);
      ctx.setTransform(dpr * zoom, 0, 0, dpr * zoom, dpr * tx, dpr * ty);
      // at least ~1 px on screen whatever the zoom, so runs and outlines never fade away
      ctx.lineWidth = Math.max(2, 1.2 / zoom);
      for (const [colour, path] of pipes) {
        ctx.strokeStyle = colour;
        ctx.stroke(path);
      }
      ctx.lineWidth = Math.max(2, 1 / zoom);
      ctx.fillStyle = PAPER;
      for (const selected of [false, true]) {
        ctx.beginPath();
        for (const n of nodes) {
          if (Boolean(n.selected) !== selected) continue;
          const b = boxOf(n);
          ctx.rect(b.x, b.y, b.w, b.h);
        }
        ctx.fill();
        ctx.strokeStyle = selected ? SELECTED : INK;
        ctx.stroke();
      }
      // findings markers, kept readable: a fixed 5 px on screen
      for (const n of nodes) {
        const severity = findings.get(n.id);
        if (severity !== "error" && severity !== "warning") continue;
        const b = boxOf(n);
        ctx.beginPath();
        ctx.arc(b.x + b.w, b.y, 5 / zoom, 0, 2 * Math.PI);
        ctx.fillStyle = MARK[severity];
        ctx.fill();
      }
      ctx.fillStyle = PAPER;
    };
    draw();
    return api.subscribe((s, prev) => {
      if (s.transform !== prev.transform || s.width !== prev.width || s.height !== prev.height) draw();
    });
  }, [api, nodes, findings, pipes]);
  return <canvas ref={ref} className="lw-overview" aria-hidden data-testid="board-overview" />;
}
