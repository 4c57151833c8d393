"use client";
/**
 * Far out (below LOD_ZOOM, level-of-detail.ts) the parts are drawn here, as
 * plain boxes on one canvas, and their DOM is hidden (board.css, .lw-far):
 * a thousand node elements cost the browser ~10–20 ms of style and paint per
 * frame of a pan or zoom, one canvas redraw about 1 ms. Pipes stay SVG edges.
 * Redrawn straight from xyflow's store on every view change, outside React.
 * Parts cannot be dragged this far out; a click selects (Canvas, onPaneClick).
 */
import { useEffect, useRef } from "react";
import { useStoreApi } from "@xyflow/react";
import { useBoard } from "./store";
import type { PartNode } from "./nodes/part-node";

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

export function OverviewParts({ nodes }: { nodes: PartNode[] }) {
  const ref = useRef<HTMLCanvasElement>(null);
  const api = useStoreApi();
  const findings = useBoard((s) => s.findings);
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
      ctx.lineWidth = 2;
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
  }, [api, nodes, findings]);
  return <canvas ref={ref} className="lw-overview" aria-hidden data-testid="board-overview" />;
}
