/**
 * Pipe prices per metre, by material and size. The default table is INVENTED
 * DEMO DATA (round numbers in no particular currency, copper dearer than PE-X,
 * rising with the bore) so the optimiser has something to weigh until a firm
 * keeps its own price list. The seam for that list is `priceList(prices)`:
 * whoever loads a firm's prices (a later issue) passes them in as
 * `options.prices`; nothing else in the optimiser reads a price.
 *
 * Rule: a material that the given list names is priced from that list only —
 * its sizes are the ones the firm stocks, so only they are offered; a material
 * it does not name falls back to the default table. A drawn size the list does
 * not stock keeps its default-table price for the "before" cost (and is never
 * proposed).
 */
import { pipeCatalogue, type PipeMaterial } from "@/lib/hydraulics/pipes/catalogue";

export type Prices = Partial<Record<PipeMaterial, Record<string, number>>>;

/** Invented demo prices per metre of installed pipe (not from any supplier). */
export const DEFAULT_PRICES_PER_M: Record<PipeMaterial, Record<string, number>> = {
  copper: { "10": 4.2, "15": 5.6, "22": 10.4, "28": 14.9, "35": 24.5, "42": 31, "54": 44 },
  steel: { DN15: 7.5, DN20: 9, DN25: 12.5, DN32: 16, DN40: 19, DN50: 26 },
  pex: { "16x2": 1.6, "20x2": 2.3, "26x3": 4.1, "32x3": 5.9 },
  multilayer: { "16x2": 2.4, "20x2": 3.3, "26x3": 6, "32x3": 8.2 },
};

export interface PriceList {
  /** where the prices of a material come from */
  sourceOf(material: PipeMaterial): "options" | "default-demo";
  /** price per metre of a size that may be proposed (stocked), else null */
  offered(material: PipeMaterial, size: string): number | null;
  /** price per metre for costing a drawn pipe: the list, else the default table, else null */
  costing(material: PipeMaterial, size: string): number | null;
}

export function priceList(prices: Prices | undefined): PriceList {
  const own = (m: PipeMaterial) => prices?.[m];
  const get = (table: Record<string, number> | undefined, size: string) =>
    table && Object.hasOwn(table, size) ? table[size]! : null;
  return {
    sourceOf: (m) => (own(m) ? "options" : "default-demo"),
    offered: (m, size) => get(own(m) ?? DEFAULT_PRICES_PER_M[m], size),
    costing: (m, size) => get(own(m), size) ?? get(DEFAULT_PRICES_PER_M[m], size),
  };
}

/** Catalogue rows of a material that the price list offers, smallest first. */
export function offeredRows(list: PriceList, material: PipeMaterial) {
  return (pipeCatalogue[material] ?? []).filter((row) => list.offered(material, row.size) !== null);
}
