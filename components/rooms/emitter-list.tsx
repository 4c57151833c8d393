"use client";
/** The firm's emitter list (what the check and the draft pick replacements from): shown, downloaded, replaced from a CSV. */
import { useState } from "react";
import type { CsvIssue } from "@/lib/rooms/csv-table";
import type { EmitterEntry } from "@/lib/rooms/schema";
import { ApiError, roomsApi } from "./api";

export function EmitterList({ projectId, initial, editable, onChanged }: { projectId: string; initial: EmitterEntry[]; editable: boolean; onChanged: () => void }) {
  const [list, setList] = useState(initial);
  const [issues, setIssues] = useState<CsvIssue[]>([]);
  const [error, setError] = useState<string | null>(null);
  const replace = async (file: File | undefined) => {
    if (!file) return;
    setError(null);
    setIssues([]);
    try {
      setList((await roomsApi.putEmitters(projectId, await file.text())).emitters);
      onChanged();
    } catch (e) {
      setError((e as Error).message);
      if (e instanceof ApiError && Array.isArray(e.body.issues)) setIssues(e.body.issues as CsvIssue[]);
    }
  };
  return (
    <details className="relative mt-10 rounded-lg border border-ink/10 bg-white p-4" data-testid="emitter-list">
      <summary className="cursor-pointer font-semibold">Firm&apos;s emitter list <span className="num text-sm font-normal text-ink-faint">{list.length}</span></summary>
      <p className="mt-2 text-sm text-ink-soft">The radiators the firm fits, rated at ΔT 50 (75/65/20 °C). The check and the first draft pick the smallest that meets a room. Shared by every project of the firm.</p>
      <div className="mt-2 flex flex-wrap items-center gap-3 text-sm">
        <a href={roomsApi.csvUrl(projectId, "emitter-list")} className="text-copper-600 hover:underline" download>Download CSV</a>
        {editable && (
          <label className="cursor-pointer text-copper-600 hover:underline">Replace from CSV…
            <input type="file" accept=".csv,text/csv" className="sr-only" onChange={(e) => replace(e.target.files?.[0])} />
          </label>
        )}
      </div>
      {error && <p role="alert" className="mt-2 text-sm text-fault">{error}</p>}
      {issues.length > 0 && <ul className="mt-1 text-sm text-fault">{issues.map((i, k) => <li key={k}>Line {i.line}{i.column ? `, ${i.column}` : ""}: {i.message}</li>)}</ul>}
      <div className="relative mt-3 overflow-x-auto">
        <table className="w-full min-w-max text-sm">
          <thead className="text-left text-xs text-ink-soft"><tr>{["Model", "Type", "H × L mm", "Φ50 W", "n", "Water L"].map((h) => <th key={h} className="px-2 py-1 font-medium">{h}</th>)}</tr></thead>
          <tbody>
            {list.map((e) => (
              <tr key={e.name} className="border-t border-ink/5">
                <td className="px-2 py-1">{e.name}</td><td className="px-2 py-1 text-ink-soft">{e.type}</td>
                <td className="num px-2 py-1">{e.heightMm ?? "—"} × {e.lengthMm ?? "—"}</td><td className="num px-2 py-1">{e.outputAtDt50W}</td>
                <td className="num px-2 py-1">{e.exponentN}</td><td className="num px-2 py-1">{e.waterVolumeL ?? "—"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </details>
  );
}
