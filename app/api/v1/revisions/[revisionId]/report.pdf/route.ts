import { apiHandler } from "@/lib/auth/authorize";
import { readReport, reportFileName, reportPdf } from "@/components/handover/report-service";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ revisionId: string }> };

/** The handover report as a PDF (issued revisions' kept per process; a draft's marked DRAFT on every page). ?download=1 saves it. */
export const GET = apiHandler(async (req: Request, { params }: Ctx) => {
  const report = await readReport((await params).revisionId);
  const { bytes, cached } = await reportPdf(report);
  const disposition = new URL(req.url).searchParams.get("download") ? "attachment" : "inline";
  return new Response(new Uint8Array(bytes), { headers: {
    "content-type": "application/pdf", "content-disposition": `${disposition}; filename="${reportFileName(report, "pdf")}"`,
    "cache-control": "private, no-store", "x-report-cache": cached ? "hit" : "miss",
  } });
});
