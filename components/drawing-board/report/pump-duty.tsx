"use client";

import type { ModeResult, PumpDuty as Duty, Results, Schematic } from "@/lib/schematic";
import { convertFlow, convertPressure, showFlow, showPressure, unitLabels, type UnitPrefs } from "@/lib/units/display";
import dynamic from "next/dynamic";

// The charting library loads only when the report shows a pump, not with the board.
const PumpCurveChart = dynamic(() => import("./pump-curve-chart").then((m) => m.PumpCurveChart), {
  ssr: false,
  loading: () => <div className="h-48 animate-pulse rounded bg-paper-dark" />,
});

/** The curve a pump part or a heat source's built-in pump carries in the document. */
function curveOf(doc: Schematic, id: string): [number, number][] {
  const part = doc.parts.find((p) => p.id === id);
  if (part?.type === "pump") return part.props.curve ?? [];
  if (part?.type === "heat-pump" || part?.type === "boiler") return part.props.pumpCurve ?? [];
  return [];
}

/** Pump duty per mode: required head at design flow against what the pump gives there, with its curve. */
export function PumpDuty({ doc, results, modes, prefs }: { doc: Schematic; results: Results; modes: ModeResult[]; prefs: UnitPrefs }) {
  const rho = results.fluid.densityKgM3;
  const duties = modes.flatMap((m) => (m.pumps.length > 0 ? m.pumps : m.pump ? [m.pump] : []).map((d) => ({ mode: m.mode, d })));
  if (duties.length === 0) return <p className="text-sm text-ink-soft">No pump in this schematic.</p>;
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      {duties.map(({ mode, d }) => <DutyCard key={`${mode}-${d.id}`} mode={mode} d={d} doc={doc} rho={rho} prefs={prefs} />)}
    </div>
  );
}

function DutyCard({ mode, d, doc, rho, prefs }: { mode: string; d: Duty; doc: Schematic; rho: number | null; prefs: UnitPrefs }) {
  const curve = curveOf(doc, d.id).map(([q, h]) => ({ flow: convertFlow(q, prefs.flow), head: convertPressure(h, prefs.pressure, rho) }));
  const point = d.designFlowM3h !== null && d.requiredHeadKpa !== null
    ? { flow: convertFlow(d.designFlowM3h, prefs.flow), head: convertPressure(d.requiredHeadKpa, prefs.pressure, rho) } : null;
  const name = doc.parts.find((p) => p.id === d.id)?.label ?? d.id;
  return (
    <div className="rounded-md border border-ink/10 bg-white p-3" data-testid="pump-duty">
      <h4 className="font-medium">{name} <span className="text-xs font-normal text-ink-faint">— {mode}</span></h4>
      <dl className="mt-2 grid grid-cols-3 gap-2 text-sm">
        <div><dt className="text-xs text-ink-soft">Design flow</dt><dd className="num">{showFlow(d.designFlowM3h, prefs).text}</dd></div>
        <div><dt className="text-xs text-ink-soft">Head needed</dt><dd className="num">{showPressure(d.requiredHeadKpa, prefs, rho).text}</dd></div>
        <div><dt className="text-xs text-ink-soft">Head available</dt>
          <dd className={`num ${d.ok === false ? "text-fault" : d.ok ? "text-ok" : ""}`}>{showPressure(d.availableHeadKpa, prefs, rho).text}</dd></div>
      </dl>
      {curve.length > 0 && <PumpCurveChart curve={curve} point={point} flowUnit={unitLabels[prefs.flow]} pressureUnit={unitLabels[prefs.pressure]} />}
    </div>
  );
}
