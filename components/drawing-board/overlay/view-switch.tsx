"use client";

import { useBoard } from "../store";
import { viewsOf } from "./results-view";

/** Which results the drawing, report and findings show: a design mode or a simulated scenario. */
export function ViewSwitch({ id }: { id: string }) {
  const results = useBoard((s) => s.results);
  const view = useBoard((s) => s.resultsView);
  const setView = useBoard((s) => s.setResultsView);
  const views = viewsOf(results);
  if (views.length === 0) return null;
  return (
    <span className="inline-flex items-center gap-1.5">
      <label htmlFor={id} className="text-xs text-ink-soft">Showing</label>
      <select id={id} value={view} onChange={(e) => setView(e.target.value)} data-testid="results-view"
        className="max-w-[16rem] rounded-md border border-ink/15 bg-white px-1.5 py-0.5 text-sm focus:outline-2 focus:outline-copper-500">
        <optgroup label="Design (sized)">
          {views.filter((v) => v.kind === "design").map((v) => <option key={v.key} value={v.key}>{v.label}</option>)}
        </optgroup>
        <optgroup label="Simulated (valves as set, pump on its curve)">
          {views.filter((v) => v.kind === "scenario").map((v) => <option key={v.key} value={v.key}>{v.label}</option>)}
        </optgroup>
      </select>
    </span>
  );
}
