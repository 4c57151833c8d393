/**
 * Design conditions the engine cannot size with, refused where they are typed
 * (the board's Design conditions panel, the project's defaults) with the
 * reason. Each rule uses the engine's own functions, so the panel refuses
 * exactly what sizing could not use:
 * - return not below flow: no ΔT, no design flow (q = P/(ρ·cp·ΔT));
 * - fluid properties outside their data (water 0–100 °C; glycol tables
 *   0–50 % by volume, above the freezing point) at the mean temperature;
 * - static height for which the EN 12828 pre-charge is not below the final
 *   pressure the safety valve allows (vessels/en12828.ts);
 * - cold fill at or above the safety valve; a "highest flow" below the design flow.
 * Schema bounds (designSchema) are checked first, with zod's own messages.
 */
import { fluidValidity, GLYCOL_MAX_PERCENT_BY_VOLUME, type FluidSpec } from "@/lib/hydraulics/fluids";
import { en12828FinalPressureBar, en12828Vessel } from "@/lib/hydraulics/vessels";
import { designSchema, fluidSchema, type Design, type Fluid } from "@/lib/schematic/schema";
import { formatPath } from "@/lib/schematic/parse";

export interface DesignIssue {
  /** document path, e.g. "design.returnTemperatureC" or "fluid.percentByVolume" */
  path: string;
  message: string;
}

function ruleIssues(design: Design, fluid: Fluid): DesignIssue[] {
  const out: DesignIssue[] = [];
  const { flowTemperatureC: flow, returnTemperatureC: ret } = design;
  if (!(ret < flow)) {
    out.push({ path: "design.returnTemperatureC", message: `The return (${ret} °C) must be below the flow (${flow} °C): with no temperature drop no design flow can be worked out.` });
  }
  if (fluid.kind !== "water" && fluid.percentByVolume > GLYCOL_MAX_PERCENT_BY_VOLUME) {
    out.push({ path: "fluid.percentByVolume", message: `The glycol tables cover 0–${GLYCOL_MAX_PERCENT_BY_VOLUME} % by volume; ${fluid.percentByVolume} % is outside them.` });
  } else {
    const mean = (flow + ret) / 2;
    const v = fluidValidity(fluid as FluidSpec, mean);
    if (!v.ok) out.push({ path: fluid.kind === "water" ? "design.flowTemperatureC" : "fluid.percentByVolume", message: `No fluid properties at the mean ${mean} °C: ${v.message}.` });
    const fill = fluidValidity(fluid as FluidSpec, design.fillTemperatureC);
    if (!fill.ok) out.push({ path: "design.fillTemperatureC", message: `No fluid properties at the fill temperature: ${fill.message}.` });
  }
  if (design.coldFillPressureBar >= design.safetyValveBar) {
    out.push({ path: "design.coldFillPressureBar", message: `The cold fill (${design.coldFillPressureBar} bar) must be below the safety valve's ${design.safetyValveBar} bar.` });
  }
  try {
    // The engine's own vessel rule on a unit system: it refuses exactly when pre-charge ≥ final pressure.
    en12828Vessel({ systemVolumeL: 1, expansionFraction: 0, staticHeightM: design.staticHeightM, coldFillPressureBar: design.coldFillPressureBar, safetyValveBar: design.safetyValveBar });
  } catch {
    const pe = en12828FinalPressureBar(design.safetyValveBar);
    out.push({
      path: "design.staticHeightM",
      message: `${design.staticHeightM} m of static height needs a vessel pre-charge of about ${(design.staticHeightM / 10 + 0.2).toFixed(2)} bar, not below the ${pe.toFixed(2)} bar a ${design.safetyValveBar} bar safety valve allows (EN 12828 Annex D): raise the safety valve setting or check the height.`,
    });
  }
  for (const key of ["maxFlowTemperatureC", "hotWaterFlowTemperatureC"] as const) {
    const t = design[key];
    if (t !== null && t !== undefined && t < flow) {
      out.push({ path: `design.${key}`, message: `This (${t} °C) cannot be below the design flow temperature (${flow} °C); leave it empty to use the design flow.` });
    }
  }
  return out;
}

/** Everything wrong with these design conditions and fluid, each naming its field; empty when sizing can use them. */
export function designConditionIssues(design: unknown, fluid: unknown): DesignIssue[] {
  const d = designSchema.safeParse(design);
  const f = fluidSchema.safeParse(fluid);
  const shape = [
    ...(d.success ? [] : d.error.issues.map((i) => ({ path: formatPath(["design", ...i.path]), message: i.message }))),
    ...(f.success ? [] : f.error.issues.map((i) => ({ path: formatPath(["fluid", ...i.path]), message: i.message }))),
  ];
  if (!d.success || !f.success) return shape;
  return ruleIssues(d.data, f.data);
}
