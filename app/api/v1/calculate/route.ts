import { apiHandler, requireUser } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { invalidDocument, refusedResponse } from "@/lib/persistence/outcome";
import { size } from "@/lib/persistence/size";

export const dynamic = "force-dynamic";

// POST a schematic, get the results: 200 even with findings, 400 with JSON-path issues,
// 413 above 2 MB. An engine fault is answered 422 and logged: the contract promises no 500s.
export const POST = apiHandler(async (req: Request) => {
  await requireUser();
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  try {
    const r = size(body.value);
    return r.ok ? Response.json(r.results) : refusedResponse(invalidDocument(r.issues));
  } catch (err) {
    console.error("[loopwright] engine fault in /api/v1/calculate", err);
    return Response.json({ error: "The engine could not calculate this schematic; the fault has been logged." }, { status: 422 });
  }
});
