"use client";
/**
 * A pipe: an orthogonal run between two ports, red for flow and blue for
 * return (flow-side.ts), labelled "size · length". After Size it, board-2's
 * overlay (data.overlay) recolours it by velocity band and adds the numbers.
 * Zoomed far out the overview canvas draws the same run instead (overview-layer.tsx).
 */
import { memo } from "react";
import { BaseEdge, getSmoothStepPath, type Edge, type EdgeProps } from "@xyflow/react";
import type { Pipe } from "@/lib/schematic";
import type { PipeLabel } from "../overlay/pipe-labels";
import type { PipeSide } from "./flow-side";
import { PIPE_STEP, pipeCaption, sideColour } from "./pipe-style";

export type PipeEdgeData = { pipe: Pipe; side: PipeSide; overlay: PipeLabel | null };
export type PipeEdge = Edge<PipeEdgeData, "pipe">;

export { PIPE_STEP, pipeCaption, sideColour };
/** Its colour: the velocity band after Size it, else flow or return side. */
export const pipeColour = (d: PipeEdgeData) => (d.overlay ? d.overlay.color : sideColour[d.side]);

export const PipeEdgeView = memo(function PipeEdgeView(props: EdgeProps<PipeEdge>) {
  const { id, sourceX, sourceY, targetX, targetY, sourcePosition, targetPosition, data, selected } = props;
  const [path, lx, ly] = getSmoothStepPath({ sourceX, sourceY, targetX, targetY, sourcePosition, targetPosition, ...PIPE_STEP });
  if (!data) return null;
  const { pipe, side, overlay } = data;
  const colour = pipeColour(data);
  const width = (overlay?.onIndexCircuit ? 3.5 : 2) + (selected ? 1.5 : 0);
  // a label wider than its pipe would sit on the ports: show it when zoomed in or selected
  const short = Math.abs(targetX - sourceX) + Math.abs(targetY - sourceY) < 90;
  const lines = overlay ? [pipeCaption(pipe), overlay.flow, `${overlay.velocity} · ${overlay.pressureDrop}`] : [pipeCaption(pipe)];
  return (
    <g data-side={side} className="lw-pipe">
      {overlay && <path d={path} fill="none" stroke={sideColour[side]} strokeWidth={width + 3} strokeOpacity={0.25} />}
      {selected && <path d={path} fill="none" stroke="#dc9a6a" strokeWidth={width + 6} strokeOpacity={0.45} />}
      <BaseEdge id={id} path={path} style={{ stroke: colour, strokeWidth: width }} interactionWidth={14} />
      <text x={lx} y={ly - 4 - (lines.length - 1) * 10} className={`lw-pipe-label ${short && !selected ? "lw-pipe-label-short" : ""}`} textAnchor="middle">
        {lines.map((t, i) => (
          <tspan key={i} x={lx} dy={i === 0 ? 0 : 10} className={i === 0 ? "" : "lw-pipe-label-result"}>
            {t}
          </tspan>
        ))}
        {overlay?.suggestedSize && (
          <tspan x={lx} dy={10} className="lw-pipe-label-suggest">
            → {overlay.suggestedSize}
          </tspan>
        )}
      </text>
    </g>
  );
});
