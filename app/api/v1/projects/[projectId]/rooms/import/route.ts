import { apiHandler } from "@/lib/auth/authorize";
import { CSV_TYPES, importRooms, respond } from "@/lib/rooms/service";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/**
 * POST a rooms CSV (text/csv): the preview {headers, mapping, rows, issues}. With
 * ?save=true the rooms replace the project's — only when no row has a problem (else 400,
 * nothing saved). ?mapping={"heatLossW":"Loss (W)"} chooses the column of a field.
 * This route takes text/csv, not JSON (apiHandler answers 415 otherwise); the body goes through the shared
 * bounded reader (413 above its limit).
 */
export const POST = apiHandler(async (req: Request, { params }: Ctx) => respond(await importRooms((await params).projectId, req)), { accepts: CSV_TYPES });
