import { z } from "zod";
import { apiHandler, requireSchematicAccess } from "@/lib/auth/authorize";
import { saveDraft } from "@/db/queries/schematics";
import { parseSchematic } from "@/lib/schematic";
import { readJson } from "@/lib/http/body";
import { invalidDocument, refusal, refusedResponse } from "@/lib/persistence/outcome";
import { schematicView } from "@/lib/persistence/schematic-view";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ schematicId: string }> };

/** The working draft (or, for installers, the issued document) and the revisions, newest first. */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => {
  const { schematicId } = await params;
  const access = await requireSchematicAccess(schematicId, "read");
  const view = await schematicView(access);
  return view ? Response.json(view) : Response.json({ error: "Schematic not found." }, { status: 404 });
});

/** Replace the draft when lockVersion is current; 409 {error, currentLockVersion} when not. */
export const PUT = apiHandler(async (req: Request, { params }: Ctx) => {
  const { schematicId } = await params;
  const { user } = await requireSchematicAccess(schematicId, "edit");
  const envelope = z.object({ lockVersion: z.number().int().min(1), doc: z.unknown() }).parse(await readJson(req));
  const parsed = parseSchematic(envelope.doc);
  if (!parsed.ok) return refusedResponse(invalidDocument(parsed.issues));
  const r = await saveDraft({ schematicId, lockVersion: envelope.lockVersion, doc: parsed.doc, userId: user.id });
  return r.ok ? Response.json(r) : refusedResponse(refusal(r));
});
