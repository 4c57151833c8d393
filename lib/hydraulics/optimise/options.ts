/**
 * Options of an optimisation request (POST /api/v1/optimise, the CLI): one zod
 * schema, defaults stated here and shown in the UI. Prices are checked
 * against the catalogue so a misspelt size is named, not silently unused.
 */
import { z } from "zod";
import { pipeCatalogue, type PipeMaterial } from "@/lib/hydraulics/pipes/catalogue";
import { LIFE_COST_ASSUMPTIONS } from "./life-cost";

/** Head kept in hand on top of the index circuit, kPa, unless the request names one. */
export const DEFAULT_HEAD_MARGIN_KPA = 0;

const price = z.number().finite().min(0).max(1e6);
/** One material's prices per metre, by catalogue size (a size the catalogue lacks is named). */
const pricesOf = (material: PipeMaterial) =>
  z.record(z.string().max(20), price).superRefine((table, ctx) => {
    const sizes = pipeCatalogue[material].map((r) => r.size);
    for (const size of Object.keys(table)) {
      if (!sizes.includes(size)) ctx.addIssue({ code: "custom", path: [size], message: `no ${material} size "${size}" in the catalogue (${sizes.join(", ")})` });
    }
  });

export const optimiseOptionsSchema = z
  .strictObject({
    objective: z.enum(["pipe-cost", "life-cost"]).default("pipe-cost"),
    prices: z.strictObject({ copper: pricesOf("copper"), steel: pricesOf("steel"), pex: pricesOf("pex"), multilayer: pricesOf("multilayer") }).partial().optional(),
    headMarginKpa: z.number().finite().min(0).max(10_000).default(DEFAULT_HEAD_MARGIN_KPA),
    locked: z.array(z.string().min(1).max(100)).max(200_000).default([]),
    lifeCost: z
      .strictObject({
        years: z.number().finite().gt(0).max(100).default(LIFE_COST_ASSUMPTIONS.years),
        pricePerKwh: z.number().finite().min(0).max(1e4).default(LIFE_COST_ASSUMPTIONS.pricePerKwh),
        pumpEfficiency: z.number().finite().gt(0).max(1).default(LIFE_COST_ASSUMPTIONS.pumpEfficiency),
        hoursPerYear: z.number().finite().min(0).max(8784).default(LIFE_COST_ASSUMPTIONS.hoursPerYear),
      })
      .prefault({}),
  });

export type OptimiseOptions = z.output<typeof optimiseOptionsSchema>;
export type OptimiseOptionsInput = z.input<typeof optimiseOptionsSchema>;
