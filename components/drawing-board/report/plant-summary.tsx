"use client";

import type { ReactNode } from "react";
import type { Results, Schematic } from "@/lib/schematic";
import { showFlow, showPressure, type UnitPrefs } from "@/lib/units/display";
import { Num } from "./num";
import { bypassOpeningWorking, minVolumeWorking, prechargeWorking, reheatWorking, shutFlowWorking, systemVolumeWorking, vesselWorking, type Working } from "./working";

const yesNo = (ok: boolean | null, yes: string, no: string) =>
  ok === null ? <span className="text-ink-faint">—</span> : <span className={ok ? "text-ok" : "font-medium text-fault"}>{ok ? yes : no}</span>;

function Card({ title, children, testId }: { title: string; children: ReactNode; testId: string }) {
  return (
    <section className="rounded-md border border-ink/10 bg-white p-3" data-testid={testId}>
      <h4 className="mb-2 font-medium">{title}</h4>
      <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm">{children}</dl>
    </section>
  );
}
const Item = ({ k, children }: { k: string; children: ReactNode }) => (
  <><dt className="text-ink-soft">{k}</dt><dd className="text-right">{children}</dd></>
);
const litres = (n: number | null, working?: Working | null, onShow?: (w: Working) => void) =>
  <Num text={n === null ? "—" : `${n.toFixed(1)} L`} working={working} onShow={onShow} />;

/** Bypass, expansion vessel, system volume and hot water: one card each. */
export function PlantSummary({ doc, results, prefs, onShow }: { doc: Schematic; results: Results; prefs: UnitPrefs; onShow: (w: Working) => void }) {
  const { bypass, expansionVessel: ev, volume, hotWater } = results;
  const rho = results.fluid.densityKgM3;
  return (
    <div className="grid gap-3 sm:grid-cols-2 xl:grid-cols-4">
      <Card title="Bypass" testId="report-bypass">
        {bypass ? <>
          <Item k="Opening setting"><Num text={showPressure(bypass.recommendedOpeningKpa, prefs, rho).text} working={bypassOpeningWorking(doc, results)} onShow={onShow} /></Item>
          <Item k="Heat-source flow, all zones shut"><Num text={showFlow(bypass.heatSourceFlowAllZonesClosedM3h, prefs).text} working={shutFlowWorking(doc, results)} onShow={onShow} /></Item>
          <Item k="Minimum flow met">{yesNo(bypass.minFlowMet, "yes", "no")}</Item>
        </> : <Item k="No bypass valve drawn">—</Item>}
      </Card>
      <Card title="Expansion vessel" testId="report-vessel">
        {ev ? <>
          <Item k="Required"><Num text={ev.requiredVolumeL === null ? "—" : `${ev.requiredVolumeL.toFixed(1)} L`} working={vesselWorking(doc, results)} onShow={onShow} /></Item>
          <Item k="Fitted (as drawn)">{litres(ev.providedVolumeL)}</Item>
          <Item k="Pre-charge to set"><Num text={ev.recommendedPrechargeBar === null ? "—" : `${ev.recommendedPrechargeBar.toFixed(2)} bar`} working={prechargeWorking(doc, results)} onShow={onShow} /></Item>
          <Item k="Big enough">{yesNo(ev.ok, "yes", "no")}</Item>
        </> : <Item k="No expansion vessel drawn">—</Item>}
      </Card>
      <Card title="Volumes" testId="report-volume">
        <Item k="System water">{litres(volume.systemL, systemVolumeWorking(doc, results), onShow)}</Item>
        <Item k="Min. system volume">{volume.minimumL === null ? <span className="text-ink-faint" title="No minimum stated on the heat source">not checked</span> : litres(volume.minimumL, minVolumeWorking(doc, results), onShow)}</Item>
        <Item k="Buffer">{volume.bufferRecommended === null ? "—" : volume.bufferRecommended ? <span className="text-warn">recommended</span> : "not needed"}</Item>
      </Card>
      <Card title="Hot water" testId="report-hot-water">
        {hotWater ? <Item k="Cylinder reheat"><Num text={hotWater.reheatMinutes === null ? "—" : `${hotWater.reheatMinutes.toFixed(0)} min`} working={reheatWorking(doc, results)} onShow={onShow} /></Item>
          : <Item k="No cylinder drawn">—</Item>}
      </Card>
    </div>
  );
}
