import { apiHandler } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { replyToThread } from "@/lib/review/threads";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ threadId: string }> };

/** A reply: {body} → 201 {thread}. @mentioned members get one e-mail each. */
export const POST = apiHandler(async (req: Request, { params }: Ctx) => {
  const { threadId } = await params;
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  return Response.json({ thread: await replyToThread(threadId, body.value) }, { status: 201 });
});
