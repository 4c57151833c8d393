"use client";
/**
 * The drawing board: top bar, parts bin (left), canvas (centre), details
 * (right). Uses the BoardStoreProvider it finds above it (board-2's session
 * owns the store for autosave/reload), else the `store` prop, else makes one
 * from `initialDoc`. On a phone the bin and details become toggled drawers.
 */
import { useContext, useEffect, useState, type ReactNode } from "react";
import { ReactFlowProvider } from "@xyflow/react";
import type { Schematic } from "@/lib/schematic";
import { useBoardApi, type BoardApi } from "./board-api";
import { BoardTopBar } from "./board-top-bar";
import { Canvas } from "./canvas";
import { DetailsPanel } from "./details/details-panel";
import { PartsBin } from "./parts-bin";
import { BoardContext, BoardStoreProvider, useBoard, type BoardStore } from "./store";

export interface DrawingBoardProps {
  initialDoc?: Schematic;
  readOnly?: boolean;
  store?: BoardStore;
  /** Right side of the top bar: revision status, Size it (board-2). */
  toolbarSlot?: ReactNode;
  /** The sizing report; adds a Drawing / Sizing report switch. */
  reportSlot?: ReactNode;
  /** Over the canvas, small: the velocity legend. */
  canvasSlot?: ReactNode;
  /** A strip between the top bar and the canvas: what is open, which results are shown. */
  barSlot?: ReactNode;
  /** Docked in the right-hand column above the details: the findings panel. */
  dockSlot?: ReactNode;
  onChange?: (doc: Schematic, revision: number) => void;
  onReady?: (api: BoardApi) => void;
  /** Height of the whole board; default fills the window under the 3.5 rem app header. */
  height?: string;
}

export function DrawingBoard(props: DrawingBoardProps) {
  const outer = useContext(BoardContext);
  if (props.store) return <BoardStoreProvider initialDoc={props.store.getState().doc} readOnly={false} store={props.store}><Shell {...props} /></BoardStoreProvider>;
  if (outer) return <Shell {...props} />;
  if (!props.initialDoc) throw new Error("DrawingBoard needs initialDoc, a store, or a BoardStoreProvider above it");
  return (
    <BoardStoreProvider initialDoc={props.initialDoc} readOnly={props.readOnly ?? false}>
      <Shell {...props} />
    </BoardStoreProvider>
  );
}

function ApiBridge({ onChange, onReady }: Pick<DrawingBoardProps, "onChange" | "onReady">) {
  const api = useBoardApi();
  useEffect(() => onReady?.(api), [api, onReady]);
  useEffect(() => (onChange ? api.onDocChange(onChange) : undefined), [api, onChange]);
  return null;
}

const drawer = (open: boolean, side: "left" | "right") =>
  `${open ? "absolute inset-y-0 z-20 flex w-72 shadow-xl" : "hidden"} ${side === "left" ? "left-0 border-r" : "right-0 border-l"} flex-col border-ink/10 bg-paper md:static md:flex md:shadow-none`;

function Shell(props: DrawingBoardProps) {
  // the drawing first: a board that cannot be edited needs no parts bin
  const readOnly = useBoard((s) => s.readOnly);
  const [help, setHelp] = useState(false);
  const [bin, setBin] = useState(false);
  const [details, setDetails] = useState(false);
  const [tab, setTab] = useState<"drawing" | "report">("drawing");
  const designFocus = useBoard((s) => s.designFocus);
  // Asked for the Design conditions (top bar, a finding's link): show the drawing and, on a phone, open the details drawer.
  useEffect(() => {
    if (!designFocus) return;
    setTab("drawing");
    setDetails(true);
  }, [designFocus]);
  return (
    <ReactFlowProvider>
      <ApiBridge onChange={props.onChange} onReady={props.onReady} />
      <div className="flex flex-col" style={{ height: props.height ?? "calc(100dvh - 3.5rem - 1px)" }} data-testid="drawing-board">
        <BoardTopBar toolbarSlot={props.toolbarSlot} onHelp={() => setHelp((h) => !h)} onToggleBin={() => setBin((b) => !b)}
          onToggleDetails={() => setDetails((d) => !d)} tab={tab} onTab={props.reportSlot ? setTab : undefined} />
        {props.barSlot}
        <div className={`relative min-h-0 flex-1 ${tab === "drawing" ? "flex" : "hidden"}`}>
          {!readOnly && (
            <aside className={`${drawer(bin, "left")} md:w-56 md:shrink-0`} aria-label="Parts bin">
              <PartsBin />
            </aside>
          )}
          <main className="relative min-w-0 flex-1">
            <Canvas helpOpen={help} setHelpOpen={setHelp} />
            {props.canvasSlot}
          </main>
          <aside className={`${drawer(details, "right")} md:w-72 md:shrink-0`} aria-label="Details">
            {props.dockSlot}
            <div className="min-h-0 flex-1"><DetailsPanel /></div>
          </aside>
        </div>
        {tab === "report" && <div className="min-h-0 flex-1 overflow-auto">{props.reportSlot}</div>}
      </div>
    </ReactFlowProvider>
  );
}
