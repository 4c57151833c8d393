import "server-only";
import { db } from "@/lib/db";
import type { PriceRow } from "@/lib/handover/price-list";

// A project's price list: the rows of the firm's CSV as read (lib/handover/price-list.ts).

export interface StoredPriceList { rows: PriceRow[]; uploadedAt: string; uploadedBy: string | null }

export async function getPriceList(projectId: string): Promise<StoredPriceList | null> {
  const row = await db()("project_price_lists as l").leftJoin("users as u", "u.id", "l.uploaded_by")
    .where("l.project_id", projectId).first("l.rows", "l.uploaded_at", "u.name as uploaded_by");
  return row ? { rows: row.rows as PriceRow[], uploadedAt: new Date(row.uploaded_at).toISOString(), uploadedBy: row.uploaded_by } : null;
}

/** Replace the project's list (one statement: the old list stays until the new one is in). */
export async function putPriceList(projectId: string, rows: PriceRow[], userId: string): Promise<void> {
  await db()("project_price_lists").insert({ project_id: projectId, rows: JSON.stringify(rows), uploaded_by: userId, uploaded_at: db().fn.now() })
    .onConflict("project_id").merge();
}
