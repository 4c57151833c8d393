"use client";

import Link from "next/link";
import { StatusBadge } from "@/components/projects/status-badge";
import { useBoardSession } from "./session-context";

/**
 * What is open, said plainly: a saved revision (read-only, as submitted) with the draft one
 * click away, or the working draft with the newest revision one click away.
 */
export function ViewingBanner() {
  const s = useBoardSession();
  const base = `/projects/${s.projectId}/schematics/${s.schematicId}`;
  if (s.viewing.kind === "revision") {
    const r = s.viewing.revision;
    return (
      <div className="flex flex-wrap items-center gap-2 border-b border-warn/30 bg-warn/10 px-3 py-1.5 text-sm" data-testid="viewing-banner" data-viewing="revision">
        <span className="font-semibold text-ink">Rev <span className="num">{r.number}</span></span>
        <StatusBadge status={r.status} />
        <span className="hidden text-ink-soft sm:inline">saved revision, shown as saved{r.authorName ? ` by ${r.authorName}` : ""}: read-only</span>
        {s.draftVisible && <Link href={`${base}?rev=draft`} className="ml-auto text-copper-700 underline hover:text-copper-600" data-testid="open-draft">Open the working draft</Link>}
      </div>
    );
  }
  const latest = s.revisions[0];
  if (!latest) return null;
  return (
    <div className="flex flex-wrap items-center gap-2 border-b border-ink/10 bg-paper-dark px-3 py-1 text-sm" data-testid="viewing-banner" data-viewing="draft">
      <span className="rounded bg-ink/80 px-1.5 text-[11px] font-semibold uppercase tracking-wide text-white">Working draft</span>
      <span className="hidden text-ink-soft sm:inline">may differ from the saved revisions</span>
      <Link href={`${base}?rev=${latest.id}`} className="ml-auto inline-flex items-center gap-1.5 text-copper-700 underline hover:text-copper-600" data-testid="open-revision">
        Open Rev <span className="num">{latest.number}</span> <StatusBadge status={latest.status} />
      </Link>
    </div>
  );
}
