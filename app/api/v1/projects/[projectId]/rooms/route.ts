import { apiHandler } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { readRooms, replaceRooms, respond, respondOrCsv } from "@/lib/rooms/service";
import { roomsToCsv } from "@/lib/rooms/rooms-csv";
import type { Room } from "@/lib/rooms/schema";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** {rooms, lockVersion, updatedAt}; with ?format=csv the rooms as a CSV file. Any member. */
export const GET = apiHandler(async (req: Request, { params }: Ctx) =>
  respondOrCsv(req, await readRooms((await params).projectId), (b) => roomsToCsv(b.rooms as Room[]), "rooms.csv"));

/** Replace the rooms: {rooms: [...], lockVersion?}. Owners and designers; 400 {error, issues} and nothing saved when any room is wrong. */
export const PUT = apiHandler(async (req: Request, { params }: Ctx) => {
  const { projectId } = await params;
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  return respond(await replaceRooms(projectId, body.value));
});
