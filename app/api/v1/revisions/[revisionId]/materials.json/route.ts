import { apiHandler } from "@/lib/auth/authorize";
import { materialsOf } from "@/lib/handover/materials-service";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ revisionId: string }> };

/** {lines, unmatched, total, allowancePct, priceList} — ?allowance= per cent on pipe lengths (default 10). */
export const GET = apiHandler(async (req: Request, { params }: Ctx) => Response.json(await materialsOf((await params).revisionId, req.url)));
