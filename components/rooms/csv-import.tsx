"use client";
/**
 * Import rooms from a CSV: choose a file, see what the server read — which
 * column feeds each field (changeable), every row, and each problem by line and
 * column — and only "Accept" replaces the project's rooms. Nothing is saved
 * before that, and not at all while a problem remains.
 */
import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { Mapping } from "@/lib/rooms/csv-table";
import { roomCsvFields } from "@/lib/rooms/rooms-csv";
import { roomsApi, type ImportPreview } from "./api";

export function CsvImport({ projectId, currentCount, onImported, onClose }: {
  projectId: string; currentCount: number; onImported: (lockVersion: number) => void; onClose: () => void;
}) {
  const [text, setText] = useState<string | null>(null);
  const [fileName, setFileName] = useState("");
  const [preview, setPreview] = useState<ImportPreview | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const load = async (csv: string, mapping?: Mapping) => {
    setBusy(true);
    setError(null);
    try {
      setPreview(await roomsApi.importCsv(projectId, csv, { save: false, mapping }));
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  };
  const choose = async (file: File | undefined) => {
    if (!file) return;
    const csv = await file.text();
    setFileName(file.name);
    setText(csv);
    await load(csv);
  };
  const remap = (key: string, header: string) => preview && text && load(text, { ...preview.mapping, [key]: header === "" ? null : header });
  const accept = async () => {
    if (!text || !preview) return;
    setBusy(true);
    try {
      const saved = await roomsApi.importCsv(projectId, text, { save: true, mapping: preview.mapping });
      onImported(saved.lockVersion ?? 0);
    } catch (e) {
      setError((e as Error).message);
      setBusy(false);
    }
  };
  const issuesOn = (line: number) => preview?.issues.filter((i) => i.line === line) ?? [];
  const good = preview ? preview.rows.filter((r) => r.room).length : 0;

  return (
    <section className="mt-4 rounded-lg border border-copper-100 bg-white p-4" aria-labelledby="import-h" data-testid="csv-import">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="import-h" className="font-semibold">Import rooms from CSV</h3>
        <Button variant="ghost" onClick={onClose}>Close</Button>
      </div>
      <p className="mt-1 text-sm text-ink-soft">One line per room: name, room temperature (°C), heat loss (W), and optionally floor area, emitter (radiator or ufh-loop), its output at ΔT 50 (W) and exponent n, or the loop's floor area. Numbers with a point for decimals, no thousands separator.</p>
      <label className="mt-3 block text-sm">
        <span className="sr-only">CSV file</span>
        <input type="file" accept=".csv,text/csv,text/plain" onChange={(e) => choose(e.target.files?.[0])} data-testid="csv-file"
          className="text-sm file:mr-3 file:rounded-md file:border file:border-ink/15 file:bg-paper file:px-3 file:py-1.5" />
      </label>
      {error && <p role="alert" className="mt-2 text-sm text-fault">{error}</p>}
      {preview && (
        <>
          <h4 className="mt-4 text-sm font-semibold">Columns of {fileName}</h4>
          <div className="mt-2 grid gap-2 sm:grid-cols-2 lg:grid-cols-3" data-testid="import-mapping">
            {roomCsvFields.map((f) => (
              <label key={f.key} className="flex flex-col text-xs text-ink-soft">
                <span>{f.label}{f.required ? " *" : ""}</span>
                <select value={preview.mapping[f.key] ?? ""} onChange={(e) => remap(f.key, e.target.value)} aria-label={`Column for ${f.key}`}
                  className="mt-0.5 rounded border border-ink/15 bg-white px-1.5 py-1 text-sm text-ink">
                  <option value="">(none)</option>
                  {preview.headers.map((h) => <option key={h} value={h}>{h}</option>)}
                </select>
              </label>
            ))}
          </div>
          <h4 className="mt-4 text-sm font-semibold">
            {preview.issues.length ? `${preview.issues.length} ${preview.issues.length === 1 ? "problem" : "problems"} to fix` : "No problems"} · {good} of {preview.rows.length} rooms read
          </h4>
          {preview.issues.length > 0 && (
            <ul className="mt-2 max-h-48 space-y-1 overflow-y-auto text-sm" data-testid="import-issues">
              {preview.issues.map((i, k) => (
                <li key={k} className="text-fault"><span className="num">Line {i.line}</span>{i.column ? <>, <b>{i.column}</b></> : null}: {i.message}</li>
              ))}
            </ul>
          )}
          <div className="relative mt-3 max-h-72 overflow-auto rounded border border-ink/10">
            <table className="w-full min-w-max text-sm" data-testid="import-preview">
              <thead className="sticky top-0 bg-paper-dark text-left text-xs text-ink-soft">
                <tr><th className="px-2 py-1">Line</th>{roomCsvFields.map((f) => <th key={f.key} className="px-2 py-1">{f.key}</th>)}</tr>
              </thead>
              <tbody>
                {preview.rows.map((r) => (
                  <tr key={r.line} className={`border-t border-ink/5 ${issuesOn(r.line).length ? "bg-flow-light/60" : ""}`}>
                    <td className="num px-2 py-1 text-ink-faint">{r.line}</td>
                    {roomCsvFields.map((f) => <td key={f.key} className="px-2 py-1">{r.cells[f.key]}</td>)}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="mt-3 flex flex-wrap items-center gap-2">
            <Button onClick={accept} disabled={busy || preview.issues.length > 0 || good === 0}>
              Accept: replace {currentCount ? `the ${currentCount} rooms` : "the rooms"} with these {good}
            </Button>
            <span className="text-xs text-ink-faint">Nothing is saved until you accept.</span>
          </div>
        </>
      )}
    </section>
  );
}
