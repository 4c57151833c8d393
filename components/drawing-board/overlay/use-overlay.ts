"use client";

import { useMemo } from "react";
import { useUnits } from "@/components/units/units-context";
import { useBoard } from "../store";
import { indexCircuitIds, pipeLabels, type PipeLabel } from "./pipe-labels";

// The canvas reads overlay data through these hooks (see NOTES-board2.md). Labels are
// computed once per results/doc/units change, then each pipe picks its own entry.

export function usePipeLabels(): Map<string, PipeLabel> {
  const results = useBoard((s) => s.results);
  const view = useBoard((s) => s.resultsView);
  const pipes = useBoard((s) => s.doc.pipes);
  const design = useBoard((s) => s.doc.design);
  const { prefs } = useUnits();
  return useMemo(() => pipeLabels(results, { pipes, design }, prefs, view), [results, pipes, design, prefs, view]);
}

export function usePipeOverlay(pipeId: string): PipeLabel | null {
  return usePipeLabels().get(pipeId) ?? null;
}

export function useIndexCircuit(): Set<string> {
  const results = useBoard((s) => s.results);
  const view = useBoard((s) => s.resultsView);
  return useMemo(() => indexCircuitIds(results, view), [results, view]);
}
