/**
 * The Results document (contract v1). Tests parse every engine answer with
 * `resultsSchema`: zod 4's z.number() rejects NaN and ±Infinity, so a parsed
 * answer is proof that no non-finite number leaked out. A number the engine
 * could not compute is null, with a finding saying why.
 */
import { z } from "zod";

const num = z.number();
const nnum = z.number().nullable();
/** Refs ("partId.field") of the assumed values a number rests on (see `assumptions`); empty: none. */
const restsOn = z.array(z.string()).default([]);

export const findingSchema = z.object({
  severity: z.enum(["error", "warning", "info"]),
  code: z.string().regex(/^[a-z0-9-]+(\.[a-z0-9-]+)+$/),
  message: z.string().min(1),
  refs: z.array(z.string()),
  /** The design mode it was found in (absent: it holds whatever the mode). */
  mode: z.enum(["heating", "hot-water"]).optional(),
  /** The simulated scenario it was found in, by name. */
  scenario: z.string().optional(),
  /** Design conditions the finding is about, as document paths (e.g. "design.minOutdoorTemperatureC"). */
  fields: z.array(z.string()).optional(),
});

/** A value the designer left empty, for which the engine used a typical value (lib/hydraulics/typical). */
export const assumptionSchema = z.object({
  ref: z.string(),
  part: z.string(),
  field: z.string(),
  kind: z.enum(["resistance", "water"]),
  value: num,
  unit: z.string(),
  basis: z.string(),
  working: z.string(),
  source: z.string(),
});

export const pipeResultSchema = z.object({
  id: z.string(),
  flowM3h: nnum,
  velocityMps: nnum,
  reynolds: nnum,
  frictionFactor: nnum,
  pressureDropKpa: nnum,
  gradientPaPerM: nnum,
  suggestedSize: z.string().nullable(),
  /** assumed values its flow rests on: where loops split the flow by resistance (else none: design flows follow the loads) */
  restsOn,
});

export const partResultSchema = z.object({ id: z.string(), flowM3h: nnum, pressureDropKpa: nnum, restsOn });

export const circuitSchema = z.object({
  load: z.string(),
  pump: z.string().nullable(),
  path: z.array(z.string()),
  pressureDropKpa: nnum,
  index: z.boolean(),
  excessKpa: nnum,
  balancingKv: nnum,
  restsOn,
});

export const pumpDutySchema = z.object({
  id: z.string(),
  designFlowM3h: nnum,
  requiredHeadKpa: nnum,
  availableHeadKpa: nnum,
  ok: z.boolean().nullable(),
  /** available − required at the design flow, kPa */
  surplusKpa: nnum.default(null),
  /** speed, as a fraction of the curve drawn, at which the pump meets the duty (affinity laws); null when not oversized or not computable */
  speedFraction: nnum.default(null),
  /** head to set in a constant-pressure mode: the head required, kPa */
  constantPressureHeadKpa: nnum.default(null),
  /** the pumps (and heat sources with a pump) driving this side, in series; the speed is for all of them together */
  pumpIds: z.array(z.string()).default([]),
  restsOn,
});

export const modeResultSchema = z.object({
  mode: z.enum(["heating", "hot-water"]),
  heatSourceFlowM3h: nnum,
  pipes: z.array(pipeResultSchema),
  parts: z.array(partResultSchema),
  circuits: z.array(circuitSchema),
  pump: pumpDutySchema.nullable(),
  pumps: z.array(pumpDutySchema),
});

export const scenarioResultSchema = z.object({
  name: z.string(),
  mode: z.enum(["heating", "hot-water"]),
  converged: z.boolean(),
  iterations: z.number().int().min(0),
  heatSourceFlowM3h: nnum,
  heatSourceReturnC: nnum,
  pipes: z.array(z.object({ id: z.string(), flowM3h: nnum, velocityMps: nnum, pressureDropKpa: nnum })),
  parts: z.array(partResultSchema),
  emitters: z.array(
    z.object({ id: z.string(), flowM3h: nnum, outputW: nnum, returnTemperatureC: nnum }),
  ),
  restsOn,
});

export const resultsSchema = z.object({
  engine: z.string(),
  ok: z.literal(true),
  findings: z.array(findingSchema),
  fluid: z.object({
    temperatureC: num,
    densityKgM3: nnum,
    kinematicViscosityM2s: nnum,
    specificHeatJkgK: nnum,
  }),
  modes: z.array(modeResultSchema),
  bypass: z
    .object({
      id: z.string(),
      recommendedOpeningKpa: nnum,
      heatSourceFlowAllZonesClosedM3h: nnum,
      minFlowMet: z.boolean().nullable(),
      /** the zones' largest design Δp between the bypass's ends, kPa (its working) */
      zonesDpKpa: nnum.default(null),
      /** the Δp the pumps put across its ends with every zone open and it shut, kPa (its working) */
      openZonesDpKpa: nnum.default(null),
      restsOn,
    })
    .nullable(),
  expansionVessel: z
    .object({
      systemVolumeL: nnum,
      expansionVolumeL: nnum,
      requiredVolumeL: nnum,
      recommendedPrechargeBar: nnum,
      providedVolumeL: nnum,
      ok: z.boolean().nullable(),
      restsOn,
    })
    .nullable(),
  volume: z.object({ systemL: nnum, minimumL: nnum, bufferRecommended: z.boolean().nullable(), restsOn }),
  emitters: z.array(
    z.object({ id: z.string(), outputAtDesignW: nnum, heatLoadW: nnum, ok: z.boolean().nullable() }),
  ),
  hotWater: z.object({ id: z.string(), reheatMinutes: nnum }).nullable(),
  scenarios: z.array(scenarioResultSchema),
  assumptions: z.array(assumptionSchema).default([]),
});

export type Finding = z.output<typeof findingSchema>;
export type Assumption = z.output<typeof assumptionSchema>;
export type Severity = Finding["severity"];
export type PipeResult = z.output<typeof pipeResultSchema>;
export type PartResult = z.output<typeof partResultSchema>;
export type Circuit = z.output<typeof circuitSchema>;
export type PumpDuty = z.output<typeof pumpDutySchema>;
export type ModeResult = z.output<typeof modeResultSchema>;
export type ScenarioResult = z.output<typeof scenarioResultSchema>;
export type Results = z.output<typeof resultsSchema>;
