import { apiHandler } from "@/lib/auth/authorize";
import { historyOfSchematic } from "@/lib/review/history";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ schematicId: string }> };

/** The revision history, newest first: [{id, number, status, authorId, createdAt, message, changes: {added, removed, changed}, events, …}]. */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  return Response.json(await historyOfSchematic((await params).schematicId));
});
