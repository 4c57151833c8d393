"use client";
/**
 * What the rest of the app (board-2's persistence, results and report) drives
 * the board with, without reaching into xyflow or the store's internals.
 */
import { useMemo } from "react";
import { useReactFlow, type Viewport } from "@xyflow/react";
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

/** The board API for components inside the board (toolbar and report slots). */
export function useBoardApi(): BoardApi {
  const store = useBoardStore();
  const flow = useReactFlow();
  return useMemo(() => {
    const api = makeBoardApi(store, (ids) => ids.length > 0 && void flow.fitView({ nodes: ids.map((id) => ({ id })), padding: 0.6, maxZoom: 1.2, duration: 300 }));
    api.view = {
      fit: () => void flow.fitView({ padding: 0.1 }),
      zoomTo: (zoom) => void flow.zoomTo(zoom),
      panBy: (dx, dy) => {
        const v = flow.getViewport();
        void flow.setViewport({ ...v, x: v.x + dx, y: v.y + dy });
      },
      get: () => flow.getViewport(),
      set: (v) => void flow.setViewport(v),
    };
    return api;
  }, [store, flow]);
}
