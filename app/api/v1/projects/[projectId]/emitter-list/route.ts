import { apiHandler } from "@/lib/auth/authorize";
import { emittersToCsv } from "@/lib/rooms/emitter-list-csv";
import { CSV_TYPES, readEmitterList, replaceEmitterList, respond, respondOrCsv } from "@/lib/rooms/service";
import type { EmitterEntry } from "@/lib/rooms/schema";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** The firm's emitter list {emitters, updatedAt} (?format=csv: as CSV). Any member of one of the firm's projects. */
export const GET = apiHandler(async (req: Request, { params }: Ctx) =>
  respondOrCsv(req, await readEmitterList((await params).projectId), (b) => emittersToCsv(b.emitters as EmitterEntry[]), "emitters.csv"));

/** Replace the firm's list from a CSV (text/csv). Owners and designers; 400 {error, issues} and nothing saved on any problem. */
export const PUT = apiHandler(async (req: Request, { params }: Ctx) => respond(await replaceEmitterList((await params).projectId, req)), { accepts: CSV_TYPES });
