import Link from "next/link";
import type { SchematicSummary } from "@/db/queries/schematic-rows";
import { CompareTick } from "@/components/compare/compare-ticks";
import { compareHref } from "@/lib/compare/refs";
import { NewVariantButton } from "./new-variant-button";
import { StatusBadge } from "./status-badge";

const date = (iso: string) => new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });

/**
 * One schematic on the project page: latest revision status, its revisions, open and variant
 * actions; tick boxes for side by side (shown inside CompareTicks) and, per revision, a link
 * comparing it with the one before.
 */
export function SchematicCard({ projectId, s, compact = false, canVariant = false, variantLabel = "New variant", canCompare = false }: {
  projectId: string; s: SchematicSummary; compact?: boolean; canVariant?: boolean; variantLabel?: string; canCompare?: boolean;
}) {
  const href = `/projects/${projectId}/schematics/${s.id}`;
  return (
    <article className={`rounded-lg border border-ink/10 bg-white shadow-sm ${compact ? "p-3" : "p-4"}`} data-testid="schematic-card">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <h3 className="font-semibold"><Link href={href} className="hover:text-copper-600">{s.name}</Link></h3>
          <p className="mt-0.5 text-xs text-ink-faint">
            {s.kind === "practice" ? <span className="mr-1 rounded bg-paper-dark px-1.5 py-0.5 text-ink-soft">practice · private</span> : null}
            {s.variantOf && s.kind === "team" ? "variant · " : ""}
            {s.ownerName ? `by ${s.ownerName} · ` : ""}updated {date(s.updatedAt)}
          </p>
        </div>
        <div className="flex items-center gap-2">
          <CompareTick designRef={`schematic:${s.id}`} label={`${s.name} (draft)`} text="compare draft" />
          {s.latest ? <><span className="num text-xs text-ink-soft">Rev {s.latest.number}</span><StatusBadge status={s.latest.status} /></>
            : <span className="text-xs text-ink-faint">draft only</span>}
        </div>
      </div>
      <div className="mt-3 flex flex-wrap items-center gap-2">
        <Link href={href} className="rounded-md bg-copper-500 px-3 py-1.5 text-sm font-medium text-white hover:bg-copper-600">Open</Link>
        {s.revisions.some((r) => r.status === "issued") && (
          <Link href={`${href}/site`} className="rounded-md border border-copper-500 px-3 py-1.5 text-sm font-medium text-copper-700 hover:bg-copper-50" data-testid="site-sheet-link">Site sheet</Link>
        )}
        {s.revisions.some((r) => r.status === "issued") && (
          <Link href={`${href}/handover`} className="rounded-md border border-copper-500 px-3 py-1.5 text-sm font-medium text-copper-700 hover:bg-copper-50" data-testid="handover-link">Handover pack</Link>
        )}
        {canVariant && <NewVariantButton schematicId={s.id} label={variantLabel} />}
        {canCompare && <Link href={compareHref(projectId, `schematic:${s.id}`)} className="text-sm text-copper-700 underline hover:text-copper-600">Compare with…</Link>}
      </div>
      {s.revisions.length > 0 && (
        <details className="mt-3 text-sm">
          <summary className="cursor-pointer text-ink-soft hover:text-ink">Revisions ({s.revisions.length})</summary>
          <ol className="mt-2 space-y-1">
            {s.revisions.map((r, i) => (
              <li key={r.id} className="flex flex-wrap items-center gap-2" data-testid="revision-row">
                <CompareTick designRef={`revision:${r.id}`} label={`${s.name} Rev ${r.number}`} />
                <span className="num w-12 text-ink-soft">Rev {r.number}</span>
                <StatusBadge status={r.status} />
                <span className="min-w-0 flex-1 truncate">{r.message || <span className="text-ink-faint">no message</span>}</span>
                <span className="text-xs text-ink-faint">{r.authorName ?? "—"} · {date(r.createdAt)}</span>
                {canCompare && s.revisions[i + 1] && (
                  <Link href={compareHref(projectId, `revision:${s.revisions[i + 1]!.id}`, `revision:${r.id}`)} className="text-xs text-copper-700 underline hover:text-copper-600"
                    data-testid="compare-previous">vs Rev {s.revisions[i + 1]!.number}</Link>
                )}
              </li>
            ))}
          </ol>
        </details>
      )}
    </article>
  );
}
