import { apiHandler } from "@/lib/auth/authorize";
import { parseJsonText, readText } from "@/lib/http/body";
import { sendHandover } from "@/components/handover/send-handover";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ revisionId: string }> };

/** {to?} → e-mails the issued revision's report (PDF attached) to `to`, or the project's client e-mail; logged in the history. */
export const POST = apiHandler(async (req: Request, { params }: Ctx) => {
  const { revisionId } = await params;
  const text = await readText(req);
  const body = text.trim() ? parseJsonText(text) : {};
  return Response.json({ sent: await sendHandover(revisionId, body) });
});
