import { apiHandler } from "@/lib/auth/authorize";
import { readableAttachment } from "@/lib/storage/attachments";
import { presignGet } from "@/lib/storage/s3";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ uploadId: string }> };

/** The file itself: a redirect to a short-lived presigned GET (the bucket is never public). */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  const a = await readableAttachment((await params).uploadId);
  return new Response(null, { status: 302, headers: { location: await presignGet(a.storageKey, a.fileName), "cache-control": "no-store" } });
});
