/**
 * Props schemas of every part type (contract v1, shared/design/schematic-format.md).
 * Each field carries its unit in its name and a `.describe()` text the drawing
 * board shows beside the form field. Defaults are the values a freshly dropped
 * part gets; bounds reject what no real product has (negative Kv, 0 kW boiler).
 * Physically odd but typeable values (zero pipe length, ΔT 0) are left to the
 * engine, which reports them as `input.*` findings naming the part or pipe.
 */
import { z } from "zod";
import { valveModelOptions } from "./valve-models";

/** A Kv field: `label` is what the form shows ("Kvs", "Kv (open)"), `what` its one-line meaning. */
const kv = (label: string, what: string) =>
  z.number().min(0.001).max(1000).describe(`${label}, ${what} (m³/h at 1 bar)`);
/** Empty (null): see lib/hydraulics/typical — a typical value, "not counted", or computed by sizing. */
const optionalKv = (label: string, what: string) => kv(label, what).nullable().default(null);
const nullText = (hint?: string) => (hint ? ` (null: ${hint})` : "");
const powerW = (what: string, hint?: string) => z.number().min(0).max(5_000_000).describe(`${what}, W${nullText(hint)}`);
const volumeL = (what: string, hint?: string) => z.number().min(0).max(1_000_000).describe(`${what}, litres${nullText(hint)}`);
const deltaTK = z
  .number()
  .min(0.5)
  .max(60)
  .nullable()
  .default(null)
  .describe("own design temperature drop, K (null: design flow − return)");

/** A pump curve: points [flowM3h, headKpa], flow ascending, at least 3 points. */
export const pumpCurveSchema = z
  .array(z.tuple([z.number().min(0).max(10_000), z.number().min(0).max(10_000)]))
  .min(3)
  .max(50)
  .describe("pump curve, points [flow m³/h, head kPa], flow ascending");

const heatSource = z.object({
  ratedOutputKw: z.number().positive().max(100_000).default(7).describe("rated heat output, kW"),
  minFlowM3h: z.number().min(0).max(10_000).default(0).describe("minimum flow through the heat source, m³/h"),
  kv: optionalKv("Kv (heat exchanger)", "resistance of its own heat exchanger"),
  waterVolumeL: volumeL("water content").nullable().default(null),
  minSystemVolumeL: volumeL("minimum system water volume (defrost)", "not checked").nullable().default(null),
  pumpCurve: pumpCurveSchema.nullable().default(null).describe("built-in pump curve, points [flow m³/h, head kPa] (null: no own pump)"),
});

const empty = z.object({});

/** A valve model with a turns table (lib/schematic/valve-models.ts): the site sheet gives presets in turns too. */
const valveModelField = z.enum(valveModelOptions).optional().describe("valve model, for presets in turns on the site sheet");

