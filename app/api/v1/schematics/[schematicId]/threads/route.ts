import { apiHandler } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { openThread, threadsOf } from "@/lib/review/threads";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ schematicId: string }> };

/** Threads newest first; `?revision=N`: those opened on Rev N or before, anchors checked in Rev N. Also who may be @mentioned. */
export const GET = apiHandler(async (req: Request, { params }: Ctx) => {
  const revision = new URL(req.url).searchParams.get("revision");
  return Response.json(await threadsOf((await params).schematicId, revision));
});

/** Open a thread pinned to a part, a pipe or the whole schematic: {anchor: {kind, id?}, body, revisionId?} → 201 {thread}. */
export const POST = apiHandler(async (req: Request, { params }: Ctx) => {
  const { schematicId } = await params;
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  return Response.json({ thread: await openThread(schematicId, body.value) }, { status: 201 });
});
