import { apiHandler } from "@/lib/auth/authorize";
import { completeUpload } from "@/lib/storage/uploads";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ uploadId: string }> };

/** Check the stored bytes (real type, size), thumbnail a photo, list it — or delete it and say why (413/415). */
export const POST = apiHandler(async (_req: Request, { params }: Ctx) => {
  const r = await completeUpload((await params).uploadId);
  return Response.json(r.body, { status: r.status });
});
