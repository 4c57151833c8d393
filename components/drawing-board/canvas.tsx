"use client";
/**
 * The drawing canvas: parts as xyflow nodes, pipes as edges, both derived
 * from the store's document. Positions live in local state only while a drag
 * runs; the drop commits one move-parts command (one undo step).
 */
import "@xyflow/react/dist/style.css";
import "./board.css";
import { useCallback, useEffect, useMemo, useRef, useState, type DragEvent } from "react";
import {
  applyNodeChanges, Background, BackgroundVariant, ConnectionMode, ControlButton, Controls, MiniMap, ReactFlow, useReactFlow, useStore,
  type Connection, type Edge, type IsValidConnection, type OnEdgesChange, type OnNodesChange,
} from "@xyflow/react";
import { partTypes, type PartType } from "@/lib/schematic";
import { connectionProblem, inlinePorts } from "./commands";
import { PartNodeView, type PartNode } from "./nodes/part-node";
import { PipeEdgeView, type PipeEdge } from "./pipes/pipe-edge";
import { CanvasHint } from "./canvas-hint";
import { HelpOverlay } from "./help-overlay";
import { useBoard, useBoardStore } from "./store";
import { useBoardKeys } from "./use-board-keys";
import { useFarView } from "./level-of-detail";
import { usePartNodes, usePipeEdges } from "./use-canvas-model";
import { boxOf, OverviewLayer } from "./overview-layer";

// module scope: a new object per render would make xyflow remount every node
const nodeTypes = { part: PartNodeView };
const edgeTypes = { pipe: PipeEdgeView };
export const GRID = 20;
const LARGE_BOARD = 300;
export const PART_MIME = "application/x-loopwright-part";

/** Apply xyflow's select/deselect changes to a list of selected ids. */
function toggled(ids: string[], changes: { id: string; selected?: boolean }[]): string[] {
  const set = new Set(ids);
  for (const c of changes) (c.selected ? set.add(c.id) : set.delete(c.id));
  return [...set];
}

const refOf = (node: string, handle: string | null | undefined) => `${node}.${handle ?? ""}`;

/** The pipe drawn under a screen point, if any (its edge's wide interaction stroke counts). */
function pipeUnder(x: number, y: number): string | null {
  for (const el of document.elementsFromPoint(x, y)) {
    const edge = el.closest(".react-flow__edge");
    if (edge) return edge.getAttribute("data-id");
  }
  return null;
}

