/**
 * The design conditions a designer states, in the order the panel shows
 * them: label, unit, one-line meaning and what an empty value does. Limits
 * are read from the document's own zod schema (designSchema), so the panel
 * and the engine never disagree about them.
 */
import { designSchema, type Design } from "@/lib/schematic";

export type DesignKey = keyof Design;

export interface DesignFieldInfo {
  key: DesignKey;
  label: string;
  unit: string;
  meaning: string;
  /** what leaving it empty does (nullable fields only) */
  empty?: string;
}

export const designGroups: { title: string; fields: DesignFieldInfo[] }[] = [
  {
    title: "Temperatures",
    fields: [
      { key: "flowTemperatureC", label: "Flow temperature", unit: "°C", meaning: "Water leaving the heat source at the coldest design day; sets emitter output." },
      { key: "returnTemperatureC", label: "Return temperature", unit: "°C", meaning: "Water coming back at design; flow − return is the ΔT every design flow is sized for (q = P/(ρ·cp·ΔT))." },
      { key: "hotWaterFlowTemperatureC", label: "Hot-water flow temperature", unit: "°C", meaning: "Flow the heat source reaches when heating the cylinder; a store set at or above it cannot be reheated.", empty: "Empty: the highest flow temperature is used; if that is empty too, the reheat is not checked." },
      { key: "maxFlowTemperatureC", label: "Highest flow temperature", unit: "°C", meaning: "Hottest the system ever runs (hot water, legionella cycle); the expansion vessel is sized for it.", empty: "Empty: the design flow temperature." },
      { key: "fillTemperatureC", label: "Fill temperature", unit: "°C", meaning: "Water temperature when the system is filled; expansion is counted from here." },
      { key: "minOutdoorTemperatureC", label: "Minimum outdoor temperature", unit: "°C", meaning: "Coldest the site gets; the fluid's freezing point is checked against it.", empty: "Empty: frost protection is not checked." },
    ],
  },
  {
    title: "Pressures",
    fields: [
      { key: "coldFillPressureBar", label: "Cold fill pressure", unit: "bar g", meaning: "Gauge pressure at the vessel when the system is filled cold." },
      { key: "staticHeightM", label: "Static height", unit: "m", meaning: "Height of the highest point above the expansion vessel; sets its pre-charge." },
      { key: "safetyValveBar", label: "Safety valve setting", unit: "bar g", meaning: "Opening pressure of the safety valve; caps the vessel's final pressure." },
    ],
  },
  {
    title: "Pipe sizing limits",
    fields: [
      { key: "maxVelocityMps", label: "Velocity limit", unit: "m/s", meaning: "Fastest water allowed in a pipe (noise, erosion); suggested sizes stay under it." },
      { key: "targetGradientPaPerM", label: "Pressure gradient limit", unit: "Pa/m", meaning: "Largest friction loss per metre a suggested pipe size may have." },
    ],
  },
];

export const designFields: DesignFieldInfo[] = designGroups.flatMap((g) => g.fields);

type Bounded = { minValue?: number | null; maxValue?: number | null; _zod: { def: { innerType?: Bounded; type: string } } };

/** Lowest and highest value the schema accepts for a design field. */
export function designLimits(key: DesignKey): { min: number | null; max: number | null; nullable: boolean } {
  let node = designSchema.shape[key] as unknown as Bounded;
  let nullable = false;
  while (node._zod.def.innerType) {
    if (node._zod.def.type === "nullable") nullable = true;
    node = node._zod.def.innerType;
  }
  return { min: node.minValue ?? null, max: node.maxValue ?? null, nullable };
}

/** "5 to 110 °C" for the form's hint. */
export function limitsText(f: DesignFieldInfo): string {
  const { min, max } = designLimits(f.key);
  if (min === null || max === null) return "";
  return `${min === 0 && ["maxVelocityMps", "targetGradientPaPerM", "safetyValveBar"].includes(f.key) ? "above 0" : min} to ${max} ${f.unit}`;
}
