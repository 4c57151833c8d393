"use client";

import { useMemo } from "react";
import type { Results, Schematic } from "@/lib/schematic";
import { DataTable, type Columns } from "./data-table";
import { Num } from "./num";
import { emitterWorking, type Working } from "./working";

type Row = Results["emitters"][number];

/** Each radiator's output at the design (low) flow temperature against the room's heat load. */
export function EmittersTable({ doc, results, onShow }: { doc: Schematic; results: Results; onShow: (w: Working) => void }) {
  const columns = useMemo<Columns<Row>>(() => [
    { id: "id", header: "Emitter", cell: ({ row }) => doc.parts.find((p) => p.id === row.original.id)?.label ?? row.original.id },
    { id: "out", header: "Output at design (W)", cell: ({ row }) =>
      <Num text={row.original.outputAtDesignW?.toFixed(0) ?? "—"} working={emitterWorking(doc, results, row.original.id)} onShow={onShow} /> },
    { id: "load", header: "Heat load (W)", cell: ({ row }) => <Num text={row.original.heatLoadW?.toFixed(0) ?? "—"} /> },
    { id: "ok", header: "Enough?", cell: ({ row }) => row.original.ok === null ? "—" :
      <span className={row.original.ok ? "text-ok" : "font-medium text-fault"}>{row.original.ok ? "yes" : "no"}</span> },
  ], [doc, results, onShow]);
  return <DataTable columns={columns} data={results.emitters} caption="Emitters" testId="emitters-table" />;
}