export const partPropsSchemas = {
  "heat-pump": heatSource,
  boiler: heatSource,
  pump: z.object({
    curve: pumpCurveSchema.default([
      [0, 60],
      [1.5, 45],
      [3, 0],
    ]),
  }),
  "zone-valve": z.object({
    kvs: kv("Kvs", "fully open").default(4),
    open: z.boolean().default(true).describe("open as drawn"),
  }),
  "diverter-valve": z.object({
    kvs: kv("Kvs", "each way, fully open").default(4),
    position: z.enum(["a", "b"]).default("a").describe("port joined to ab as drawn"),
  }),
  "dp-bypass-valve": z.object({
    kvs: kv("Kvs", "fully open").default(2),
    openingKpa: z
      .number()
      .positive()
      .max(1000)
      .nullable()
      .default(null)
      .describe("opening differential pressure, kPa (null: computed by sizing)"),
  }),
  "balancing-valve": z.object({ kv: optionalKv("Kv (preset)", "the valve's setting"), valveModel: valveModelField }),
  "isolation-valve": z.object({
    kv: optionalKv("Kv (open)", "fully open"),
    open: z.boolean().default(true).describe("open as drawn"),
  }),
  "check-valve": z.object({ kv: optionalKv("Kv (open)", "held open by the flow") }),
  strainer: z.object({ kv: optionalKv("Kv (clean)", "with a clean screen") }),
  "magnetic-filter": z.object({ kv: optionalKv("Kv (clean)", "with a clean magnet and chamber") }),
  "heat-meter": z.object({ kv: optionalKv("Kv", "flow sensor") }),
  tee: empty,
  manifold: z.object({
    outlets: z.number().int().min(1).max(64).default(2).describe("number of outlets"),
  }),
  "buffer-vessel": z.object({ volumeL: volumeL("water content").default(40) }),
  "low-loss-header": z.object({ volumeL: volumeL("water content").default(2) }),
  cylinder: z.object({
    volumeL: volumeL("stored hot water").default(200),
    coilKv: kv("Coil Kv", "the cylinder's coil").default(4),
    coilOutputKw: z.number().positive().max(10_000).default(10).describe("coil output, kW"),
    storeTemperatureC: z.number().min(30).max(95).default(60).describe("store temperature, °C"),
    coldWaterC: z.number().min(0).max(30).default(10).describe("cold feed temperature, °C"),
    coilWaterVolumeL: volumeL("coil water content").nullable().default(null),
  }),
  radiator: z.object({
    outputAtDt50W: z.number().positive().max(100_000).default(1000).describe("EN 442 output at ΔT 50 K, W"),
    exponentN: z.number().min(1).max(2).default(1.3).describe("EN 442 exponent n"),
    roomTemperatureC: z.number().min(-10).max(40).default(20).describe("room temperature, °C"),
    heatLoadW: powerW("room heat load", "its output at design is taken as its load").nullable().default(null),
    valveKv: optionalKv("Valve Kv", "radiator valve and lockshield together"),
    valveModel: valveModelField,
    deltaTK,
    waterVolumeL: volumeL("water content").nullable().default(null),
  }),
  "ufh-loop": z.object({
    heatLoadW: powerW("heat load").default(1000),
    loopLengthM: z.number().positive().max(1000).default(80).describe("loop length, m"),
    innerDiameterMm: z.number().min(4).max(100).default(12).describe("loop pipe inner diameter, mm"),
    deltaTK,
    floorAreaM2: z
      .number()
      .positive()
      .max(10_000)
      .nullable()
      .default(null)
      .describe("heated floor area of the loop, m² (null: the floor is not checked against EN 1264)"),
    roomTemperatureC: z.number().min(-10).max(40).default(20).describe("room temperature, °C"),
    maxSurfaceTemperatureC: z
      .number()
      .min(15)
      .max(45)
      .default(29)
      .describe("floor surface limit, °C (EN 1264: 29 occupied zone, 35 perimeter, room + 9 K bathrooms)"),
  }),
  "fan-coil": z.object({
    heatLoadW: powerW("heat load").default(2000),
    kv: optionalKv("Coil Kv", "the fan coil's water coil"),
    deltaTK,
    waterVolumeL: volumeL("water content").nullable().default(null),
  }),
  "heat-load": z.object({
    heatLoadW: powerW("heat load").default(1000),
    kv: optionalKv("Kv", "resistance of the load"),
    deltaTK,
    waterVolumeL: volumeL("water content").nullable().default(null),
  }),
  "expansion-vessel": z.object({
    volumeL: volumeL("nominal volume").default(12),
    prechargeBar: z.number().min(0).max(10).nullable().default(null).describe("pre-charge pressure, bar gauge (null: computed by sizing)"),
  }),
  "safety-valve": z.object({ setBar: z.number().positive().max(16).default(3).describe("set pressure, bar gauge") }),
  "air-vent": empty,
  "drain-cock": empty,
  "pressure-gauge": empty,
  "temperature-sensor": empty,
  "filling-loop": empty,
} as const;

export type PartType = keyof typeof partPropsSchemas;
export const partTypes = Object.keys(partPropsSchemas) as PartType[];
export type PartProps<T extends PartType> = z.output<(typeof partPropsSchemas)[T]>;
