import "server-only";
import { createHash } from "node:crypto";
import { LRUCache } from "lru-cache";
import { requireRevisionAccess } from "@/lib/auth/revision-access";
import { UserError } from "@/lib/auth/errors";
import { reportInput } from "@/lib/handover/report-input";
import { reportModel, type ReportInput, type ReportModel } from "@/lib/handover/report-model";
import { renderReportHtml } from "./report-html";
import { renderReportPdf } from "./report-pdf";

// The handover report of a revision, for the routes and the e-mail: access checked, data
// read, PDF or HTML rendered. Issued revisions' PDFs are kept per process, keyed by SHA-256
// of everything the report is made from (so a new site record or a renamed project makes a
// new report, and every instance gives the same bytes for the same key); drafts change
// under the designer's hands and are made fresh each time.

const kept = new LRUCache<string, Buffer>({ maxSize: 64 * 1024 * 1024, sizeCalculation: (b) => b.length });

export interface Report { input: ReportInput; model: ReportModel }

export async function readReport(revisionId: string): Promise<Report> {
  await requireRevisionAccess(revisionId);
  const input = await reportInput(revisionId);
  if (!input) throw new UserError(404, "Revision not found, or its document can no longer be read.");
  return { input, model: reportModel(input) };
}

export async function reportPdf(r: Report): Promise<{ bytes: Buffer; cached: boolean }> {
  const key = r.model.draft ? null : createHash("sha256").update(JSON.stringify(r.input)).digest("hex");
  const hit = key ? kept.get(key) : undefined;
  if (hit) return { bytes: hit, cached: true };
  const bytes = await renderReportPdf(r.input, r.model);
  if (key) kept.set(key, bytes);
  return { bytes, cached: false };
}

export const reportHtml = (r: Report) => renderReportHtml(r.input, r.model);

/** "millbrook-community-hall-plant-room-rev-1.pdf" */
export function reportFileName(r: Report, ext: string): string {
  const slug = `${r.input.project.name} ${r.input.schematicName}`.toLowerCase().normalize("NFKD").replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 80);
  return `${slug}-rev-${r.input.revision.number}${r.model.draft ? "-draft" : ""}.${ext}`;
}
