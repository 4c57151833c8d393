/**
 * The short form of a project's design conditions that the new-project and
 * project-settings forms ask for (flow, return, outdoor temperature, heat
 * source). Stored in the one shape of lib/schematic/project-defaults.ts
 * (projects.design_conditions), so new schematics and the Design conditions
 * form read the same values. Client-safe.
 */
import { z } from "zod";
import { projectDefaultsFrom, type ProjectDefaults } from "@/lib/schematic/project-defaults";

export const designDefaultsSchema = z.object({
  flowTemperatureC: z.number({ error: "Flow temperature must be a number (°C)." }).min(20, "Flow temperature must be at least 20 °C.")
    .max(85, "Flow temperature must be at most 85 °C.").default(45),
  returnTemperatureC: z.number({ error: "Return temperature must be a number (°C)." }).min(10, "Return temperature must be at least 10 °C.")
    .max(80, "Return temperature must be at most 80 °C.").default(40),
  outdoorC: z.number({ error: "Design outdoor temperature must be a number (°C)." }).min(-40, "Design outdoor temperature must be at least −40 °C.")
    .max(20, "Design outdoor temperature must be at most 20 °C.").nullable().default(-3),
  heatSource: z.string().trim().max(160, "Heat source must be at most 160 characters.").default(""),
}).refine((d) => d.returnTemperatureC < d.flowTemperatureC, { message: "Return temperature must be below the flow temperature.", path: ["returnTemperatureC"] });

export type DesignDefaults = z.output<typeof designDefaultsSchema>;

/** The short form of what is stored; an outdoor temperature never stated reads as null, not as a guess. */
export function readDesignDefaults(stored: unknown): DesignDefaults {
  const d = projectDefaultsFrom(stored);
  const r = designDefaultsSchema.safeParse({
    flowTemperatureC: d.design.flowTemperatureC, returnTemperatureC: d.design.returnTemperatureC,
    outdoorC: d.design.minOutdoorTemperatureC ?? null, heatSource: d.heatSource ?? "",
  });
  return r.success ? r.data : designDefaultsSchema.parse({});
}

/** What to store: the stored design conditions with the short form's fields set, every other field kept. */
export function withDesignDefaults(stored: unknown, s: DesignDefaults): ProjectDefaults {
  const current = projectDefaultsFrom(stored);
  const design = { ...current.design, flowTemperatureC: s.flowTemperatureC, returnTemperatureC: s.returnTemperatureC, minOutdoorTemperatureC: s.outdoorC };
  return { ...current, design, heatSource: s.heatSource };
}
