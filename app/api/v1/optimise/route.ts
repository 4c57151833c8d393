import { apiHandler, requireActionOnSomeProject } from "@/lib/auth/authorize";
import { optimise } from "@/lib/hydraulics/optimise";
import { readJsonBody } from "@/lib/persistence/json-body";
import { Refused, refusedResponse } from "@/lib/persistence/outcome";
import type { Issue } from "@/lib/schematic";

export const dynamic = "force-dynamic";

// POST {doc, options}: the cheapest pipe sizes that meet the velocity limit and the pump
// (lib/hydraulics/optimise). 200 with {sizes, cost, before, after, feasible, findings, …} —
// feasible: false is an answer, not an error; 400 naming doc.* / options.* paths; 413 above 2 MB.
// The same role check as /api/v1/calculate: a role that may size on some project (owner, designer, trainee).
const invalid = (issues: Issue[]) =>
  refusedResponse(new Refused(400, `The request is not valid: ${issues.slice(0, 3).map((i) => i.message).join("; ")}${issues.length > 3 ? ` (and ${issues.length - 3} more)` : ""}`, { issues }));

export const POST = apiHandler(async (req: Request) => {
  await requireActionOnSomeProject("schematic.size");
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  const value = body.value;
  if (typeof value !== "object" || value === null || Array.isArray(value) || !("doc" in value)) {
    return invalid([{ path: "doc", message: "doc: required — send {doc: <schematic>, options?: {…}}" }]);
  }
  const extra = Object.keys(value).filter((k) => k !== "doc" && k !== "options");
  if (extra.length > 0) return invalid(extra.map((k) => ({ path: k, message: `${k}: unknown field (send doc and options)` })));
  const { doc, options } = value as { doc: unknown; options?: unknown };
  const answer = optimise(doc, options ?? {});
  if (!answer.ok) {
    if (answer.issues.some((i) => i.message.startsWith("internal engine error"))) {
      console.error("[loopwright] engine fault in /api/v1/optimise", answer.issues);
      return Response.json({ error: "The engine could not optimise this schematic; the fault has been logged." }, { status: 422 });
    }
    return invalid(answer.issues);
  }
  return Response.json(answer.result);
});
