"use client";
/**
 * The whole-network size proposal of one board: its options, the last answer
 * of POST /api/v1/optimise and the board revision it was computed for. One
 * small store per board store (kept in a WeakMap), so the toolbar panel and
 * the sizing report show the same proposal without touching the board state.
 */
import { createStore, useStore, type StoreApi } from "zustand";
import type { OptimiseResult } from "@/lib/hydraulics/optimise/optimise";
import { LIFE_COST_ASSUMPTIONS, type LifeCostInputs } from "@/lib/hydraulics/optimise/life-cost";
import type { Prices } from "@/lib/hydraulics/optimise/prices";
import { fetchJson } from "@/lib/fetch-json";
import { useBoardStore, type BoardStore } from "../store";

export interface ProposalOptions {
  objective: "pipe-cost" | "life-cost";
  headMarginKpa: number;
  lifeCost: LifeCostInputs;
  /** pipes the user keeps at their drawn size */
  locked: string[];
  /** the firm's pipe prices from the project's price list (none: the default demo table) */
  prices: Prices;
}

export interface ProposalState {
  options: ProposalOptions;
  status: "idle" | "running" | "done" | "error";
  result: OptimiseResult | null;
  error: string | null;
  /** board revision the result belongs to */
  revision: number;
  setOptions(patch: Partial<ProposalOptions>): void;
  run(): Promise<void>;
}

/** Head margin used unless the user types another, kPa (the optimiser's own default). */
export const UI_HEAD_MARGIN_KPA = 0;

const stores = new WeakMap<BoardStore, StoreApi<ProposalState>>();

function make(board: BoardStore): StoreApi<ProposalState> {
  return createStore<ProposalState>()((set, get) => ({
    options: { objective: "pipe-cost", headMarginKpa: UI_HEAD_MARGIN_KPA, lifeCost: { ...LIFE_COST_ASSUMPTIONS }, locked: [], prices: {} },
    status: "idle",
    result: null,
    error: null,
    revision: -1,
    setOptions: (patch) => set({ options: { ...get().options, ...patch } }),
    async run() {
      const { doc, revision } = board.getState();
      const { locked, prices, ...rest } = get().options;
      const ids = new Set(doc.pipes.map((p) => p.id));
      const options = { ...rest, locked: locked.filter((id) => ids.has(id)), ...(rest.objective === "pipe-cost" ? { lifeCost: undefined } : {}),
        ...(Object.keys(prices).length ? { prices } : {}) };
      set({ status: "running", error: null });
      try {
        const result = await fetchJson<OptimiseResult>("/api/v1/optimise", { method: "POST", body: JSON.stringify({ doc, options }) });
        set({ status: "done", result, revision });
      } catch (e) {
        set({ status: "error", error: (e as Error).message || "Could not reach the server." });
      }
    },
  }));
}

export function useProposal<T>(selector: (s: ProposalState) => T): T {
  const board = useBoardStore();
  let store = stores.get(board);
  if (!store) stores.set(board, (store = make(board)));
  return useStore(store, selector);
}
