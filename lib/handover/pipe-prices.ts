/**
 * The firm's pipe prices per metre, read from its price list for the size optimiser
 * (lib/hydraulics/optimise, options.prices): each catalogue material and size is matched
 * as the materials list matches a pipe line (price-list.ts: a per-metre row naming the
 * material and size and no fitting; the first such row wins). A material gets an entry
 * only when the list prices at least one of its sizes — then only those sizes are offered
 * (the optimiser's rule in prices.ts); a material the list does not price keeps the
 * default table.
 */
import { pipeCatalogue, pipeMaterials } from "@/lib/hydraulics/pipes/catalogue";
import type { Prices } from "@/lib/hydraulics/optimise/prices";
import { rowFor, type PriceRow } from "./price-list";

export function pipePricesFromList(rows: readonly PriceRow[]): Prices {
  const out: Prices = {};
  for (const material of pipeMaterials) {
    const sizes: Record<string, number> = {};
    for (const { size } of pipeCatalogue[material]) {
      const row = rowFor({ kind: "pipe", key: "", description: "", material, size, orderQuantity: 1, unit: "m" }, rows);
      if (row) sizes[size] = row.price;
    }
    if (Object.keys(sizes).length) out[material] = sizes;
  }
  return out;
}
