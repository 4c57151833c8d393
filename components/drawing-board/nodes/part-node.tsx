"use client";
/**
 * One drawn part: its symbol (turned/mirrored), its named port handles, its
 * tag, and a findings marker. Memoised; node data is rebuilt only for parts
 * that changed, so a drag or an edit elsewhere does not repaint it. Zoomed
 * far out the overview canvas draws it instead (overview-layer.tsx).
 */
import { memo } from "react";
import { Handle, Position, type Node, type NodeProps } from "@xyflow/react";
import { partRegistry, portLabel, type Part } from "@/lib/schematic";
import { useUnits } from "@/components/units/units-context";
import { partBadge } from "../overlay/part-badges";
import { useBoard } from "../store";
import { layoutOf, symbols } from "../parts";
import { orientedLayout, svgTransform, type Orientation } from "../parts/orientation";
import { partTag } from "../parts/tag";
import type { PortSpot } from "../parts/layout";

export type PartNodeData = { part: Part; orientation: Orientation; readOnly: boolean };
export type PartNode = Node<PartNodeData, "part">;

const position: Record<PortSpot["side"], Position> = {
  left: Position.Left,
  right: Position.Right,
  top: Position.Top,
  bottom: Position.Bottom,
};

/** The tag goes on a side with no port, so no pipe runs through it. */
function tagSide(ports: PortSpot[]): string {
  const used = new Set(ports.map((p) => p.side));
  return (["bottom", "top", "right", "left"] as const).find((s) => !used.has(s)) ?? "corner";
}

function PortHandle({ name, text, spot, readOnly, labelled }: { name: string; text: string; spot: PortSpot; readOnly: boolean; labelled: boolean }) {
  const along = `${(spot.at * 100).toFixed(2)}%`;
  const style = spot.side === "left" || spot.side === "right" ? { top: along } : { left: along };
  return (
    <Handle id={name} type="source" position={position[spot.side]} style={style} isConnectable={!readOnly} className="lw-port" data-port={name}>
      {labelled && <span className={`lw-port-label lw-port-label-${spot.side}`}>{text}</span>}
    </Handle>
  );
}

/** The part's label (or its id, by the board's labels/ids switch) on the side with no port (parts/tag.ts). */
function Tag({ part, side }: { part: Part; side: string }) {
  const mode = useBoard((s) => s.tagMode);
  const text = partTag(part, mode);
  if (text === null) return null;
  return <span className={`lw-tag lw-tag-${side} ${mode === "label" ? "lw-tag-label" : ""}`} data-tag={mode}>{text}</span>;
}

/** Its number in the results view shown (emitter output, heat-source or bypass flow). */
function Badge({ part }: { part: Part }) {
  const results = useBoard((s) => s.results);
  const view = useBoard((s) => s.resultsView);
  const { prefs } = useUnits();
  const badge = partBadge(results, part, view, prefs);
  if (!badge) return null;
  return <span className={`lw-badge ${badge.warn ? "lw-badge-warn" : ""}`} data-badge={part.id}>{badge.text}</span>;
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
  const ports = Object.entries(layout.ports);
  const title = part.label ? `${part.label} (${id})` : `${partRegistry[part.type].label} ${id}`;
  return (
    <div className={`lw-part ${selected ? "lw-part-selected" : ""}`} style={{ width: layout.w, height: layout.h }} title={title} data-part-type={part.type}>
      <svg width={layout.w} height={layout.h} className="lw-symbol" aria-hidden>
        <g transform={svgTransform(base, orientation)}>
          <Symbol w={base.w} h={base.h} props={part.props as Record<string, unknown>} />
        </g>
      </svg>
      {ports.map(([name, spot]) => (
        // a lone "connection" port needs no name
        <PortHandle key={name} name={name} text={portLabel(part.type, name)} spot={spot} readOnly={readOnly} labelled={ports.length > 1} />
      ))}
      <Tag part={part} side={tagSide(ports.map(([, p]) => p))} />
      <Badge part={part} />
      <FindingMarker id={id} />
    </div>
  );
});
