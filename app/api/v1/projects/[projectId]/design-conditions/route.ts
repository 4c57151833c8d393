import { apiHandler } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { Refused, refusedResponse } from "@/lib/persistence/outcome";
import { readProjectDefaults, setProjectDefaults } from "@/lib/projects/design-conditions";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** The fluid and design conditions new schematics of this project start with. */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  return Response.json(await readProjectDefaults((await params).projectId));
});

/** Replace them ({fluid, design}); 400 naming each field sizing could not use. */
export const PUT = apiHandler(async (req: Request, { params }: Ctx) => {
  const { projectId } = await params;
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  const r = await setProjectDefaults(projectId, body.value);
  return r instanceof Refused ? refusedResponse(r) : Response.json(r);
});
