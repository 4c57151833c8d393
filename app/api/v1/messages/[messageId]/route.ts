import { apiHandler } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { deleteOwnMessage, editMessage } from "@/lib/review/threads";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ messageId: string }> };

/** Edit one's own message: {body} → {thread}. Newly @mentioned members are e-mailed. */
export const PATCH = apiHandler(async (req: Request, { params }: Ctx) => {
  const { messageId } = await params;
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  return Response.json({ thread: await editMessage(messageId, body.value) });
});

/** Delete one's own message → {thread} (null when it was the thread's last). */
export const DELETE = apiHandler(async (_req: Request, { params }: Ctx) => {
  return Response.json(await deleteOwnMessage((await params).messageId));
});
