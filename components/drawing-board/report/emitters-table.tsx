"use client";

import { useMemo } from "react";
import type { Results, Schematic } from "@/lib/schematic";
import { showFlow, type UnitPrefs } from "@/lib/units/display";
import type { ViewEmitter } from "../overlay/results-view";
import { DataTable, type Columns } from "./data-table";
import { Num } from "./num";
import { emitterWorking, type Working } from "./working";

/**
 * Each emitter in the view shown: at design, its output at the design (low) flow temperature
 * against the room's heat load; in a simulated scenario, the flow it gets, what it gives and
 * the temperature it returns at.
 */
export function EmittersTable({ doc, results, rows, prefs, onShow }: {
  doc: Schematic; results: Results; rows: ViewEmitter[]; prefs: UnitPrefs; onShow?: (w: Working) => void;
}) {
  const simulated = rows.some((r) => r.returnTemperatureC !== null);
  const columns = useMemo<Columns<ViewEmitter>>(() => [
    { id: "id", header: "Emitter", cell: ({ row }) => doc.parts.find((p) => p.id === row.original.id)?.label ?? row.original.id },
    { id: "flow", header: `Flow (${showFlow(0, prefs).unit})`, cell: ({ row }) => <Num text={showFlow(row.original.flowM3h, prefs).value} /> },
    { id: "out", header: simulated ? "Output (W)" : "Output at design (W)", cell: ({ row }) =>
      <Num text={row.original.outputW?.toFixed(0) ?? "—"} working={onShow ? emitterWorking(doc, results, row.original.id) : null} onShow={onShow} /> },
    { id: "load", header: "Heat load (W)", cell: ({ row }) => <Num text={row.original.heatLoadW?.toFixed(0) ?? "—"} /> },
    simulated
      ? { id: "ret", header: "Return (°C)", cell: ({ row }) => <Num text={row.original.returnTemperatureC?.toFixed(1) ?? "—"} /> }
      : { id: "ok", header: "Enough?", cell: ({ row }) => row.original.ok === null ? "—" :
        <span className={row.original.ok ? "text-ok" : "font-medium text-fault"}>{row.original.ok ? "yes" : "no"}</span> },
  ], [doc, results, prefs, onShow, simulated]);
  return <DataTable columns={columns} data={rows} caption="Emitters" testId="emitters-table" />;
}
