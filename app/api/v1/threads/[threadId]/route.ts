import { apiHandler } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { resolveThread } from "@/lib/review/threads";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ threadId: string }> };

/** Resolve or reopen: {resolved: boolean} → {thread}. */
export const PATCH = apiHandler(async (req: Request, { params }: Ctx) => {
  const { threadId } = await params;
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  return Response.json({ thread: await resolveThread(threadId, body.value) });
});
