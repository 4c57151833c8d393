import { apiHandler } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { createDraft } from "@/lib/rooms/drafts-service";
import { respond } from "@/lib/rooms/service";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** {plant, name?} → 201 {schematicId, findings, engineFindings}: a first draft from the saved rooms. */
export const POST = apiHandler(async (req: Request, { params }: Ctx) => {
  const { projectId } = await params;
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  return respond(await createDraft(projectId, body.value));
});
