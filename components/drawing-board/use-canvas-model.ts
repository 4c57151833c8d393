"use client";
/**
 * Document → xyflow nodes and edges. Each node/edge object is reused while
 * its part/pipe, orientation, selection and overlay are unchanged, so xyflow's
 * memoised wrappers skip everything that did not change (1,000-part boards).
 */
import { useMemo, useRef } from "react";
import type { Part, Pipe } from "@/lib/schematic";
import { useBoard } from "./store";
import { layoutOf } from "./parts";
import { explicitOrientation, IDENTITY, orientedLayout } from "./parts/orientation";
import type { PartNode } from "./nodes/part-node";
import { pipeSides } from "./pipes/flow-side";
import type { PipeEdge } from "./pipes/pipe-edge";
import { usePipeLabels } from "./overlay/use-overlay";
import { splitPortRef } from "@/lib/schematic";

export function usePartNodes(): PartNode[] {
  const parts = useBoard((s) => s.doc.parts);
  const selected = useBoard((s) => s.selection.parts);
  const auto = useBoard((s) => s.autoOrient);
  const readOnly = useBoard((s) => s.readOnly);
  const cache = useRef(new Map<string, PartNode>());
  return useMemo(() => {
    const sel = new Set(selected);
    const next = new Map<string, PartNode>();
    const nodes = parts.map((part: Part) => {
      const orientation = explicitOrientation(part) ?? auto.get(part.id) ?? IDENTITY;
      const isSel = sel.has(part.id);
      const prev = cache.current.get(part.id);
      const reuse = prev && prev.data.part === part && prev.data.orientation === orientation && prev.selected === isSel && prev.data.readOnly === readOnly;
      const node: PartNode = reuse
        ? prev
        : (() => {
            const { w, h } = orientedLayout(layoutOf(part.type, part.props), orientation);
            return { id: part.id, type: "part", position: { x: part.x, y: part.y }, width: w, height: h, selected: isSel, data: { part, orientation, readOnly } };
          })();
      next.set(part.id, node);
      return node;
    });
    cache.current = next;
    return nodes;
  }, [parts, selected, auto, readOnly]);
}

export function usePipeEdges(): PipeEdge[] {
  const doc = useBoard((s) => s.doc);
  const pipes = doc.pipes;
  const selected = useBoard((s) => s.selection.pipes);
  const labels = usePipeLabels();
  // sides depend only on topology: recompute when pipes change, not when parts move
  // eslint-disable-next-line react-hooks/exhaustive-deps
  const sides = useMemo(() => pipeSides(doc), [pipes]);
  const cache = useRef(new Map<string, PipeEdge>());
  return useMemo(() => {
    const sel = new Set(selected);
    const next = new Map<string, PipeEdge>();
    const edges = pipes.map((pipe: Pipe) => {
      const side = sides.get(pipe.id) ?? "none";
      const overlay = labels.get(pipe.id) ?? null;
      const isSel = sel.has(pipe.id);
      const prev = cache.current.get(pipe.id);
      const reuse = prev && prev.data?.pipe === pipe && prev.data.side === side && prev.data.overlay === overlay && prev.selected === isSel;
      const from = splitPortRef(pipe.from);
      const to = splitPortRef(pipe.to);
      const edge: PipeEdge = reuse
        ? prev
        : { id: pipe.id, type: "pipe", source: from.partId, sourceHandle: from.port, target: to.partId, targetHandle: to.port, selected: isSel, data: { pipe, side, overlay } };
      next.set(pipe.id, edge);
      return edge;
    });
    cache.current = next;
    return edges;
  }, [pipes, sides, labels, selected]);
}
