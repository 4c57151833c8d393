import { apiHandler } from "@/lib/auth/authorize";
import { siteSheet } from "@/lib/site/site-view";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ schematicId: string }> };

/** The site sheet of the newest issued revision: rows by circuit, settings, ticks, records, the firm's test rule. */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  const sheet = await siteSheet((await params).schematicId);
  return Response.json(sheet, { headers: { "cache-control": "private, no-store" } });
});
