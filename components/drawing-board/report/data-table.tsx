"use client";

import { tableFeatures, useTable, type ColumnDef, type RowData } from "@tanstack/react-table";

export const features = tableFeatures({});
export type Columns<Row extends RowData> = ColumnDef<typeof features, Row>[];

/** A plain, scrollable report table (no sorting or paging: schedules are read top to bottom). */
export function DataTable<Row extends RowData>({ columns, data, caption, testId }: { columns: Columns<Row>; data: Row[]; caption: string; testId?: string }) {
  const table = useTable({ features, columns, data });
  return (
    <div className="overflow-x-auto rounded-md border border-ink/10 bg-white">
      <table className="w-full min-w-max border-collapse text-sm" data-testid={testId}>
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-dark text-left text-xs text-ink-soft">
          {table.getHeaderGroups().map((g) => (
            <tr key={g.id}>
              {g.headers.map((h) => (
                <th key={h.id} scope="col" className="px-3 py-2 font-medium whitespace-nowrap">
                  {h.isPlaceholder ? null : <table.FlexRender header={h} />}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-t border-ink/5">
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className="px-3 py-1.5 whitespace-nowrap"><table.FlexRender cell={cell} /></td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
