"use client";

import { useBoardApi } from "../board-api";
import { useBoard } from "../store";
import { severityStyle, sortedFindings } from "./findings";
import { DesignFieldLinks } from "../design/design-field-links";

/** Errors and warnings from the last "Size it"; clicking one selects the parts and pipes it names and brings them into view. */
export function FindingsList() {
  const results = useBoard((s) => s.results);
  const stale = useBoard((s) => s.resultsStale);
  const api = useBoardApi();
  if (!results) return null;
  const findings = sortedFindings(results);
  return (
    <section aria-label="Findings" className="text-sm" data-testid="findings-list">
      {stale && <p className="mb-1 text-xs text-warn">The drawing changed since these were computed — size it again.</p>}
      {findings.length === 0 && <p className="text-ink-soft">No errors or warnings.</p>}
      <ul className="space-y-1">
        {findings.map((f, i) => (
          <li key={`${f.code}-${i}`}>
            <button type="button" onClick={() => api.selectRefs(f.refs)} disabled={f.refs.length === 0}
              className="w-full rounded px-2 py-1 text-left hover:bg-paper-dark disabled:cursor-default">
              <span className={`mr-1 text-xs font-semibold uppercase ${severityStyle[f.severity].className}`}>{severityStyle[f.severity].label}</span>
              <span className="text-ink">{f.message}</span>
            </button>
            <DesignFieldLinks fields={f.fields} />
          </li>
        ))}
      </ul>
    </section>
  );
}
