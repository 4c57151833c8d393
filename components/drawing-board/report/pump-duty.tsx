"use client";

import type { ModeResult, PumpDuty as Duty, Results, Schematic } from "@/lib/schematic";
import { convertFlow, convertPressure, showFlow, showPressure, unitLabels, type UnitPrefs } from "@/lib/units/display";
import dynamic from "next/dynamic";
import { Num } from "./num";
import { availableHeadWorking, pumpSettingWorking, requiredHeadWorking, type Working } from "./working";
import { curveOf } from "./working-pump";

// The charting library loads only when the report shows a pump, not with the board.
const PumpCurveChart = dynamic(() => import("./pump-curve-chart").then((m) => m.PumpCurveChart), {
  ssr: false,
  loading: () => <div className="h-48 animate-pulse rounded bg-paper-dark" />,
});

/** Pump duty per mode: required head at design flow against what the pump gives there, with its curve. */
export function PumpDuty({ doc, results, modes, prefs, onShow }: { doc: Schematic; results: Results; modes: ModeResult[]; prefs: UnitPrefs; onShow?: (w: Working) => void }) {
  const rho = results.fluid.densityKgM3;
  const duties = modes.flatMap((m) => (m.pumps.length > 0 ? m.pumps : m.pump ? [m.pump] : []).map((d) => ({ mode: m, d })));
  if (duties.length === 0) return <p className="text-sm text-ink-soft">No pump in this schematic.</p>;
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      {duties.map(({ mode, d }) => <DutyCard key={`${mode.mode}-${d.id}`} mode={mode} d={d} doc={doc} results={results} rho={rho} prefs={prefs} onShow={onShow} />)}
    </div>
  );
}

function DutyCard({ mode, d, doc, results, rho, prefs, onShow }: { mode: ModeResult; d: Duty; doc: Schematic; results: Results; rho: number | null; prefs: UnitPrefs; onShow?: (w: Working) => void }) {
  const curve = curveOf(doc, d.id).map(([q, h]) => ({ flow: convertFlow(q, prefs.flow), head: convertPressure(h, prefs.pressure, rho) }));
  const point = d.designFlowM3h !== null && d.requiredHeadKpa !== null
    ? { flow: convertFlow(d.designFlowM3h, prefs.flow), head: convertPressure(d.requiredHeadKpa, prefs.pressure, rho) } : null;
  const name = doc.parts.find((p) => p.id === d.id)?.label ?? d.id;
  return (
    <div className="rounded-md border border-ink/10 bg-white p-3" data-testid="pump-duty">
      <h4 className="font-medium">{name} <span className="text-xs font-normal text-ink-faint">— {mode.mode}</span></h4>
      <dl className="mt-2 grid grid-cols-3 gap-2 text-sm">
        <div><dt className="text-xs text-ink-soft">Design flow</dt><dd className="num">{showFlow(d.designFlowM3h, prefs).text}</dd></div>
        <div><dt className="text-xs text-ink-soft">Head needed</dt>
          <dd><Num text={showPressure(d.requiredHeadKpa, prefs, rho).text} working={requiredHeadWorking(doc, results, mode, d)} onShow={onShow} /></dd></div>
        <div><dt className="text-xs text-ink-soft">Head available</dt>
          <dd><Num text={showPressure(d.availableHeadKpa, prefs, rho).text} tone={d.ok === false ? "fault" : d.ok ? "ok" : undefined}
            working={availableHeadWorking(doc, results, mode, d)} onShow={onShow} /></dd></div>
      </dl>
      {d.surplusKpa !== null && d.surplusKpa > 0 && (
        <p className="mt-2 text-sm" data-testid="pump-setting">
          <span className="text-ink-soft">{showPressure(d.surplusKpa, prefs, rho).text} to spare. Setting: </span>
          <Num text={d.speedFraction !== null ? `${(d.speedFraction * 100).toFixed(0)} % speed` : `${showPressure(d.constantPressureHeadKpa, prefs, rho).text} constant pressure`}
            working={pumpSettingWorking(doc, results, mode, d)} onShow={onShow} />
          {d.speedFraction !== null && <span className="text-ink-soft">, or {showPressure(d.constantPressureHeadKpa, prefs, rho).text} in constant-pressure mode</span>}
        </p>
      )}
      {curve.length > 0 && <PumpCurveChart curve={curve} point={point} flowUnit={unitLabels[prefs.flow]} pressureUnit={unitLabels[prefs.pressure]} />}
    </div>
  );
}
