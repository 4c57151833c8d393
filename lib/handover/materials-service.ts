import "server-only";
import { z } from "zod";
import { audit } from "@/lib/audit";
import { requireProjectRole } from "@/lib/auth/authorize";
import { UserError } from "@/lib/auth/errors";
import { requestIp } from "@/lib/auth/request-context";
import { requireRevisionAccess } from "@/lib/auth/revision-access";
import { getPriceList, putPriceList, type StoredPriceList } from "@/db/queries/price-lists";
import { getRevision } from "@/db/queries/schematics";
import { parseSchematic } from "@/lib/schematic";
import { readCsvBody } from "@/lib/rooms/service";
import { writeCsv } from "@/lib/rooms/csv-table";
import { DEFAULT_ALLOWANCE_PCT, materialLines, type MaterialLine } from "./materials";
import { applyPrices, readPriceList } from "./price-list";
import { pipePricesFromList } from "./pipe-prices";
import type { Prices } from "@/lib/hydraulics/optimise/prices";

// The materials list of a revision (with the project's price list applied, when it has one)
// and the upload of that price list. Every member who may read the revision reads its list;
// owners and designers upload prices (policy "project.update").

export const allowanceQuery = z.object({
  allowance: z.coerce.number({ error: "allowance must be a number (per cent)" }).min(0, "allowance must be between 0 and 100 %")
    .max(100, "allowance must be between 0 and 100 %").default(DEFAULT_ALLOWANCE_PCT),
});

export interface MaterialsAnswer {
  lines: MaterialLine[]; unmatched: MaterialLine[]; total: number | null; allowancePct: number;
  priceList: { items: number; uploadedAt: string; uploadedBy: string | null } | null;
}

const aboutList = (p: StoredPriceList | null): MaterialsAnswer["priceList"] =>
  p ? { items: p.rows.length, uploadedAt: p.uploadedAt, uploadedBy: p.uploadedBy } : null;

export async function materialsOf(revisionId: string, url: string): Promise<MaterialsAnswer> {
  await requireRevisionAccess(revisionId);
  const raw = new URL(url).searchParams.get("allowance");
  const { allowance } = allowanceQuery.parse({ allowance: raw === null || raw === "" ? undefined : raw });
  const row = await getRevision(revisionId);
  const parsed = row ? parseSchematic(row.document) : null;
  if (!row || !parsed?.ok) throw new UserError(404, "Revision not found, or its document can no longer be read.");
  const prices = await getPriceList(row.projectId);
  const priced = applyPrices(materialLines(parsed.doc, allowance), prices?.rows ?? null);
  return { ...priced, allowancePct: allowance, priceList: aboutList(prices) };
}

const CSV_COLUMNS = ["kind", "description", "material", "size", "type", "props", "lengthM", "allowancePct", "orderQuantity", "unit", "code", "price", "total"] as const;

export function materialsCsv(a: MaterialsAnswer): string {
  return writeCsv(CSV_COLUMNS, a.lines.map((l) => [l.kind, l.description, l.material ?? "", l.size ?? "", l.type ?? "",
    l.props ? Object.entries(l.props).map(([k, v]) => `${k}=${v}`).join("; ") : "", l.lengthM ?? null, l.allowancePct ?? null, l.orderQuantity, l.unit,
    l.code ?? "", l.price ?? null, l.total ?? null]));
}

export async function uploadPriceList(projectId: string, req: Request): Promise<{ status: number; body: Record<string, unknown> }> {
  const { user } = await requireProjectRole(projectId, "project.update");
  const body = await readCsvBody(req);
  if (!body.ok) return body.answer;
  const { rows, issues } = readPriceList(body.text);
  if (issues.length) {
    const first = issues[0]!;
    return { status: 400, body: { error: `${issues.length} ${issues.length === 1 ? "problem" : "problems"} in the price list (first: line ${first.line}, ${first.column}: ${first.message}); nothing was saved.`, issues } };
  }
  await putPriceList(projectId, rows, user.id);
  await audit({ actorId: user.id, action: "price-list.replaced", projectId, detail: { items: rows.length }, ip: await requestIp() });
  return { status: 200, body: { priceList: { items: rows.length } } };
}

/** Whether the project has a price list, and the pipe prices per metre it gives the size optimiser. Every member. */
export async function pipePricesOf(projectId: string): Promise<{ priceList: MaterialsAnswer["priceList"]; pipePrices: Prices }> {
  await requireProjectRole(projectId, "project.read");
  const prices = await getPriceList(projectId);
  return {
    priceList: aboutList(prices),
    pipePrices: prices ? pipePricesFromList(prices.rows) : {},
  };
}
