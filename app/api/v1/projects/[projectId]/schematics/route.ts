import { apiHandler } from "@/lib/auth/authorize";
import { readableSchematics } from "@/lib/review/readable-schematics";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** The project's schematics the caller may read, each with its latest revision (installers: latest issued). */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  return Response.json({ schematics: await readableSchematics((await params).projectId) });
});
