/**
 * A project's design defaults: the conditions every new schematic in it starts
 * from (the designer can still change them per schematic). Client-safe: the
 * project forms use the same schema and words.
 */
import { z } from "zod";
import type { Design } from "@/lib/schematic";

export const designDefaultsSchema = z.object({
  flowTemperatureC: z.number({ error: "Flow temperature must be a number (°C)." }).min(20, "Flow temperature must be at least 20 °C.")
    .max(85, "Flow temperature must be at most 85 °C.").default(45),
  returnTemperatureC: z.number({ error: "Return temperature must be a number (°C)." }).min(10, "Return temperature must be at least 10 °C.")
    .max(80, "Return temperature must be at most 80 °C.").default(40),
  outdoorC: z.number({ error: "Design outdoor temperature must be a number (°C)." }).min(-40, "Design outdoor temperature must be at least −40 °C.")
    .max(20, "Design outdoor temperature must be at most 20 °C.").default(-3),
  heatSource: z.string().trim().max(160, "Heat source must be at most 160 characters.").default(""),
}).refine((d) => d.returnTemperatureC < d.flowTemperatureC, { message: "Return temperature must be below the flow temperature.", path: ["returnTemperatureC"] });

export type DesignDefaults = z.output<typeof designDefaultsSchema>;

/** Stored defaults (any shape: older rows, the demo seed) read leniently; what does not parse falls back. */
export function readDesignDefaults(stored: unknown): DesignDefaults {
  const r = designDefaultsSchema.safeParse(stored ?? {});
  return r.success ? r.data : designDefaultsSchema.parse({});
}

/** The part of a schematic's design block the defaults set. */
export function designFromDefaults(d: DesignDefaults): Partial<Design> {
  return { flowTemperatureC: d.flowTemperatureC, returnTemperatureC: d.returnTemperatureC, minOutdoorTemperatureC: d.outdoorC };
}
