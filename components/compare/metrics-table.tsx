/**
 * The engine's numbers for both sides, their difference (B − A), and the better side
 * marked where it is plain, its reason as the tooltip. A table on a laptop; on a phone each
 * row is the metric's name over its three values, so nothing scrolls sideways.
 */
import type { MetricRow, Side } from "@/lib/compare/rows";
import type { UnitPrefs } from "@/lib/units/display";
import { formatDiff, formatValue } from "./format";

export const rowClass = "grid grid-cols-3 gap-x-2 border-t border-ink/10 px-2 py-1.5 md:table-row md:px-0";
export const cellClass = "md:px-3 md:py-1.5 md:align-top";

/** The column heads A, B, B − A; the first (the row names) only where rows are a table (wider than a phone). */
export function CompareHead({ first }: { first: string }) {
  return (
    <thead className="text-left text-xs text-ink-soft">
      <tr className={rowClass.replace("border-t ", "")}>
        <th scope="col" className={`hidden md:table-cell md:w-[34%] ${cellClass}`}>{first}</th>
        <th scope="col" className={cellClass}>A</th>
        <th scope="col" className={cellClass}>B</th>
        <th scope="col" className={cellClass}>B − A</th>
      </tr>
    </thead>
  );
}

function Value({ row, side, prefs, density }: { row: MetricRow; side: Side; prefs: UnitPrefs; density: number | null }) {
  const text = row.kind === "number" ? formatValue(row.quantity, row[side], prefs, density) : row[side] ?? "—";
  const note = row.kind === "number" ? row.note?.[side] : undefined;
  const better = row.better === side;
  return (
    <td className={`${cellClass} ${better ? "rounded bg-ok/10" : ""}`} data-side={side}>
      <span className="num">{text}</span>
      {better && (
        <span className="ml-1.5 inline-block cursor-help rounded-full bg-ok px-1.5 text-[10px] font-semibold uppercase text-white" title={row.why ?? ""}
          aria-label={`better: ${row.why ?? ""}`} data-testid="better-mark">better</span>
      )}
      {note && <span className="block text-[11px] text-ink-faint">{note}</span>}
    </td>
  );
}

export function MetricsTable({ rows, prefs, densities }: { rows: MetricRow[]; prefs: UnitPrefs; densities: { a: number | null; b: number | null } }) {
  return (
    <table className="w-full text-sm md:table-fixed" data-testid="compare-metrics">
      <caption className="sr-only">Sizing results of A and B, and B − A</caption>
      <CompareHead first="Metric" />
      <tbody>
        {rows.map((r) => (
          <tr key={r.key} className={rowClass} data-metric={r.key} data-better={r.better ?? undefined}>
            <th scope="row" className={`col-span-3 text-left font-medium text-ink md:font-normal ${cellClass}`}>{r.label}</th>
            <Value row={r} side="a" prefs={prefs} density={densities.a} />
            <Value row={r} side="b" prefs={prefs} density={densities.b} />
            <td className={`${cellClass} num text-ink-soft`}>
              {r.kind === "number" ? formatDiff(r.quantity, r.diff, prefs, densities.a ?? densities.b) : r.same ? "same" : "differs"}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
