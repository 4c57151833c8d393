"use client";

import { useMemo } from "react";
import { portRefLabel, type ModeResult, type Results, type Schematic } from "@/lib/schematic";
import { showFlow, showPressure, type UnitPrefs } from "@/lib/units/display";
import type { ViewPipe } from "../overlay/results-view";
import { velocityBand } from "../overlay/velocity-bands";
import { suggestedSizeChanges } from "./apply-suggested-sizes";
import { DataTable, type Columns } from "./data-table";
import { Num } from "./num";
import { pipeDpWorking, pipeFlowWorking, velocityWorking, type Working } from "./working";

type Row = { pipe: Schematic["pipes"][number]; r: ViewPipe | undefined; next: string | null };

/**
 * Every pipe with its size, flow, velocity and pressure drop in the results view shown;
 * numbers open their working in a design mode (onShow), suggested sizes only in a design view.
 */
export function PipeSchedule({ doc, results, pipes, mode, prefs, onShow }: {
  doc: Schematic; results: Results; pipes: ViewPipe[]; mode: ModeResult | null; prefs: UnitPrefs; onShow?: (w: Working) => void;
}) {
  const rho = results.fluid.densityKgM3;
  const columns = useMemo<Columns<Row>>(() => [
    { id: "id", header: "Pipe", cell: ({ row }) => <span className="num">{row.original.pipe.id}</span> },
    { id: "size", header: "Size", cell: ({ row }) => {
      const { pipe, next } = row.original;
      return <span className="num">{pipe.material} {pipe.size}{next && <span className="ml-1 text-warn" title="suggested size">→ {next}</span>}</span>;
    } },
    { id: "length", header: "Length", cell: ({ row }) => <Num text={`${row.original.pipe.lengthM.toFixed(1)} m`} /> },
    { id: "flow", header: `Flow (${showFlow(0, prefs).unit})`, cell: ({ row }) =>
      <Num text={showFlow(row.original.r?.flowM3h, prefs).value}
        working={pipeFlowWorking(doc, results, row.original.pipe.id, mode)} onShow={onShow} /> },
    { id: "v", header: "Velocity (m/s)", cell: ({ row }) => {
      const v = row.original.r?.velocityMps;
      const band = velocityBand(v, doc.design.maxVelocityMps);
      return <Num text={v === null || v === undefined ? "—" : Math.abs(v).toFixed(2)} tone={band === "high" ? "fault" : undefined}
        working={onShow && velocityWorking(doc, results, row.original.pipe.id, mode)} onShow={onShow} />;
    } },
    { id: "dp", header: `Δp (${showPressure(0, prefs).unit})`, cell: ({ row }) =>
      <Num text={showPressure(row.original.r?.pressureDropKpa, prefs, rho).value} working={onShow && pipeDpWorking(doc, results, row.original.pipe.id, mode)} onShow={onShow} /> },
    { id: "grad", header: "Pa/m", cell: ({ row }) => <Num text={row.original.r?.gradientPaPerM?.toFixed(0) ?? "—"} /> },
    { id: "run", header: "From → to", cell: ({ row }) => <span className="text-xs text-ink-soft">{portRefLabel(doc, row.original.pipe.from)} → {portRefLabel(doc, row.original.pipe.to)}</span> },
  ], [doc, results, mode, prefs, rho, onShow]);
  const data = useMemo(() => {
    const next = new Map(mode ? suggestedSizeChanges(doc, results).map((c) => [c.id, c.to]) : []);
    const byId = new Map(pipes.map((p) => [p.id, p]));
    return doc.pipes.map((pipe) => ({ pipe, r: byId.get(pipe.id), next: next.get(pipe.id) ?? null }));
  }, [doc, results, pipes, mode]);
  return <DataTable columns={columns} data={data} caption="Pipe schedule" testId="pipe-schedule" />;
}
