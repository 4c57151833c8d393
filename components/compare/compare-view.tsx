"use client";
/** Side by side: the two drawings, what changed, and the engine's numbers for each (lib/compare). */
import { useMemo, useState } from "react";
import type { Comparison } from "@/lib/compare/compare";
import { metricRows } from "@/lib/compare/rows";
import type { Schematic } from "@/lib/schematic";
import type { UnitPrefs } from "@/lib/units/display";
import { ChangeList } from "./change-list";
import { CompareCanvases } from "./compare-canvases";
import { MetricsTable } from "./metrics-table";
import { ScenarioTable } from "./scenario-table";

export function CompareView({ comparison, documents, prefs }: { comparison: Comparison; documents: { a: Schematic; b: Schematic }; prefs: UnitPrefs }) {
  const { a, b, changes, scenarios } = comparison;
  const rows = useMemo(() => metricRows(a.metrics, b.metrics), [a.metrics, b.metrics]);
  const [focus, setFocus] = useState<{ id: string; n: number } | null>(null);
  const names = useMemo(() => ({ a: a.name, b: b.name }), [a.name, b.name]);
  return (
    <div className="space-y-6">
      <CompareCanvases names={names} docs={documents} changes={changes} focus={focus} />
      <section aria-labelledby="changes-h">
        <h2 id="changes-h" className="mb-1 text-base font-semibold">What changed from A to B</h2>
        <ChangeList changes={changes} onShow={(id) => setFocus((f) => ({ id, n: (f?.n ?? 0) + 1 }))} />
      </section>
      <section aria-labelledby="numbers-h">
        <h2 id="numbers-h" className="text-base font-semibold">The numbers</h2>
        <p className="mb-2 text-xs text-ink-soft">
          Each side as sizing it alone gives (heating design; the largest velocity over every design mode). “Better” is marked only where it is plain; hover it for why.
        </p>
        <MetricsTable rows={rows} prefs={prefs} densities={{ a: a.metrics.fluidDensityKgM3, b: b.metrics.fluidDensityKgM3 }} />
      </section>
      <section aria-labelledby="scenarios-h">
        <h2 id="scenarios-h" className="mb-2 text-base font-semibold">Scenarios both share</h2>
        <ScenarioTable scenarios={scenarios} prefs={prefs} />
      </section>
      <p className="text-xs text-ink-faint">Results are design aids to be checked by a competent person; follow local codes, manufacturers’ instructions and licensed practice.</p>
    </div>
  );
}
