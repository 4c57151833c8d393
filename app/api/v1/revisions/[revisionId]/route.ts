import { apiHandler } from "@/lib/auth/authorize";
import { requireRevisionAccess } from "@/lib/auth/revision-access";
import { revisionWithResults } from "@/lib/revisions/with-results";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ revisionId: string }> };

/** A revision with its document and sizing results (sized and kept on first read for this engine). */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  const { revisionId } = await params;
  await requireRevisionAccess(revisionId);
  const r = await revisionWithResults(revisionId);
  if (!r) return Response.json({ error: "Revision not found." }, { status: 404 });
  return Response.json({ revision: r.revision, document: r.document, results: r.results, engineVersion: r.engineVersion });
});
