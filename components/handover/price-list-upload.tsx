"use client";

import { useState } from "react";

type Issue = { line: number; column: string; message: string };

/** The firm's price list (CSV: code, description, unit, price): sent as text/csv; a refused list shows every problem by line and column. */
export function PriceListUpload({ projectId, canUpload, current, onSaved }: {
  projectId: string; canUpload: boolean; current: { items: number; uploadedAt: string; uploadedBy: string | null } | null; onSaved: () => void;
}) {
  const [state, setState] = useState<{ error: string; issues: Issue[] } | { saved: number } | null>(null);
  const [busy, setBusy] = useState(false);
  const upload = async (file: File) => {
    setBusy(true);
    const res = await fetch(`/api/v1/projects/${projectId}/price-list`, { method: "POST", headers: { "content-type": "text/csv" }, body: await file.text() });
    const body = await res.json().catch(() => ({ error: `${res.status} ${res.statusText}` }));
    setBusy(false);
    if (!res.ok) return setState({ error: body.error ?? "The list was refused.", issues: body.issues ?? [] });
    setState({ saved: body.priceList.items });
    onSaved();
  };
  return (
    <div className="mt-4 border-t border-ink/10 pt-3 text-sm" data-testid="price-list">
      <p className="text-ink-soft">
        {current ? <>Prices from the firm&apos;s list: {current.items} items, uploaded {current.uploadedAt.slice(0, 10)}{current.uploadedBy ? ` by ${current.uploadedBy}` : ""}.</>
          : "No price list yet: upload the firm's own to price this list."}
        {" "}Columns: code, description, unit (m or each), price. Lines are matched by material and size, or by part type and its main size or rating.
      </p>
      {canUpload && (
        <label className="mt-2 inline-flex items-center gap-2">
          <span className="font-medium">{current ? "Replace the price list" : "Upload a price list"}</span>
          <input type="file" accept=".csv,text/csv" disabled={busy} data-testid="price-list-file" className="text-xs"
            onChange={(e) => { const f = e.target.files?.[0]; if (f) void upload(f); e.target.value = ""; }} />
        </label>
      )}
      {state && "saved" in state && <p role="status" className="mt-2 text-ok">Saved: {state.saved} items.</p>}
      {state && "error" in state && (
        <div role="alert" className="mt-2 rounded-md border border-fault/30 bg-fault/5 px-3 py-2">
          <p className="text-fault">{state.error}</p>
          {state.issues.length > 0 && (
            <ul className="mt-1 list-disc pl-5 text-ink-soft" data-testid="price-list-issues">
              {state.issues.map((i, k) => <li key={k}>Line {i.line}, {i.column}: {i.message}</li>)}
            </ul>
          )}
        </div>
      )}
    </div>
  );
}
