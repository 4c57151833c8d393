/**
 * Design loads of a mode: each load's heat and its design flow
 * q = P/(ρ·cp·ΔT) (defining equation, flow.ts), ΔT the load's own deltaTK or
 * the design flow − return. In hot-water mode the cylinder coil takes the heat
 * source's rated output (contract); in heating mode a cylinder is a load only
 * when no diverter serves it (an S-plan-like zone), at its coil output.
 */
import { en442Output } from "@/lib/hydraulics/emitters";
import { flowForHeat } from "@/lib/hydraulics/flow";
import { partRegistry } from "@/lib/schematic/parts";
import type { Part } from "@/lib/schematic/schema";
import type { EngineContext } from "./context";

export interface DesignLoad {
  id: string;
  link: number;
  inNode: number;
  outNode: number;
  powerW: number;
  deltaTK: number;
  flowM3h: number;
  /** the header's primary pass stands in for a load on the primary side */
  header: boolean;
}

/** Design output of a radiator at flow/return/room (EN 442 log-mean), or null when the temperatures do not allow it. */
export function radiatorDesignOutputW(ctx: EngineContext, part: Part & { type: "radiator" }, deltaTK: number): number | null {
  const p = part.props;
  try {
    return en442Output({
      outputAtDt50W: p.outputAtDt50W,
      exponentN: p.exponentN,
      flowC: ctx.flowC,
      returnC: ctx.flowC - deltaTK,
      roomC: p.roomTemperatureC,
    });
  } catch {
    return null;
  }
}

export function ratedSourceW(ctx: EngineContext): number {
  let w = 0;
  for (const p of ctx.doc.parts) if (p.type === "heat-pump" || p.type === "boiler") w += p.props.ratedOutputKw * 1000;
  return w;
}

function loadPowerW(ctx: EngineContext, part: Part, mode: "heating" | "hot-water", dT: number, hasDiverter: boolean): number | null {
  if (mode === "hot-water") return part.type === "cylinder" ? ratedSourceW(ctx) : 0;
  switch (part.type) {
    case "radiator":
      return part.props.heatLoadW ?? radiatorDesignOutputW(ctx, part, dT);
    case "ufh-loop":
    case "fan-coil":
    case "heat-load":
      return part.props.heatLoadW;
    case "cylinder":
      return hasDiverter ? 0 : part.props.coilOutputKw * 1000;
    default:
      return 0;
  }
}

export function designLoads(ctx: EngineContext, mode: "heating" | "hot-water"): DesignLoad[] {
  const { fluid, model, doc } = ctx;
  if (!fluid) return [];
  const out: DesignLoad[] = [];
  const hasDiverter = doc.parts.some((p) => p.type === "diverter-valve");
  const flowOf = (powerW: number, dT: number) =>
    flowForHeat({ powerW, deltaTK: dT, densityKgM3: fluid.densityKgM3, specificHeatJkgK: fluid.specificHeatJkgK }) * 3600;
  for (const link of model.links) {
    if (link.role !== "load" && link.role !== "header-primary") continue;
    const part = doc.parts[link.index]!;
    if (link.role === "header-primary") {
      // Primary pass: the heat source's rated output at the design ΔT (the source runs at its own flow).
      if (ctx.deltaTK === null || mode === "hot-water") continue;
      const w = ratedSourceW(ctx);
      if (w > 0) out.push({ id: part.id, link: model.links.indexOf(link), inNode: link.from, outNode: link.to, powerW: w, deltaTK: ctx.deltaTK, flowM3h: flowOf(w, ctx.deltaTK), header: true });
      continue;
    }
    const own = "deltaTK" in part.props ? (part.props as { deltaTK: number | null }).deltaTK : null;
    const dT = own ?? ctx.deltaTK;
    if (dT === null || !(dT > 0)) continue;
    const w = loadPowerW(ctx, part, mode, dT, hasDiverter);
    if (w === null) {
      ctx.findings.warning(
        "load.no-heat-load",
        `${partRegistry[part.type].label.toLowerCase()} ${part.id}: no heat load and no output at the design temperatures, so it gets no design flow`,
        [part.id],
      );
      continue;
    }
    if (w <= 0) continue;
    out.push({ id: part.id, link: -1, inNode: link.from, outNode: link.to, powerW: w, deltaTK: dT, flowM3h: flowOf(w, dT), header: false });
  }
  // link indices for loads (indexOf above is O(n) only for headers; resolve loads in one pass)
  const linkIndex = new Map<string, number>();
  model.links.forEach((l, k) => {
    if (l.role === "load") linkIndex.set(l.id, k);
  });
  for (const l of out) if (!l.header) l.link = linkIndex.get(l.id)!;
  return out;
}
