import { apiHandler } from "@/lib/auth/authorize";
import { readJson } from "@/lib/http/body";
import { Refused, refusedResponse } from "@/lib/persistence/outcome";
import { newSchematic } from "@/lib/persistence/new-schematic";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** {name, kind: "team" | "practice", from?: ref} → 201 {schematic}; a trainee may make practice variants only. */
export const POST = apiHandler(async (req: Request, { params }: Ctx) => {
  const { projectId } = await params;
  const r = await newSchematic(projectId, () => readJson(req));
  return r instanceof Refused ? refusedResponse(r) : Response.json(r, { status: 201 });
});
