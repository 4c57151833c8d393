import { apiHandler, requireProjectRole } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { createUpload } from "@/lib/storage/uploads";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** {filename, contentType, size, target?: {schematicId, id?}, id?} → 201 {uploadId, url}: PUT the file to url, then complete it. */
export const POST = apiHandler(async (req: Request, { params }: Ctx) => {
  const { projectId } = await params;
  await requireProjectRole(projectId, "site.record");
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  const r = await createUpload(projectId, body.value);
  return Response.json(r, { status: r.status === "pending" ? 201 : 200 });
});
