/**
 * The one zod schema of the schematic document, contract v1
 * (shared/design/schematic-format.md). Used by the drawing board (forms), the
 * server action, the API route and the CLI. Unknown fields are kept
 * (looseObject): "fields may be added" — the drawing board stores layout there.
 */
import { z } from "zod";
import { partPropsSchemas as P, type PartType } from "./props";

export { partPropsSchemas, partTypes, pumpCurveSchema, type PartType, type PartProps } from "./props";

const id = z
  .string()
  .min(1)
  .max(100)
  .regex(/^[^.\s]+$/, "an id may not contain dots or spaces")
  .describe("identifier, unique among parts and pipes");

function part<T extends PartType, S extends z.ZodObject>(type: T, props: S) {
  return z.looseObject({
    id,
    type: z.literal(type),
    x: z.number().default(0).describe("drawing position x"),
    y: z.number().default(0).describe("drawing position y"),
    label: z.string().max(200).optional(),
    props: props.prefault({} as z.input<S>),
  });
}

export const partSchema = z.discriminatedUnion("type", [
  part("heat-pump", P["heat-pump"]),
  part("boiler", P.boiler),
  part("pump", P.pump),
  part("zone-valve", P["zone-valve"]),
  part("diverter-valve", P["diverter-valve"]),
  part("dp-bypass-valve", P["dp-bypass-valve"]),
  part("balancing-valve", P["balancing-valve"]),
  part("isolation-valve", P["isolation-valve"]),
  part("check-valve", P["check-valve"]),
  part("strainer", P.strainer),
  part("magnetic-filter", P["magnetic-filter"]),
  part("heat-meter", P["heat-meter"]),
  part("tee", P.tee),
  part("manifold", P.manifold),
  part("buffer-vessel", P["buffer-vessel"]),
  part("low-loss-header", P["low-loss-header"]),
  part("cylinder", P.cylinder),
  part("radiator", P.radiator),
  part("ufh-loop", P["ufh-loop"]),
  part("fan-coil", P["fan-coil"]),
  part("heat-load", P["heat-load"]),
  part("expansion-vessel", P["expansion-vessel"]),
  part("safety-valve", P["safety-valve"]),
  part("air-vent", P["air-vent"]),
  part("drain-cock", P["drain-cock"]),
  part("pressure-gauge", P["pressure-gauge"]),
  part("temperature-sensor", P["temperature-sensor"]),
  part("filling-loop", P["filling-loop"]),
]);

export const pipeMaterialSchema = z.enum(["copper", "steel", "pex", "multilayer"]);

const count = z.number().int().min(0).max(1000).default(0);
export const fittingsSchema = z
  .object({ elbow: count, bend: count, teeRun: count, teeBranch: count, reducer: count })
  .describe("fitting counts, K values from the catalogue");

const portRef = z
  .string()
  .regex(/^[^.\s]+\.[^.\s]+$/, "a port is written partId.port")
  .describe("port, written partId.port");

export const pipeSchema = z.looseObject({
  id,
  from: portRef,
  to: portRef,
  material: pipeMaterialSchema.describe("pipe material (catalogue)"),
  size: z.string().min(1).max(20).describe("catalogue size, e.g. 22 or DN20 or 16x2"),
  // Finite but not bounded below: a zero/negative length is an input.* finding.
  lengthM: z.number().max(100_000).describe("length, m"),
  fittings: fittingsSchema.prefault({}),
  innerDiameterMm: z.number().max(2000).optional().describe("inner diameter override, mm"),
  roughnessMm: z.number().min(0).max(10).optional().describe("absolute roughness override, mm"),
});

export const fluidSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("water") }),
  z.object({
    kind: z.literal("propylene-glycol"),
    percentByVolume: z.number().min(0).max(60).describe("glycol share, % by volume"),
  }),
  z.object({
    kind: z.literal("ethylene-glycol"),
    percentByVolume: z.number().min(0).max(60).describe("glycol share, % by volume"),
  }),
]);

export const designSchema = z.object({
  flowTemperatureC: z.number().min(5).max(110).default(45).describe("design flow temperature, °C"),
  returnTemperatureC: z.number().min(0).max(110).default(40).describe("design return temperature, °C"),
  coldFillPressureBar: z.number().min(0).max(16).default(1.5).describe("cold fill pressure, bar gauge"),
  safetyValveBar: z.number().positive().max(16).default(3).describe("safety valve setting, bar gauge"),
  staticHeightM: z.number().min(0).max(200).default(5).describe("static height above the vessel, m"),
  maxVelocityMps: z.number().positive().max(5).default(1).describe("maximum velocity, m/s"),
  targetGradientPaPerM: z.number().positive().max(5000).default(200).describe("target pressure gradient, Pa/m"),
  fillTemperatureC: z.number().min(0).max(40).default(10).describe("water temperature at fill, °C"),
  maxFlowTemperatureC: z
    .number()
    .min(5)
    .max(110)
    .nullable()
    .default(null)
    .describe("highest flow temperature ever reached (hot water, legionella cycle), °C; null: design flow"),
  hotWaterFlowTemperatureC: z
    .number()
    .min(5)
    .max(110)
    .nullable()
    .default(null)
    .describe("flow temperature the heat source reaches for hot water, °C; null: maxFlowTemperatureC"),
  minOutdoorTemperatureC: z
    .number()
    .min(-60)
    .max(30)
    .nullable()
    .default(null)
    .describe("lowest outdoor temperature at the site, °C (frost check)"),
});

export const scenarioSchema = z.object({
  name: z.string().min(1).max(200),
  mode: z.enum(["heating", "hot-water"]).default("heating"),
  valves: z
    .record(z.string(), z.union([z.boolean(), z.enum(["a", "b"])]))
    .default({})
    .describe("valve id → open (true/false) or diverter position (a/b)"),
});

export const schematicSchema = z.looseObject({
  format: z.literal("loopwright/schematic"),
  version: z.literal(1),
  name: z.string().max(300).default(""),
  fluid: fluidSchema.prefault({ kind: "water" }),
  design: designSchema.prefault({}),
  parts: z.array(partSchema).max(200_000).default([]),
  pipes: z.array(pipeSchema).max(200_000).default([]),
  scenarios: z.array(scenarioSchema).max(200).optional(),
});

export type Schematic = z.output<typeof schematicSchema>;
export type Part = z.output<typeof partSchema>;
export type Pipe = z.output<typeof pipeSchema>;
export type Fluid = z.output<typeof fluidSchema>;
export type Design = z.output<typeof designSchema>;
export type Scenario = z.output<typeof scenarioSchema>;
export type PipeMaterial = z.output<typeof pipeMaterialSchema>;
export type FittingCounts = z.output<typeof fittingsSchema>;
export type PartOf<T extends PartType> = Extract<Part, { type: T }>;
