"use client";

import { useMemo } from "react";
import type { ModeResult, Results, Schematic } from "@/lib/schematic";
import { showFlow, showPressure, type UnitPrefs } from "@/lib/units/display";
import { DataTable, type Columns } from "./data-table";
import { Num } from "./num";
import { balancingKvWorking, circuitDpWorking, designFlowWorking, excessWorking, type Working } from "./working";

type Row = ModeResult["circuits"][number] & { flowM3h: number | null };

/** Each load's circuit: its pressure drop, the index circuit, and the Kv its balancing valve needs. */
export function CircuitsTable({ doc, results, mode, prefs, onShow }: { doc: Schematic; results: Results; mode: ModeResult; prefs: UnitPrefs; onShow?: (w: Working) => void }) {
  const rho = results.fluid.densityKgM3;
  const label = (id: string) => doc.parts.find((p) => p.id === id)?.label ?? id;
  const columns = useMemo<Columns<Row>>(() => [
    { id: "load", header: "Load", cell: ({ row }) => <span>{label(row.original.load)}{row.original.index && <span className="ml-2 rounded bg-copper-100 px-1.5 text-xs text-copper-700">index</span>}</span> },
    { id: "flow", header: `Design flow (${showFlow(0, prefs).unit})`, cell: ({ row }) =>
      <Num text={showFlow(row.original.flowM3h, prefs).value} working={onShow && designFlowWorking(doc, results, row.original.load, mode)} onShow={onShow} /> },
    { id: "dp", header: `Circuit Δp (${showPressure(0, prefs).unit})`, cell: ({ row }) =>
      <Num text={showPressure(row.original.pressureDropKpa, prefs, rho).value} working={onShow && circuitDpWorking(doc, results, row.original.load, mode)} onShow={onShow} /> },
    { id: "excess", header: `Δp to absorb (${showPressure(0, prefs).unit})`, cell: ({ row }) =>
      <Num text={showPressure(row.original.excessKpa, prefs, rho).value} working={onShow && excessWorking(doc, results, row.original.load, mode)} onShow={onShow} /> },
    { id: "kv", header: "Balancing Kv", cell: ({ row }) =>
      <Num text={row.original.balancingKv === null ? "—" : row.original.balancingKv.toFixed(2)} working={onShow && balancingKvWorking(doc, results, row.original.load, mode)} onShow={onShow} /> },
    // eslint-disable-next-line react-hooks/exhaustive-deps
  ], [doc, results, mode, prefs, rho, onShow]);
  const data = useMemo(() => mode.circuits.map((c) => ({ ...c, flowM3h: mode.parts.find((p) => p.id === c.load)?.flowM3h ?? null })), [mode]);
  return <DataTable columns={columns} data={data} caption="Circuits" testId="circuits-table" />;
}
