"use client";
/**
 * One drawn part: its symbol (turned/mirrored), its named port handles, its
 * tag, and a findings marker. Memoised; node data is rebuilt only for parts
 * that changed, so a drag or an edit elsewhere does not repaint it.
 */
import { memo } from "react";
import { Handle, Position, type Node, type NodeProps } from "@xyflow/react";
import { partRegistry, type Part } from "@/lib/schematic";
import { useBoard } from "../store";
import { layoutOf, symbols } from "../parts";
import { orientedLayout, svgTransform, type Orientation } from "../parts/orientation";
import type { PortSpot } from "../parts/layout";

export type PartNodeData = { part: Part; orientation: Orientation; readOnly: boolean };
export type PartNode = Node<PartNodeData, "part">;

const position: Record<PortSpot["side"], Position> = {
  left: Position.Left,
  right: Position.Right,
  top: Position.Top,
  bottom: Position.Bottom,
};

function PortHandle({ name, spot, readOnly }: { name: string; spot: PortSpot; readOnly: boolean }) {
  const along = `${(spot.at * 100).toFixed(2)}%`;
  const style = spot.side === "left" || spot.side === "right" ? { top: along } : { left: along };
  return (
    <Handle id={name} type="source" position={position[spot.side]} style={style} isConnectable={!readOnly} className="lw-port" data-port={name}>
      <span className={`lw-port-label lw-port-label-${spot.side}`}>{name}</span>
    </Handle>
  );
}

function FindingMarker({ id }: { id: string }) {
  const severity = useBoard((s) => s.findings.get(id));
  if (!severity || severity === "info") return null;
  return (
    <span className={`lw-marker ${severity === "error" ? "bg-fault" : "bg-warn"}`} title={`${severity} — see findings`} data-finding={severity}>
      !
    </span>
  );
}

export const PartNodeView = memo(function PartNodeView({ id, data, selected }: NodeProps<PartNode>) {
  const { part, orientation, readOnly } = data;
  const base = layoutOf(part.type, part.props);
  const layout = orientedLayout(base, orientation);
  const Symbol = symbols[part.type];
  const title = part.label ? `${part.label} (${id})` : `${partRegistry[part.type].label} ${id}`;
  return (
    <div className={`lw-part ${selected ? "lw-part-selected" : ""}`} style={{ width: layout.w, height: layout.h }} title={title} data-part-type={part.type}>
      <svg width={layout.w} height={layout.h} className="lw-symbol" aria-hidden>
        <g transform={svgTransform(base, orientation)}>
          <Symbol w={base.w} h={base.h} props={part.props as Record<string, unknown>} />
        </g>
      </svg>
      {Object.entries(layout.ports).map(([name, spot]) => (
        <PortHandle key={name} name={name} spot={spot} readOnly={readOnly} />
      ))}
      <span className="lw-tag">{id}</span>
      <FindingMarker id={id} />
    </div>
  );
});
