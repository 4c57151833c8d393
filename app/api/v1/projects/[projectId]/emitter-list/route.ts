import { apiHandler } from "@/lib/auth/authorize";
import { emittersToCsv } from "@/lib/rooms/emitter-list-csv";
import { readEmitterList, replaceEmitterList, respond } from "@/lib/rooms/service";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** The firm's emitter list {emitters, updatedAt} (?format=csv: as CSV). Any member of one of the firm's projects. */
export const GET = apiHandler(async (req: Request, { params }: Ctx) => {
  const answer = await readEmitterList((await params).projectId);
  if (new URL(req.url).searchParams.get("format") !== "csv" || answer.status !== 200) return respond(answer);
  return new Response(emittersToCsv(answer.body.emitters as never), {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": 'attachment; filename="emitters.csv"' },
  });
});

/** Replace the firm's list from a CSV (text/csv). Owners and designers; 400 {error, issues} and nothing saved on any problem. */
export const PUT = apiHandler(async (req: Request, { params }: Ctx) => respond(await replaceEmitterList((await params).projectId, req)));
