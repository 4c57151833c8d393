import { apiHandler } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { applySiteEvents, requireSiteRecorder } from "@/lib/site/apply-events";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ schematicId: string }> };

/** {events: [{id, kind, target?, data, madeAt}]} → {results: [{id, status: applied | duplicate | error, error?}]}, in order. */
export const POST = apiHandler(async (req: Request, { params }: Ctx) => {
  const access = await requireSiteRecorder((await params).schematicId);
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  return Response.json(await applySiteEvents(access, body.value));
});
