import { apiHandler } from "@/lib/auth/authorize";
import { listAttachments } from "@/lib/storage/attachments";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** The project's checked photos and documents, newest first, with thumbnail and file links. */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  return Response.json({ attachments: await listAttachments((await params).projectId) }, { headers: { "cache-control": "private, no-store" } });
});
