"use client";

import { useCallback, useState } from "react";
import { useUnits } from "@/components/units/units-context";
import { modeOf } from "../overlay/results-mode";
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

/** The sizing report tab: every table from the last "Size it", numbers with working one click away. */
export function SizingReport() {
  const results = useBoard((s) => s.results);
  const stale = useBoard((s) => s.resultsStale);
  const doc = useBoard((s) => s.doc);
  const { prefs } = useUnits();
  const [working, setWorking] = useState<Working | null>(null);
  const onShow = useCallback((w: Working) => setWorking(w), []);
  const heating = modeOf(results);

  if (!results || !heating) {
    return <p className="p-6 text-sm text-ink-soft" data-testid="sizing-report">Press <span className="font-medium text-ink">Size it</span> to fill in the report.</p>;
  }
  return (
    <div className="space-y-6 p-4" data-testid="sizing-report">
      {stale && <p role="status" className="rounded bg-warn/10 px-3 py-2 text-sm text-warn">The drawing changed since this report was computed — size it again.</p>}
      <Section title="Pipe schedule" aside={<ApplySizesButton />}>
        <PipeSchedule doc={doc} results={results} mode={heating} prefs={prefs} onShow={onShow} />
      </Section>
      <Section title="Circuits"><CircuitsTable doc={doc} results={results} mode={heating} prefs={prefs} onShow={onShow} /></Section>
      <Section title="Cheapest sizes for the whole network"><div className="max-w-xl"><SizeProposal /></div></Section>
      <Section title="Pump duty"><PumpDuty doc={doc} results={results} modes={results.modes} prefs={prefs} /></Section>
      <Section title="Bypass, vessel, volumes and hot water"><PlantSummary doc={doc} results={results} prefs={prefs} onShow={onShow} /></Section>
      <Section title="Emitters"><EmittersTable doc={doc} results={results} onShow={onShow} /></Section>
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
