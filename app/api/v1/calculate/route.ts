import { apiHandler, requireActionOnSomeProject } from "@/lib/auth/authorize";
import { readBodyBytes } from "@/lib/http/body";
import { parseJsonBytes } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { Answer, sizeToAnswer } from "@/lib/persistence/size";

export const dynamic = "force-dynamic";

// POST a schematic, get the results: 200 even with findings, 400 with JSON-path issues,
// 413 above 2 MB. An engine fault is answered 422 and logged: the contract promises no 500s.
// Sizing is for people whose role on some project includes it (owner, designer, trainee).
export const POST = apiHandler(async (req: Request) => {
  await requireActionOnSomeProject("schematic.size");
  const bytes = await readBodyBytes(req);
  try {
    const r = sizeToAnswer(bytes, () => parseJsonBytes(bytes));
    // Compression (gzip for clients that ask) is Next's own, applied to every response.
    return r instanceof Answer ? new Response(r.json, { headers: { "content-type": "application/json" } }) : refusedResponse(r);
  } catch (err) {
    console.error("[loopwright] engine fault in /api/v1/calculate", err);
    return Response.json({ error: "The engine could not calculate this schematic; the fault has been logged." }, { status: 422 });
  }
});
