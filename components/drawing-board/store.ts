"use client";
/**
 * The drawing board's state: one zustand vanilla store per board (created by
 * `createBoardStore`, provided once with useRef in BoardStoreProvider). Every
 * document change goes through a registered command (commands/index.ts), so
 * undo history, the revision counter and "results are stale" stay in one place.
 */
import { createContext, createElement, useContext, useRef, type ReactNode } from "react";
import { createStore, useStore, type StoreApi } from "zustand";
import type { Results, Schematic, Severity } from "@/lib/schematic";
import { commands, type CommandArgs, type CommandId } from "./commands";
import type { BoardState, DispatchResult } from "./commands/types";
import { autoOrient } from "./parts/orientation";
import { docChanges } from "@/lib/schematic/doc-changes";
import { DEFAULT_VIEW, findingInView, viewsOf } from "./overlay/results-view";

export type { BoardState, Selection, Clipboard } from "./commands/types";

/** Undo keeps this many document snapshots (they share unchanged parts, so they are cheap). */
export const HISTORY_LIMIT = 100;

export interface BoardActions {
  dispatch<K extends CommandId>(id: K, ...args: CommandArgs<K> extends void ? [] : [CommandArgs<K>]): DispatchResult;
  setSelection(parts: string[], pipes: string[]): void;
  /** Results and the document they were computed for (default: the document now). */
  setResults(results: Results | null, forDoc?: Schematic): void;
  setResultsView(view: string): void;
  setTagMode(mode: "label" | "id"): void;
  setHint(hint: string | null): void;
  /** E.g. after "start a new draft" on an issued revision. */
  setReadOnly(readOnly: boolean): void;
  /** Show the Design conditions panel (clears the selection), focused on a field such as "design.safetyValveBar". */
  showDesign(field?: string | null): void;
}
export type BoardStore = StoreApi<BoardState & BoardActions>;

const rank: Record<Severity, number> = { info: 0, warning: 1, error: 2 };

/** Worst finding per referenced id in the results shown, so each node looks its marker up in O(1). */
export function findingsIndex(results: Results | null, view: string = DEFAULT_VIEW): Map<string, Severity> {
  const map = new Map<string, Severity>();
  for (const f of results?.findings ?? []) {
    if (!findingInView(f, view)) continue;
    for (const ref of f.refs) {
      const prev = map.get(ref);
      if (!prev || rank[f.severity] > rank[prev]) map.set(ref, f.severity);
    }
  }
  return map;
}

// order-insensitive: the canvas reports selections in document order, commands in their own
const sameIds = (a: string[], b: string[]) => a.length === b.length && (a.every((x, i) => x === b[i]) || (new Set(a).size === a.length && b.every((x) => a.includes(x))));

export interface StoreOptions {
  readOnly: boolean;
  /** Kept results to show from the start, and the document they were computed for. */
  sizing?: { results: Results; doc: Schematic } | null;
}

export function createBoardStore(initialDoc: Schematic, opts: StoreOptions = { readOnly: false }): BoardStore {
  const kept = opts.sizing ?? null;
  return createStore<BoardState & BoardActions>()((set, get) => ({
    doc: initialDoc,
    selection: { parts: [], pipes: [] },
    past: [],
    future: [],
    revision: 0,
    clipboard: null,
    results: kept?.results ?? null,
    findings: findingsIndex(kept?.results ?? null),
    resultsDoc: kept?.doc ?? null,
    resultsStale: kept ? docChanges(kept.doc, initialDoc).length > 0 : false,
    resultsView: DEFAULT_VIEW,
    tagMode: "label",
    readOnly: opts.readOnly,
    hint: null,
    pasteCount: 0,
    designFocus: null,
    autoOrient: autoOrient(initialDoc),
    dispatch(id, ...rest) {
      const cmd = commands[id];
      const state = get();
      if (state.readOnly && cmd.changesDoc) return { ok: false, reason: "This schematic is read-only." };
      const out = cmd.perform(state, rest[0] as never);
      if (out === null) return { ok: true };
      if ("refused" in out) {
        set({ hint: out.refused });
        return { ok: false, reason: out.refused };
      }
      const patch: Partial<BoardState> = { ...out };
      if (out.doc && out.doc !== state.doc) {
        if (cmd.recordsHistory) {
          patch.past = [...state.past, state.doc].slice(-HISTORY_LIMIT);
          patch.future = [];
        }
        patch.revision = state.revision + 1;
        // stale while a sizing input differs (a move, or an undo back to the sized drawing, is not)
        if (state.results && state.resultsDoc) patch.resultsStale = docChanges(state.resultsDoc, out.doc).length > 0;
        if (out.doc.pipes !== state.doc.pipes) patch.autoOrient = autoOrient(out.doc);
      }
      set(patch);
      return { ok: true };
    },
    setSelection(parts, pipes) {
      const s = get().selection;
      if (sameIds(s.parts, parts) && sameIds(s.pipes, pipes)) return;
      set({ selection: { parts, pipes } });
    },
    setResults(results, forDoc) {
      const doc = get().doc;
      const resultsDoc = results ? forDoc ?? doc : null;
      const view = viewsOf(results).some((v) => v.key === get().resultsView) ? get().resultsView : DEFAULT_VIEW;
      set({ results, resultsDoc, resultsView: view, findings: findingsIndex(results, view),
        resultsStale: resultsDoc ? docChanges(resultsDoc, doc).length > 0 : false });
    },
    setResultsView(resultsView) {
      if (get().resultsView !== resultsView) set({ resultsView, findings: findingsIndex(get().results, resultsView) });
    },
    setTagMode(tagMode) {
      set({ tagMode });
    },
    setHint(hint) {
      if (get().hint !== hint) set({ hint });
    },
    setReadOnly(readOnly) {
      set({ readOnly });
    },
    showDesign(field = null) {
      set({ selection: { parts: [], pipes: [] }, designFocus: { field, n: (get().designFocus?.n ?? 0) + 1 } });
    },
  }));
}

export const BoardContext = createContext<BoardStore | null>(null);

/** Creates the store once for the board's lifetime; a new initialDoc needs a new key. */
export function BoardStoreProvider(props: { initialDoc: Schematic; readOnly: boolean; store?: BoardStore; children: ReactNode }) {
  const ref = useRef<BoardStore | null>(null);
  ref.current ??= props.store ?? createBoardStore(props.initialDoc, { readOnly: props.readOnly });
  return createElement(BoardContext.Provider, { value: ref.current }, props.children);
}

export function useBoardStore(): BoardStore {
  const store = useContext(BoardContext);
  if (!store) throw new Error("useBoard must be used inside <BoardStoreProvider>");
  return store;
}

/** Read a slice of board state; re-renders only when the selected value changes (Object.is). */
export function useBoard<T>(selector: (s: BoardState & BoardActions) => T): T {
  return useStore(useBoardStore(), selector);
}

export const useDispatch = () => useBoard((s) => s.dispatch);
