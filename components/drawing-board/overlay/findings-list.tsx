"use client";

import { useState } from "react";
import type { Finding } from "@/lib/schematic";
import { useBoardApi } from "../board-api";
import { useBoard } from "../store";
import { groupFindings, severityStyle, sortedFindings, type FindingGroup } from "./findings";
import { viewLabel, viewOfFinding } from "./results-view";
import { DesignFieldLinks } from "../design/design-field-links";

/**
 * Findings from the results shown, one line per check with its count, opened to list
 * its items. Each item says which mode or scenario it belongs to; clicking it shows the
 * drawing in that mode and selects (and brings into view) the parts and pipes it names.
 */
export function FindingsList() {
  const results = useBoard((s) => s.results);
  if (!results) return null;
  const groups = groupFindings(sortedFindings(results));
  return (
    <section aria-label="Findings" className="text-sm" data-testid="findings-list">
      {groups.length === 0 && <p className="px-2 py-1 text-ink-soft">No errors or warnings.</p>}
      <ul className="space-y-0.5">
        {groups.map((g) => <Group key={g.code} g={g} />)}
      </ul>
    </section>
  );
}

function Group({ g }: { g: FindingGroup }) {
  // a check found once needs no second click
  const [open, setOpen] = useState(g.items.length === 1);
  const style = severityStyle[g.severity];
  return (
    <li data-testid="finding-group" data-code={g.code}>
      <button type="button" onClick={() => setOpen((o) => !o)} aria-expanded={open}
        className="flex w-full items-center gap-2 rounded px-2 py-1 text-left hover:bg-paper-dark">
        <span className={`w-3 text-xs ${style.className}`} aria-hidden>{open ? "▾" : "▸"}</span>
        <span className={`text-[10px] font-semibold uppercase ${style.className}`}>{style.label}</span>
        <span className="min-w-0 flex-1 truncate text-ink" title={g.code}>{g.title}</span>
        <span className="num rounded-full bg-paper-dark px-1.5 text-xs text-ink-soft" data-testid="finding-count">{g.items.length}</span>
      </button>
      {open && (
        <ul className="mb-1 ml-5 space-y-0.5 border-l border-ink/10 pl-1">
          {g.items.map((f, i) => <Item key={`${i}-${f.refs.join(",")}`} f={f} />)}
        </ul>
      )}
    </li>
  );
}

function Item({ f }: { f: Finding }) {
  const api = useBoardApi();
  const results = useBoard((s) => s.results);
  const setView = useBoard((s) => s.setResultsView);
  const view = viewOfFinding(f);
  const show = () => {
    if (view !== null) setView(view);
    if (f.refs.length > 0) api.selectRefs(f.refs);
  };
  return (
    <li>
      <button type="button" onClick={show} className="w-full rounded px-2 py-0.5 text-left text-xs hover:bg-paper-dark" data-testid="finding">
        <span className="text-ink">{f.message}</span>
        <span className="ml-1 whitespace-nowrap rounded bg-copper-50 px-1 text-[10px] text-copper-700" data-testid="finding-view">{viewLabel(results, view)}</span>
      </button>
      <DesignFieldLinks fields={f.fields} />
    </li>
  );
}
