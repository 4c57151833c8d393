import { apiHandler, requireSchematicAccess } from "@/lib/auth/authorize";
import { liveResponse } from "@/lib/live/stream";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ schematicId: string }> };

/** The board's live events as Server-Sent Events (text/event-stream): presence, draft, revision, thread, resync. */
export const GET = apiHandler(async (req: Request, { params }: Ctx) => {
  return liveResponse(req, await requireSchematicAccess((await params).schematicId, "read"));
});
