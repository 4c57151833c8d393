import { apiHandler } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { moveRevisionStatus } from "@/lib/review/status-move";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ revisionId: string }> };

/** Move a revision: {status, reason?} (reason required to send back) → {revision, threadId, mailed}. */
export const POST = apiHandler(async (req: Request, { params }: Ctx) => {
  const { revisionId } = await params;
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  return Response.json(await moveRevisionStatus(revisionId, body.value));
});
