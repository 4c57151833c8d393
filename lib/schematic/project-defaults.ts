/**
 * A project's design conditions: the fluid and design fields its new
 * schematics start with (stored in projects.design_conditions). Stored rows
 * may hold other keys from earlier seeds (e.g. a heat-source note); reading
 * keeps only the fields the schematic document knows and drops what is not
 * valid, so a stale row never stops a schematic from being created.
 */
import { z } from "zod";
import { designSchema, fluidSchema, type Schematic } from "./schema";

export const projectDefaultsSchema = z.object({
  fluid: fluidSchema.prefault({ kind: "water" }),
  design: designSchema.prefault({}),
  /** A note of the intended heat source, shown on the project page (not part of a schematic). */
  heatSource: z.string().trim().max(160, "Heat source must be at most 160 characters.").optional(),
});
export type ProjectDefaults = z.output<typeof projectDefaultsSchema>;

/** Defaults from a stored jsonb value: known, valid fields only; the rest take the schema's defaults. */
export function projectDefaultsFrom(stored: unknown): ProjectDefaults {
  const raw = (typeof stored === "object" && stored !== null ? stored : {}) as Record<string, unknown>;
  const designIn = (typeof raw.design === "object" && raw.design !== null ? raw.design : raw) as Record<string, unknown>;
  const design: Record<string, unknown> = {};
  for (const [key, field] of Object.entries(designSchema.shape)) {
    if (key in designIn && field.safeParse(designIn[key]).success) design[key] = designIn[key];
  }
  const fluid = fluidSchema.safeParse(raw.fluid);
  const heatSource = typeof raw.heatSource === "string" ? raw.heatSource.slice(0, 160) : undefined;
  return projectDefaultsSchema.parse({ fluid: fluid.success ? fluid.data : undefined, design, heatSource });
}

/** A schematic with the project's design conditions in place of its own. */
export function withProjectDefaults(doc: Schematic, defaults: ProjectDefaults): Schematic {
  return { ...doc, fluid: defaults.fluid, design: { ...defaults.design } };
}
