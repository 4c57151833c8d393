"use client";

import { useCallback, useState } from "react";
import { useUnits } from "@/components/units/units-context";
import { emittersInView, pipesInView } from "../overlay/results-view";
import { useBoard } from "../store";
import { ApplySizesButton } from "./apply-sizes-button";
import { CircuitsTable } from "./circuits-table";
import { EmittersTable } from "./emitters-table";
import { PipeSchedule } from "./pipe-schedule";
import { PlantSummary } from "./plant-summary";
import { PumpDuty } from "./pump-duty";
import { SizeProposal } from "../proposal/size-proposal";
import { WorkingDialog } from "./working-dialog";
import type { Working } from "./working";
import { AssumptionsNote } from "./assumptions-note";

/**
 * The sizing report tab: every table for the results kept or last sized, in the mode or
 * scenario chosen on the results bar above it (the drawing's own switch), numbers with
 * working one click away.
 */
export function SizingReport() {
  const results = useBoard((s) => s.results);
  const stale = useBoard((s) => s.resultsStale);
  const view = useBoard((s) => s.resultsView);
  const canSize = useBoard((s) => !s.readOnly);
  const doc = useBoard((s) => s.doc);
  const { prefs } = useUnits();
  const [working, setWorking] = useState<Working | null>(null);
  const onShow = useCallback((w: Working) => setWorking(w), []);
  if (!results || results.modes.length === 0) {
    return (
      <p className="p-6 text-sm text-ink-soft" data-testid="sizing-report">
        {canSize ? <>Press <span className="font-medium text-ink">Size it</span> to fill in the report.</> : "No sizing is kept for this drawing yet."}
      </p>
    );
  }
  const mode = results.modes.find((m) => m.mode === view) ?? null;
  // "show working" explains the numbers of a design mode (report/working*.ts); a scenario's are simulated
  const showWorking = mode ? onShow : undefined;
  const emitters = emittersInView(results, view);
  return (
    <div className="space-y-6 p-4" data-testid="sizing-report" data-view={view}>
      {stale && <p role="status" className="rounded bg-warn/10 px-3 py-2 text-sm text-warn">The drawing changed since this report was computed — size it again.</p>}
      <AssumptionsNote results={results} />
      <Section title="Pipe schedule" aside={mode ? <ApplySizesButton /> : null}>
        <PipeSchedule doc={doc} results={results} pipes={pipesInView(results, view)} mode={mode} prefs={prefs} onShow={showWorking} />
      </Section>
      {mode && <Section title="Circuits"><CircuitsTable doc={doc} results={results} mode={mode} prefs={prefs} onShow={showWorking} /></Section>}
      {mode && <Section title="Cheapest sizes for the whole network"><div className="max-w-xl"><SizeProposal /></div></Section>}
      <Section title="Pump duty"><PumpDuty doc={doc} results={results} modes={results.modes} prefs={prefs} onShow={onShow} /></Section>
      <Section title="Bypass, vessel, volumes and hot water"><PlantSummary doc={doc} results={results} prefs={prefs} onShow={onShow} /></Section>
      <Section title="Emitters">
        {emitters.length > 0 ? <EmittersTable doc={doc} results={results} rows={emitters} prefs={prefs} onShow={view === "heating" ? onShow : undefined} />
          : <p className="text-sm text-ink-soft">No emitters are served in this mode.</p>}
      </Section>
      <p className="border-t border-ink/10 pt-3 text-xs text-ink-faint">
        These results are design aids to be checked by a competent person. Follow local codes, manufacturers&apos; instructions and
        licensed practice; mind stored hot water and legionella control, pressure testing, and isolation before work. Engine {results.engine}.
      </p>
      <WorkingDialog working={working} onClose={() => setWorking(null)} />
    </div>
  );
}

function Section({ title, aside, children }: { title: string; aside?: React.ReactNode; children: React.ReactNode }) {
  return (
    <section>
      <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-base font-semibold">{title}</h3>
        {aside}
      </div>
      {children}
    </section>
  );
}