export function Canvas({ helpOpen, setHelpOpen }: { helpOpen: boolean; setHelpOpen: (open: boolean) => void }) {
  const store = useBoardStore();
  const readOnly = useBoard((s) => s.readOnly);
  const tagMode = useBoard((s) => s.tagMode);
  // the minimap sits top right, away from the parts bin's drops, and can be put away
  const [showMap, setShowMap] = useState(true);
  const derived = usePartNodes();
  const edges = usePipeEdges();
  const [nodes, setNodes] = useState<PartNode[]>(derived);
  useEffect(() => setNodes(derived), [derived]);
  // fit a drawing on open; an empty board starts at 100 % so dropped parts keep their size
  const [fitOnOpen] = useState(() => derived.length > 0);
  const flow = useReactFlow();
  // Large boards (software-rendered in CI): no dot grid, and the minimap is hidden while the
  // view moves — its repaint each frame made the compositor re-layer the whole canvas.
  const large = useBoard((s) => s.doc.parts.length > LARGE_BOARD);
  const [moving, setMoving] = useState(false);
  // programmatic moves start and end within a frame: settle before showing the minimap again
  const settle = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const onMoveStart = useCallback(() => {
    clearTimeout(settle.current);
    setMoving(true);
  }, []);
  const onMoveEnd = useCallback(() => {
    clearTimeout(settle.current);
    settle.current = setTimeout(() => setMoving(false), 150);
  }, []);
  // small print goes first when zoomed out: port names below 70 %, short-pipe labels until 140 %
  const band = useStore((s) => (s.transform[2] < 0.7 ? "lw-mid" : s.transform[2] >= 1.4 ? "lw-near" : ""));
  const far = useFarView();
  // Far out the drawing is a picture (overview-layer.tsx): parts and pipes are hidden from
  // xyflow, so none of their 2,200 components re-check the store on each frame of a move.
  const shownNodes = useMemo(() => (far ? nodes.map((n) => ({ ...n, hidden: true })) : nodes), [far, nodes]);
  const shownEdges = useMemo(() => (far ? edges.map((e) => ({ ...e, hidden: true })) : edges), [far, edges]);

  // Selection has one owner, the store: xyflow's select changes go there and come back as
  // node/edge flags. (Applying them locally as well made the two ping-pong.)
  const onNodesChange: OnNodesChange<PartNode> = useCallback(
    (changes) => {
      const select = changes.filter((c) => c.type === "select");
      if (select.length > 0) {
        const { selection, setSelection } = store.getState();
        setSelection(toggled(selection.parts, select), selection.pipes);
      }
      const rest = changes.filter((c) => c.type !== "select");
      if (rest.length > 0) setNodes((ns) => applyNodeChanges(rest, ns));
    },
    [store],
  );
  const onEdgesChange: OnEdgesChange<PipeEdge> = useCallback(
    (changes) => {
      const select = changes.filter((c) => c.type === "select");
      if (select.length === 0) return;
      const { selection, setSelection } = store.getState();
      setSelection(selection.parts, toggled(selection.pipes, select));
    },
    [store],
  );
  const onNodeDragStop = useCallback(
    (_: unknown, _node: PartNode, dragged: PartNode[]) =>
      store.getState().dispatch("move-parts", { moves: dragged.map((n) => ({ id: n.id, x: n.position.x, y: n.position.y })) }),
    [store],
  );
  const isValidConnection: IsValidConnection = useCallback(
    (c: Connection | Edge) => {
      const problem = connectionProblem(store.getState().doc, refOf(c.source, c.sourceHandle), refOf(c.target, c.targetHandle));
      if (problem) store.getState().setHint(problem);
      return problem === null;
    },
    [store],
  );
  const onConnect = useCallback(
    (c: Connection) => store.getState().dispatch("connect-pipe", { from: refOf(c.source, c.sourceHandle), to: refOf(c.target, c.targetHandle) }),
    [store],
  );
  const onDragOver = useCallback((e: DragEvent) => {
    if (e.dataTransfer.types.includes(PART_MIME)) {
      e.preventDefault();
      e.dataTransfer.dropEffect = "copy";
    }
  }, []);
  const onDrop = useCallback(
    (e: DragEvent) => {
      const type = e.dataTransfer.getData(PART_MIME) as PartType;
      if (!partTypes.includes(type)) return;
      e.preventDefault();
      const p = flow.screenToFlowPosition({ x: e.clientX, y: e.clientY });
      const at = { type, x: Math.round(p.x / GRID) * GRID, y: Math.round(p.y / GRID) * GRID };
      // a tee or a valve dropped on a pipe goes into it: the pipe splits in two through the part
      const pipeId = inlinePorts(type) ? pipeUnder(e.clientX, e.clientY) : null;
      if (pipeId) store.getState().dispatch("insert-on-pipe", { ...at, pipeId });
      else store.getState().dispatch("add-part", at);
    },
    [flow, store],
  );
  const onView = useCallback(
    (a: "help" | "clear-selection" | "fit-view") => {
      if (a === "help") setHelpOpen(!helpOpen);
      if (a === "clear-selection") {
        setHelpOpen(false);
        store.getState().setSelection([], []);
      }
    },
    [helpOpen, setHelpOpen, store],
  );
  useBoardKeys(onView);
  // Far out the parts are a picture (overview-layer.tsx): a click on one selects it.
  const onPaneClick = useCallback(
    (e: React.MouseEvent) => {
      const p = flow.screenToFlowPosition({ x: e.clientX, y: e.clientY });
      const hit = nodes.findLast((n) => {
        const b = boxOf(n);
        return p.x >= b.x && p.x <= b.x + b.w && p.y >= b.y && p.y <= b.y + b.h;
      });
      if (hit) store.getState().setSelection([hit.id], []);
    },
    [flow, nodes, store],
  );

  return (
    <div className={`lw-canvas relative h-full w-full ${band} ${large && moving ? "lw-moving" : ""}`} data-testid="board-canvas">
      <ReactFlow<PartNode, PipeEdge>
        nodes={shownNodes}
        edges={shownEdges}
        nodeTypes={nodeTypes}
        edgeTypes={edgeTypes}
        onNodesChange={onNodesChange}
        onNodeDragStop={onNodeDragStop}
        onEdgesChange={onEdgesChange}
        onConnect={onConnect}
        isValidConnection={isValidConnection}
        onDragOver={onDragOver}
        onMoveStart={large ? onMoveStart : undefined}
        onMoveEnd={large ? onMoveEnd : undefined}
        onDrop={onDrop}
        onPaneClick={far ? onPaneClick : undefined}
        connectionMode={ConnectionMode.Loose}
        nodeOrigin={[0.5, 0.5]}
        snapToGrid
        snapGrid={[GRID, GRID]}
        // only what is on screen is mounted (far out nothing is: the overview canvas draws it)
        onlyRenderVisibleElements
        fitView={fitOnOpen}
        fitViewOptions={{ padding: 0.1, maxZoom: 1.5 }}
        defaultViewport={{ x: 40, y: 40, zoom: 1 }}
        minZoom={0.05}
        maxZoom={3}
        deleteKeyCode={null}
        multiSelectionKeyCode={["Shift", "Meta", "Control"]}
        nodesDraggable={!readOnly}
        nodesConnectable={!readOnly}
        elevateEdgesOnSelect
        connectionLineStyle={{ stroke: "#b4632b", strokeWidth: 2 }}
      >
        {!large && <Background variant={BackgroundVariant.Dots} gap={GRID} size={1} color="#d9d1c4" />}
        {!far && showMap && <MiniMap position="top-right" pannable zoomable nodeColor="#cdbfae" nodeStrokeColor="#8a8378" maskColor="rgba(241,236,227,0.7)" className="!bg-white" />}
        <Controls showInteractive={false}>
          <ControlButton onClick={() => setShowMap((m) => !m)} title={showMap ? "Hide the minimap" : "Show the minimap"}
            aria-label={showMap ? "Hide the minimap" : "Show the minimap"} aria-pressed={showMap} data-testid="toggle-minimap">
            <span className="text-[10px] font-semibold">map</span>
          </ControlButton>
          <ControlButton onClick={() => store.getState().setTagMode(tagMode === "label" ? "id" : "label")}
            title={tagMode === "label" ? "Show part ids on the drawing" : "Show part labels on the drawing"}
            aria-label={tagMode === "label" ? "Show part ids" : "Show part labels"} data-testid="toggle-tags">
            <span className="text-[10px] font-semibold">{tagMode === "label" ? "id" : "Aa"}</span>
          </ControlButton>
        </Controls>
        {far && <OverviewLayer nodes={nodes} edges={edges} />}
      </ReactFlow>
      <CanvasHint />
      {helpOpen && <HelpOverlay onClose={() => setHelpOpen(false)} />}
    </div>
  );
}
