import "server-only";
import { db } from "@/lib/db";
import { getProjectHead } from "@/db/queries/project-admin";
import { revisionWithResults } from "@/lib/revisions/with-results";
import { siteRecordsOfRevision } from "@/lib/site/records";
import type { ReportInput } from "./report-model";

// Everything the handover report of one revision reads: the project, the revision with its
// kept results (lib/revisions/with-results.ts), its site records and the review threads
// still open. The caller has checked access (requireRevisionAccess).

async function openThreads(schematicId: string): Promise<ReportInput["openThreads"]> {
  const first = db().raw(`(select body from thread_messages m where m.thread_id = t.id and m.deleted_at is null order by created_at limit 1) as body`);
  const rows = await db()("review_threads as t").where({ "t.schematic_id": schematicId }).whereNull("t.resolved_at")
    .orderBy("t.number").select("t.number", "t.anchor_kind", "t.anchor_id", first);
  return rows.map((r) => ({ number: r.number, anchor: r.anchor_kind === "schematic" ? "schematic" : `${r.anchor_kind} ${r.anchor_id}`,
    firstLine: String(r.body ?? "").split("\n")[0]!.slice(0, 200) }));
}

export async function reportInput(revisionId: string): Promise<ReportInput | null> {
  const r = await revisionWithResults(revisionId);
  if (!r) return null;
  const [project, schematic, records, threads] = await Promise.all([
    getProjectHead(r.revision.projectId),
    db()("schematics").where({ id: r.revision.schematicId }).first("name"),
    siteRecordsOfRevision(revisionId),
    openThreads(r.revision.schematicId),
  ]);
  if (!project) return null;
  const { revision } = r;
  return {
    project: { name: project.name, client: project.client, site: project.site, firm: project.firm },
    schematicName: schematic?.name ?? r.document.name,
    revision: { id: revision.id, number: revision.number, status: revision.status, createdAt: iso(revision.createdAt),
      statusChangedAt: iso(revision.statusChangedAt), authorName: revision.authorName },
    document: r.document, results: r.results, records, openThreads: threads,
  };
}

const iso = (d: string | Date) => new Date(d).toISOString();
