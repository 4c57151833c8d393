"use client";

import { useMemo } from "react";
import { docChanges } from "@/lib/schematic/doc-changes";
import { useBoardSession } from "../persistence/session-context";
import { useBoard } from "../store";
import { ViewSummary } from "./view-summary";
import { ViewSwitch } from "./view-switch";

const when = (iso: string) => new Date(iso).toLocaleString("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });
const SHOWN = 12;

/**
 * A strip above the canvas (never over it): which results are shown and where they came
 * from, the mode/scenario switch and its headline numbers, and — for kept results — what
 * changed in the drawing since they were computed, or what a newer engine computed differently.
 */
export function ResultsBar() {
  const session = useBoardSession();
  const results = useBoard((s) => s.results);
  if (!results) {
    return (
      <div className="border-b border-ink/10 bg-paper px-3 py-1 text-xs text-ink-faint" data-testid="results-bar">
        {session.canSize ? "Not sized yet: press Size it to see flows, velocities and findings." : "No sizing kept for this drawing yet."}
      </div>
    );
  }
  const meta = session.sizing;
  const source = session.viewing.kind === "revision" ? `Results of Rev ${session.viewing.revision.number}`
    : meta?.fromRevision ? `Results of Rev ${meta.fromRevision}, the last saved revision`
    : meta?.sizedAt ? `Sized ${when(meta.sizedAt)}${meta.sizedBy ? ` by ${meta.sizedBy}` : ""}` : "Sized now";
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-1 border-b border-ink/10 bg-white px-3 py-1" data-testid="results-bar">
      <ViewSwitch id="results-view-bar" />
      <ViewSummary />
      <span className="ml-auto hidden text-xs text-ink-faint sm:inline">{source} · engine <span className="num">{results.engine}</span></span>
      <Stale />
      <Recomputed />
    </div>
  );
}

/** The draft changed since its kept sizing: say so, and what changed. */
function Stale() {
  const stale = useBoard((s) => s.resultsStale);
  const resultsDoc = useBoard((s) => s.resultsDoc);
  const doc = useBoard((s) => s.doc);
  const changes = useMemo(() => (stale && resultsDoc ? docChanges(resultsDoc, doc) : []), [stale, resultsDoc, doc]);
  if (changes.length === 0) return null;
  return (
    <details className="w-full text-xs" data-testid="results-stale">
      <summary className="cursor-pointer text-warn">
        Out of date: {changes.length} change{changes.length === 1 ? "" : "s"} since these results were computed — size it again
      </summary>
      <ul className="mt-1 ml-4 list-disc text-ink-soft">
        {changes.slice(0, SHOWN).map((c) => <li key={`${c.kind}-${c.ref}`}>{c.text}</li>)}
        {changes.length > SHOWN && <li>and {changes.length - SHOWN} more</li>}
      </ul>
    </details>
  );
}

/** Kept results came from an older engine and were computed again on opening. */
function Recomputed() {
  const r = useBoardSession().sizing?.recomputed;
  if (!r) return null;
  return (
    <details className="w-full text-xs" data-testid="results-recomputed">
      <summary className="cursor-pointer text-copper-700">
        Computed again with this engine (the kept results were from engine {r.fromEngine}):{" "}
        {r.changes.length === 0 ? "the same numbers" : `${r.changes.length} difference${r.changes.length === 1 ? "" : "s"}`}
      </summary>
      {r.changes.length > 0 && (
        <ul className="mt-1 ml-4 list-disc text-ink-soft">
          {r.changes.slice(0, SHOWN).map((c) => <li key={c.what}>{c.what}: {c.before} → {c.after}</li>)}
          {r.changes.length > SHOWN && <li>and {r.changes.length - SHOWN} more</li>}
        </ul>
      )}
    </details>
  );
}
