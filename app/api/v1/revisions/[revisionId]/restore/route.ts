import { apiHandler } from "@/lib/auth/authorize";
import { restoreRevision } from "@/lib/review/restore";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ revisionId: string }> };

/** Restore an old revision as the new working draft → {schematicId, lockVersion, updatedAt, document, restoredFrom}. */
export const POST = apiHandler(async (_req: Request, { params }: Ctx) => {
  return Response.json(await restoreRevision((await params).revisionId));
});
