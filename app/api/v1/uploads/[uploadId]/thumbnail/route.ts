import { apiHandler } from "@/lib/auth/authorize";
import { readableAttachment } from "@/lib/storage/attachments";
import { readObject } from "@/lib/storage/s3";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ uploadId: string }> };

/** A listed photo's thumbnail (WebP), same-origin so the phone can keep it offline. */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  const a = await readableAttachment((await params).uploadId);
  if (!a.thumbnailKey) return Response.json({ error: "This file has no thumbnail (only photos have one)." }, { status: 404 });
  const bytes = await readObject(a.thumbnailKey);
  return new Response(Buffer.from(bytes), { headers: { "content-type": "image/webp", "cache-control": "private, max-age=86400, immutable" } });
});
