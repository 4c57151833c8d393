"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import type { HandoverView } from "@/lib/handover/handover-view";
import { buttonClass } from "@/components/ui/button";
import { MaterialsPanel } from "./materials-panel";
import { SendPanel } from "./send-panel";

/** The handover pack of one revision: the report (PDF and print view), the materials list with prices, and Send. */
export function HandoverScreen({ view }: { view: HandoverView }) {
  const router = useRouter();
  const rev = view.revision;
  const base = `/api/v1/revisions/${rev.id}`;
  const issued = rev.status === "issued";
  return (
    <main className="mx-auto max-w-5xl px-4 py-8" data-testid="handover-screen">
      <p className="text-sm text-ink-faint">
        <Link href="/projects" className="hover:text-copper-600">Projects</Link> / <Link href={`/projects/${view.projectId}`} className="hover:text-copper-600">{view.projectName}</Link>
        {" / "}<Link href={`/projects/${view.projectId}/schematics/${view.schematicId}?rev=${rev.id}`} className="hover:text-copper-600">{view.schematicName}</Link> / Handover pack
      </p>
      <div className="mt-1 flex flex-wrap items-end justify-between gap-3">
        <h1 className="text-2xl font-semibold">Handover pack</h1>
        <label className="text-sm text-ink-soft">
          Revision{" "}
          <select className="rounded-md border border-ink/15 bg-white px-2 py-1 text-sm" value={rev.id} data-testid="handover-revision"
            onChange={(e) => router.push(`/projects/${view.projectId}/schematics/${view.schematicId}/handover?rev=${e.target.value}`)}>
            {view.revisions.map((r) => <option key={r.id} value={r.id}>{r.number} — {r.status}</option>)}
          </select>
        </label>
      </div>
      {!issued && (
        <p role="status" className="mt-3 rounded-md border border-fault/30 bg-fault/5 px-3 py-2 text-sm text-ink-soft" data-testid="draft-note">
          Revision {rev.number} is <b>{rev.status}</b>, not issued: its report is marked DRAFT on every page and it cannot be sent to the client.
        </p>
      )}

      <section className="mt-6 rounded-lg border border-ink/10 bg-white p-4 shadow-sm" aria-labelledby="report-h">
        <h2 id="report-h" className="text-lg font-semibold">Report</h2>
        <p className="mt-1 text-sm text-ink-soft">
          Cover, the schematic, the sizing tables with the pump curve, the settings to make on site, the site records, findings still open and the cautions.
        </p>
        <div className="mt-3 flex flex-wrap gap-2">
          <a className={buttonClass("primary")} href={`${base}/report.pdf?download=1`} data-testid="report-pdf">Download the report (PDF)</a>
          <a className={buttonClass("secondary")} href={`${base}/report.pdf`} target="_blank" rel="noopener">Open the PDF</a>
          <a className={buttonClass("secondary")} href={`${base}/report`} target="_blank" rel="noopener" data-testid="report-print">Print view</a>
        </div>
      </section>

      <MaterialsPanel revisionId={rev.id} projectId={view.projectId} canUpload={view.canUploadPrices} />
      {view.canSend && <SendPanel revisionId={rev.id} issued={issued} clientEmail={view.clientEmail} />}
    </main>
  );
}
