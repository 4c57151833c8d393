import { apiHandler } from "@/lib/auth/authorize";
import { readReport, reportHtml } from "@/components/handover/report-service";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ revisionId: string }> };

/** The handover report as one HTML page to read and print (same content as report.pdf; its CSP in next.config.mjs). */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  const report = await readReport((await params).revisionId);
  return new Response(reportHtml(report), { headers: { "content-type": "text/html; charset=utf-8", "cache-control": "private, no-store" } });
});
