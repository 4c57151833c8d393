"use client";

import { useUnits } from "@/components/units/units-context";
import { showFlow } from "@/lib/units/display";
import { useBoard } from "../store";
import { viewSummary } from "./results-view";

/** The headline numbers of the view shown: heat-source flow against its minimum, heat to emitters, what the bypass passes. */
export function ViewSummary() {
  const results = useBoard((s) => s.results);
  const view = useBoard((s) => s.resultsView);
  const parts = useBoard((s) => s.doc.parts);
  const { prefs } = useUnits();
  const sum = viewSummary(results, { parts }, view);
  if (!sum) return null;
  const flow = (q: number | null) => showFlow(q === null ? null : Math.abs(q), prefs).text;
  return (
    <span className="inline-flex flex-wrap items-center gap-x-3 gap-y-0.5 text-xs text-ink-soft" data-testid="view-summary">
      <span className={sum.belowMinimum ? "font-medium text-fault" : ""}>
        heat source <span className="num">{flow(sum.heatSourceFlowM3h)}</span>
        {sum.heatSourceMinM3h !== null && <> ({sum.belowMinimum ? "below" : "min"} <span className="num">{flow(sum.heatSourceMinM3h)}</span>)</>}
      </span>
      {sum.heatSourceReturnC !== null && <span>return <span className="num">{sum.heatSourceReturnC.toFixed(1)} °C</span></span>}
      {sum.heatToEmittersW !== null && <span>to emitters <span className="num">{(sum.heatToEmittersW / 1000).toFixed(2)} kW</span></span>}
      {sum.bypass && <span>bypass passes <span className="num">{flow(sum.bypass.flowM3h)}</span></span>}
      {sum.converged === false && <span className="text-fault">did not converge</span>}
    </span>
  );
}
