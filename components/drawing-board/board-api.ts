"use client";
/**
 * What the rest of the app (board-2's persistence, results and report) drives
 * the board with, without reaching into xyflow or the store's internals.
 */
import { useMemo } from "react";
import { useReactFlow, useStoreApi, type Viewport } from "@xyflow/react";
import { layoutOf } from "./parts";
import { splitPortRef, type Results, type Schematic } from "@/lib/schematic";
import type { DispatchResult } from "./commands/types";
import { useBoardStore, type BoardStore } from "./store";

export interface BoardApi {
  store: BoardStore;
  getDoc(): Schematic;
  /** Results of Size it; part markers and pipe overlay follow, resultsStale resets. */
  setResults(results: Results | null): void;
  /** Replace the document as one undoable step (validated). */
  applyDoc(doc: Schematic): DispatchResult;
  /** Select the parts and pipes a finding names, and bring them into view. */
  selectRefs(ids: string[]): void;
  /** Called after every document change (command, undo, redo); returns unsubscribe. */
  onDocChange(cb: (doc: Schematic, revision: number) => void): () => void;
  /** View control (fit / zoom), e.g. for a "show on drawing" link or tests. */
  view?: { fit(): void; zoomTo(zoom: number): void; panBy(dx: number, dy: number): void; get(): Viewport; set(v: Viewport): void };
}

export function makeBoardApi(store: BoardStore, focus?: (partIds: string[]) => void): BoardApi {
  return {
    store,
    getDoc: () => store.getState().doc,
    setResults: (r) => store.getState().setResults(r),
    applyDoc: (doc) => store.getState().dispatch("apply-doc", { doc }),
    selectRefs(ids) {
      const { doc, setSelection } = store.getState();
      const partIds = new Set(doc.parts.map((p) => p.id));
      const pipes = doc.pipes.filter((p) => ids.includes(p.id));
      const parts = ids.filter((id) => partIds.has(id));
      setSelection(parts, pipes.map((p) => p.id));
      const ends = pipes.flatMap((p) => [splitPortRef(p.from).partId, splitPortRef(p.to).partId]);
      focus?.([...new Set([...parts, ...ends])]);
    },
    onDocChange: (cb) => store.subscribe((s, prev) => s.doc !== prev.doc && cb(s.doc, s.revision)),
  };
}

/**
 * Centre and zoom on some parts from their drawn positions. (xyflow's fitView waits for
 * every node to be measured, which never happens for parts culled off-screen.)
 */
function focusOn(doc: Schematic, ids: string[], pane: { width: number; height: number }) {
  const wanted = new Set(ids);
  const boxes = doc.parts.filter((p) => wanted.has(p.id)).map((p) => ({ p, l: layoutOf(p.type, p.props) }));
  if (boxes.length === 0 || pane.width === 0) return null;
  const x0 = Math.min(...boxes.map(({ p, l }) => p.x - l.w / 2));
  const x1 = Math.max(...boxes.map(({ p, l }) => p.x + l.w / 2));
  const y0 = Math.min(...boxes.map(({ p, l }) => p.y - l.h / 2));
  const y1 = Math.max(...boxes.map(({ p, l }) => p.y + l.h / 2));
  const zoom = Math.min(1.2, pane.width / ((x1 - x0) * 1.3 + 200), pane.height / ((y1 - y0) * 1.3 + 200));
  return { x: (x0 + x1) / 2, y: (y0 + y1) / 2, zoom };
}

/** The board API for components inside the board (toolbar and report slots). */
export function useBoardApi(): BoardApi {
  const store = useBoardStore();
  const flow = useReactFlow();
  const flowStore = useStoreApi();
  return useMemo(() => {
    const api = makeBoardApi(store, (ids) => {
      const at = focusOn(store.getState().doc, ids, flowStore.getState());
      if (at) void flow.setCenter(at.x, at.y, { zoom: at.zoom, duration: 300 });
    });
    api.view = {
      fit: () => void flow.fitView({ padding: 0.1, includeHiddenNodes: true }),
      zoomTo: (zoom) => void flow.zoomTo(zoom),
      panBy: (dx, dy) => {
        const v = flow.getViewport();
        void flow.setViewport({ ...v, x: v.x + dx, y: v.y + dy });
      },
      get: () => flow.getViewport(),
      set: (v) => void flow.setViewport(v),
    };
    return api;
  }, [store, flow, flowStore]);
}
