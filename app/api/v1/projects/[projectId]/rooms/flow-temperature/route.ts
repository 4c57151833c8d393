import { apiHandler } from "@/lib/auth/authorize";
import { checkFlowTemperature, respond } from "@/lib/rooms/service";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/** ?flowC=&deltaK= → {rooms: [{name, outputW, shortfallW, neededOutputAtDt50W, suggested, …}], lowestFlowTemperatureC, curve}. Any member. */
export const GET = apiHandler(async (req: Request, { params }: Ctx) => {
  const q = new URL(req.url).searchParams;
  return respond(await checkFlowTemperature((await params).projectId, { flowC: q.get("flowC"), deltaK: q.get("deltaK") }));
});
