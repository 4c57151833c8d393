import { apiHandler } from "@/lib/auth/authorize";
import { readableSchematics } from "@/lib/review/readable-schematics";
import { readJson } from "@/lib/http/body";
import { Refused, refusedResponse } from "@/lib/persistence/outcome";
import { newSchematic } from "@/lib/persistence/new-schematic";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** The project's schematics the caller may read, each with its latest revision (installers: latest issued). */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  return Response.json({ schematics: await readableSchematics((await params).projectId) });
});

/** {name, kind: "team" | "practice", from?: ref} → 201 {schematic}; a trainee may make practice variants only. */
export const POST = apiHandler(async (req: Request, { params }: Ctx) => {
  const { projectId } = await params;
  const r = await newSchematic(projectId, () => readJson(req));
  return r instanceof Refused ? refusedResponse(r) : Response.json(r, { status: 201 });
});
