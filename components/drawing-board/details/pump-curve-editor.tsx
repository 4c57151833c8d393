"use client";
/**
 * A pump curve as a table of [flow m³/h, head kPa] points (add/remove rows)
 * with a small chart. The whole curve commits at once, after the schema and
 * the ascending-flow rule accept it.
 */
import { useEffect, useState } from "react";
import { CartesianGrid, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { pumpCurveSchema } from "@/lib/schematic";
import { issueMessage, parseNumber } from "./schema-fields";

type Point = [number, number];

export function curveProblem(points: Point[]): string | null {
  const r = pumpCurveSchema.safeParse(points);
  if (!r.success) return r.error.issues[0]?.code === "too_small" && r.error.issues[0]?.path.length === 0 ? "A curve needs at least 3 points." : issueMessage(r.error.issues[0]!, "");
  for (let i = 1; i < points.length; i++) if (points[i]![0] <= points[i - 1]![0]) return `Flow must rise from row to row (row ${i + 1}).`;
  return null;
}

export function PumpCurveEditor({ label, value, readOnly, commit }: { label: string; value: Point[] | null; readOnly?: boolean; commit(v: Point[]): string | null }) {
  const [rows, setRows] = useState(() => (value ?? []).map(([q, h]) => [String(q), String(h)]));
  const [error, setError] = useState<string | null>(null);
  useEffect(() => setRows((value ?? []).map(([q, h]) => [String(q), String(h)])), [value]);

  const save = (next: string[][]) => {
    const pts = next.map(([q, h]) => [parseNumber(q ?? ""), parseNumber(h ?? "")] as const);
    if (pts.some(([q, h]) => q === null || h === null)) return setError("Every cell needs a number.");
    const curve = pts as unknown as Point[];
    const problem = curveProblem(curve);
    setError(problem ?? commit(curve));
  };
  const edit = (i: number, j: number, text: string) => setRows((rs) => rs.map((r, k) => (k === i ? r.map((c, m) => (m === j ? text : c)) : r)));
  const chart = (value ?? []).map(([q, h]) => ({ q, h }));

  return (
    <div className="py-1">
      <p className="text-xs text-ink-soft">{label}</p>
      <table className="mt-1 w-full text-sm">
        <thead>
          <tr className="text-left text-xs text-ink-faint"><th className="font-normal">flow m³/h</th><th className="font-normal">head kPa</th><th /></tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={i}>
              {[0, 1].map((j) => (
                <td key={j} className="pr-1">
                  {readOnly ? <span className="num">{r[j]}</span> : (
                    <input aria-label={`${j === 0 ? "flow" : "head"} row ${i + 1}`} inputMode="decimal" value={r[j]} onChange={(e) => edit(i, j, e.target.value)}
                      onBlur={() => save(rows)} onKeyDown={(e) => e.key === "Enter" && save(rows)}
                      className="num w-full rounded border border-ink/15 bg-white px-1.5 py-0.5 text-sm outline-none focus:border-copper-500" />
                  )}
                </td>
              ))}
              <td className="w-6">{!readOnly && <button type="button" aria-label={`remove row ${i + 1}`} className="text-ink-faint hover:text-fault" onClick={() => save(rows.filter((_, k) => k !== i))}>×</button>}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {!readOnly && (
        <button type="button" className="mt-1 text-xs text-copper-600 hover:underline" onClick={() => {
          const last = rows.at(-1);
          setRows([...rows, [String((parseNumber(last?.[0] ?? "0") ?? 0) + 0.5), "0"]]);
        }}>+ add point</button>
      )}
      {error && <p className="text-xs text-fault" role="alert">{error}</p>}
      {chart.length > 1 && (
        <div className="mt-2 h-32 w-full" data-testid="pump-curve-chart">
          <ResponsiveContainer width="100%" height="100%">
            <LineChart data={chart} margin={{ top: 4, right: 8, bottom: 0, left: -20 }}>
              <CartesianGrid stroke="#eee6da" />
              <XAxis dataKey="q" type="number" tick={{ fontSize: 10 }} unit="" />
              <YAxis dataKey="h" tick={{ fontSize: 10 }} />
              <Tooltip formatter={(v) => [`${v} kPa`, "head"]} labelFormatter={(q) => `${q} m³/h`} />
              <Line type="monotone" dataKey="h" stroke="#b4632b" strokeWidth={2} dot={{ r: 2.5 }} isAnimationActive={false} />
            </LineChart>
          </ResponsiveContainer>
        </div>
      )}
    </div>
  );
}
