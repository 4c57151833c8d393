import { apiHandler } from "@/lib/auth/authorize";
import { pipePricesOf, uploadPriceList } from "@/lib/handover/materials-service";
import { CSV_TYPES } from "@/lib/rooms/service";

export const dynamic = "force-dynamic";
type Ctx = { params: Promise<{ projectId: string }> };

/**
 * GET {priceList: {items, uploadedAt, uploadedBy} | null, pipePrices: {material: {size: price per m}}}:
 * whether the project has a price list, and the pipe prices it gives the size optimiser
 * (options.prices of POST /api/v1/optimise). Every member.
 */
export const GET = apiHandler(async (_req: Request, { params }: Ctx) => Response.json(await pipePricesOf((await params).projectId)));

/**
 * POST the firm's price list (text/csv: code, description, unit, price). Every problem is
 * listed as {line, column, message} and then nothing is saved (400); a good list replaces the
 * project's. Owners and designers.
 */
export const POST = apiHandler(async (req: Request, { params }: Ctx) => {
  const a = await uploadPriceList((await params).projectId, req);
  return Response.json(a.body, { status: a.status });
}, { accepts: CSV_TYPES });
