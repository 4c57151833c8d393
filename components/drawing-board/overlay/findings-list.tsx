"use client";

import { useBoard } from "../store";
import { severityStyle, sortedFindings } from "./findings";

/** Errors and warnings from the last "Size it"; clicking one selects the parts and pipes it names. */
export function FindingsList() {
  const results = useBoard((s) => s.results);
  const stale = useBoard((s) => s.resultsStale);
  const pipeIds = useBoard((s) => s.doc.pipes);
  const setSelection = useBoard((s) => s.setSelection);
  if (!results) return null;
  const findings = sortedFindings(results);
  const isPipe = new Set(pipeIds.map((p) => p.id));
  const select = (refs: string[]) => setSelection(refs.filter((r) => !isPipe.has(r)), refs.filter((r) => isPipe.has(r)));
  return (
    <section aria-label="Findings" className="text-sm" data-testid="findings-list">
      <h3 className="mb-1 flex items-baseline justify-between font-medium">
        Findings <span className="num text-xs text-ink-faint">{findings.length}</span>
      </h3>
      {stale && <p className="mb-1 text-xs text-warn">The drawing changed since these were computed — size it again.</p>}
      {findings.length === 0 && <p className="text-ink-soft">No errors or warnings.</p>}
      <ul className="space-y-1">
        {findings.map((f, i) => (
          <li key={`${f.code}-${i}`}>
            <button type="button" onClick={() => select(f.refs)} disabled={f.refs.length === 0}
              className="w-full rounded px-2 py-1 text-left hover:bg-paper-dark disabled:cursor-default">
              <span className={`mr-1 text-xs font-semibold uppercase ${severityStyle[f.severity].className}`}>{severityStyle[f.severity].label}</span>
              <span className="text-ink">{f.message}</span>
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
