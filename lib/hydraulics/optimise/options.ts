/**
 * Options of an optimisation request (POST /api/v1/optimise, the CLI): one zod
 * schema, defaults stated here and shown in the UI. Prices are checked
 * against the catalogue so a misspelt size is named, not silently unused.
 */
import { z } from "zod";
import { pipeCatalogue, pipeMaterials, type PipeMaterial } from "@/lib/hydraulics/pipes/catalogue";
import { LIFE_COST_ASSUMPTIONS } from "./life-cost";

/** Head kept in hand on top of the index circuit, kPa, unless the request names one. */
export const DEFAULT_HEAD_MARGIN_KPA = 0;

const price = z.number().finite().min(0).max(1e6);
const materialPrices = z.record(z.string().max(20), price);

export const optimiseOptionsSchema = z
  .strictObject({
    objective: z.enum(["pipe-cost", "life-cost"]).default("pipe-cost"),
    prices: z.partialRecord(z.enum(pipeMaterials as [PipeMaterial, ...PipeMaterial[]]), materialPrices).optional(),
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
  })
  .superRefine((o, ctx) => {
    for (const [material, sizes] of Object.entries(o.prices ?? {}) as [PipeMaterial, Record<string, number>][]) {
      for (const size of Object.keys(sizes)) {
        if (!pipeCatalogue[material].some((r) => r.size === size)) {
          ctx.addIssue({ code: "custom", path: ["prices", material, size], message: `no ${material} size "${size}" in the catalogue (${pipeCatalogue[material].map((r) => r.size).join(", ")})` });
        }
      }
    }
  });

export type OptimiseOptions = z.output<typeof optimiseOptionsSchema>;
export type OptimiseOptionsInput = z.input<typeof optimiseOptionsSchema>;
