import { apiHandler } from "@/lib/auth/authorize";
import { materialsCsv, materialsOf } from "@/lib/handover/materials-service";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ revisionId: string }> };

/** The materials list as CSV (papaparse), one line per pipe size, fitting kind and size, and part; ?allowance= as for materials.json. */
export const GET = apiHandler(async (req: Request, { params }: Ctx) => {
  const { revisionId } = await params;
  const csv = materialsCsv(await materialsOf(revisionId, req.url));
  return new Response(csv, { headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="materials-${revisionId.slice(0, 8)}.csv"` } });
});
