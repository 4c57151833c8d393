import { apiHandler } from "@/lib/auth/authorize";
import { readJsonBody } from "@/lib/persistence/json-body";
import { refusedResponse } from "@/lib/persistence/outcome";
import { readRooms, replaceRooms, respond } from "@/lib/rooms/service";
import { roomsToCsv } from "@/lib/rooms/rooms-csv";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** {rooms, lockVersion, updatedAt}; with ?format=csv the rooms as a CSV file. Any member. */
export const GET = apiHandler(async (req: Request, { params }: Ctx) => {
  const answer = await readRooms((await params).projectId);
  if (new URL(req.url).searchParams.get("format") !== "csv" || answer.status !== 200) return respond(answer);
  return new Response(roomsToCsv(answer.body.rooms as never), {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": 'attachment; filename="rooms.csv"' },
  });
});

/** Replace the rooms: {rooms: [...], lockVersion?}. Owners and designers; 400 {error, issues} and nothing saved when any room is wrong. */
export const PUT = apiHandler(async (req: Request, { params }: Ctx) => {
  const { projectId } = await params;
  const body = await readJsonBody(req);
  if (!body.ok) return refusedResponse(body);
  return respond(await replaceRooms(projectId, body.value));
});
