"use client";

import { useState } from "react";
import useSWR from "swr";
import { fetchJson } from "@/lib/fetch-json";
import type { MaterialLine } from "@/lib/handover/materials";
import { buttonClass } from "@/components/ui/button";
import { PriceListUpload } from "./price-list-upload";

type Answer = { lines: MaterialLine[]; unmatched: MaterialLine[]; total: number | null; allowancePct: number;
  priceList: { items: number; uploadedAt: string; uploadedBy: string | null } | null };

const money = (n: number | undefined | null) => (n === undefined || n === null ? "" : n.toFixed(2));
const kinds: Record<MaterialLine["kind"], string> = { pipe: "Pipe", fitting: "Fitting", part: "Part" };

/** The materials list as a table: allowance stated and changeable, CSV download, prices from the firm's list. */
export function MaterialsPanel({ revisionId, projectId, canUpload }: { revisionId: string; projectId: string; canUpload: boolean }) {
  const [allowance, setAllowance] = useState("10");
  const valid = /^\d+(\.\d+)?$/.test(allowance.trim()) && Number(allowance) <= 100;
  const query = `allowance=${valid ? Number(allowance) : 10}`;
  const { data, error, mutate } = useSWR<Answer>(`/api/v1/revisions/${revisionId}/materials.json?${query}`, fetchJson, { keepPreviousData: true });
  return (
    <section className="mt-6 rounded-lg border border-ink/10 bg-white p-4 shadow-sm" aria-labelledby="materials-h">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id="materials-h" className="text-lg font-semibold">Materials list</h2>
          <p className="mt-1 text-sm text-ink-soft">Pipe lengths as drawn plus the allowance for offcuts and waste; fittings by kind and size; parts with what ordering needs.</p>
        </div>
        <div className="flex flex-wrap items-end gap-2">
          <label className="text-sm">
            <span className="font-medium">Allowance on pipe</span>
            <span className="mt-1 flex items-center gap-1">
              <input className="num w-20 rounded-md border border-ink/15 px-2 py-1.5 text-sm aria-[invalid=true]:border-fault" inputMode="decimal" value={allowance}
                aria-invalid={!valid || undefined} onChange={(e) => setAllowance(e.target.value)} data-testid="allowance" />
              <span className="text-xs text-ink-faint">%</span>
            </span>
          </label>
          <a className={buttonClass("secondary")} href={`/api/v1/revisions/${revisionId}/materials.csv?${query}`} download data-testid="materials-csv">Download CSV</a>
        </div>
      </div>
      {!valid && <p role="alert" className="mt-2 text-xs text-fault">Allowance: a per cent from 0 to 100.</p>}
      {error && <p role="alert" className="mt-2 text-sm text-fault">{String(error.message)}</p>}
      {data && (
        <div className="mt-3 overflow-x-auto">
          <table className="w-full text-sm" data-testid="materials-table">
            <thead className="bg-paper-dark text-left text-xs text-ink-soft">
              <tr><th className="px-2 py-1.5">Kind</th><th className="px-2 py-1.5">Item</th><th className="px-2 py-1.5 text-right">Drawn</th>
                <th className="px-2 py-1.5 text-right">To order</th><th className="px-2 py-1.5">Code</th><th className="px-2 py-1.5 text-right">Price</th><th className="px-2 py-1.5 text-right">Total</th></tr>
            </thead>
            <tbody>
              {data.lines.map((l) => (
                <tr key={l.key} className="border-t border-ink/5">
                  <td className="px-2 py-1 text-ink-soft">{kinds[l.kind]}</td>
                  <td className="px-2 py-1">{l.description}</td>
                  <td className="num px-2 py-1 text-right">{l.lengthM !== undefined ? `${l.lengthM} m` : ""}</td>
                  <td className="num px-2 py-1 text-right">{l.unit === "m" ? `${l.orderQuantity.toFixed(2)} m` : l.orderQuantity}</td>
                  <td className="px-2 py-1 text-ink-soft">{l.code ?? ""}</td>
                  <td className="num px-2 py-1 text-right">{money(l.price)}</td>
                  <td className="num px-2 py-1 text-right">{money(l.total)}</td>
                </tr>
              ))}
            </tbody>
            {data.total !== null && (
              <tfoot><tr className="border-t-2 border-ink/15 font-semibold"><td className="px-2 py-1.5" colSpan={6}>Total of the priced lines</td>
                <td className="num px-2 py-1.5 text-right" data-testid="materials-total">{money(data.total)}</td></tr></tfoot>
            )}
          </table>
          {data.priceList && data.unmatched.length > 0 && (
            <div className="mt-3 rounded-md border border-warn/30 bg-warn/5 px-3 py-2 text-sm" data-testid="unmatched">
              <p className="font-medium">{data.unmatched.length} {data.unmatched.length === 1 ? "line has" : "lines have"} no price in the list:</p>
              <ul className="mt-1 list-disc pl-5 text-ink-soft">{data.unmatched.map((l) => <li key={l.key}>{l.description}</li>)}</ul>
            </div>
          )}
        </div>
      )}
      <PriceListUpload projectId={projectId} canUpload={canUpload} current={data?.priceList ?? null} onSaved={() => mutate()} />
    </section>
  );
}
