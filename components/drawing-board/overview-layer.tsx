"use client";
/**
 * Far out (below LOD_ZOOM, level-of-detail.ts) the drawing is a picture: parts
 * as plain boxes and pipes as coloured runs on one canvas, and the parts' and
 * pipes are hidden from xyflow (Canvas). Their 2,200 elements and components
 * cost 15–30 ms of store checks, style and paint per frame of a pan or zoom;
 * here a move costs one bitmap copy a frame, and one redraw when it stops. Redrawn from xyflow's store on every view change,
 * outside React. This far out nothing is dragged; a click selects a part
 * (Canvas, onPaneClick).
 */
import { useEffect, useMemo, useRef } from "react";
import { getSmoothStepPath, useStoreApi } from "@xyflow/react";
import { portPoint } from "./parts/port-point";
import { useBoard } from "./store";
import type { PartNode } from "./nodes/part-node";
import { PIPE_STEP, pipeColour, type PipeEdge } from "./pipes/pipe-edge";

const INK = "#1f1d1a";
const SELECTED = "#9a5222";
const PAPER = "#fffdf9";
const MARK = { error: "#b42318", warning: "#b7791f" } as const;

/** The drawn box of a part: the node's frame inset 15 % each side. */
export function boxOf(n: PartNode): { x: number; y: number; w: number; h: number } {
  const w = n.width ?? 0;
  const h = n.height ?? 0;
  return { x: n.position.x - w / 2 + 0.15 * w, y: n.position.y - h / 2 + 0.15 * h, w: 0.7 * w, h: 0.7 * h };
}

/** Where a pipe meets a port of a drawn node (parts/port-point.ts). */
const nodePort = (node: PartNode | undefined, port: string | null | undefined) =>
  node ? portPoint(node.data.part, node.data.orientation, node.position, port) : null;

/** The pipes as one path per colour, the same orthogonal runs as pipe-edge.tsx. */
function pipePaths(edges: PipeEdge[], nodes: PartNode[]): Map<string, Path2D> {
  const byId = new Map(nodes.map((n) => [n.id, n]));
  const out = new Map<string, Path2D>();
  for (const e of edges) {
    const a = nodePort(byId.get(e.source), e.sourceHandle);
    const b = nodePort(byId.get(e.target), e.targetHandle);
    if (!a || !b || !e.data) continue;
    const [d] = getSmoothStepPath({ sourceX: a.x, sourceY: a.y, targetX: b.x, targetY: b.y, sourcePosition: a.position, targetPosition: b.position, ...PIPE_STEP });
    const colour = e.selected ? SELECTED : pipeColour(e.data);
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
    const dpr = () => window.devicePixelRatio || 1;
    const fit = () => {
      const { width, height } = api.getState();
      const cw = Math.round(width * dpr());
      const ch = Math.round(height * dpr());
      if (canvas.width !== cw || canvas.height !== ch) {
        canvas.width = cw;
        canvas.height = ch;
      }
    };
    /** The picture itself, in flow coordinates (ctx already transformed to the view). */
    const paint = (zoom: number) => {
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
    };
    const clear = () => {
      ctx.setTransform(1, 0, 0, 1, 0, 0);
      ctx.clearRect(0, 0, canvas.width, canvas.height);
    };
    // Full redraw at rest.
    let shown: [number, number, number] = [0, 0, 1];
    const draw = () => {
      fit();
      clear();
      const [tx, ty, zoom] = api.getState().transform;
      const r = dpr();
      ctx.setTransform(r * zoom, 0, 0, r * zoom, r * tx, r * ty);
      paint(zoom);
      shown = [tx, ty, zoom];
    };
    // While the view moves, the last full picture is moved and scaled as a bitmap (one
    // drawImage a frame); the vectors are redrawn sharp once it has been still for 120 ms.
    // What the picture did not cover shows up then.
    const still = document.createElement("canvas");
    let snapped: [number, number, number] | null = null;
    let settle: ReturnType<typeof setTimeout> | undefined;
    const move = () => {
      fit();
      if (!snapped) {
        still.width = canvas.width;
        still.height = canvas.height;
        still.getContext("2d")?.drawImage(canvas, 0, 0);
        snapped = shown;
      }
      const [tx0, ty0, z0] = snapped;
      const [tx, ty, zoom] = api.getState().transform;
      const k = zoom / z0;
      const r = dpr();
      clear();
      ctx.setTransform(k, 0, 0, k, r * (tx - tx0 * k), r * (ty - ty0 * k));
      ctx.drawImage(still, 0, 0);
      clearTimeout(settle);
      settle = setTimeout(() => {
        snapped = null;
        draw();
      }, 120);
    };
    draw();
    const unsubscribe = api.subscribe((s, prev) => {
      if (s.width !== prev.width || s.height !== prev.height) {
        snapped = null;
        draw();
      } else if (s.transform !== prev.transform) move();
    });
    return () => {
      clearTimeout(settle);
      unsubscribe();
    };
  }, [api, nodes, findings, pipes]);
  return <canvas ref={ref} className="lw-overview" aria-hidden data-testid="board-overview" />;
}
