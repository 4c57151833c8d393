/**
 * The head-loss law of every model link for one network state. Two purposes:
 * - design: pumps are loss-free links and loads (and the header's primary
 *   pass) are cut — their flows enter as fixed node demands — so flows follow
 *   from continuity and heads give each circuit's pressure drop;
 * - simulate: pumps on their curves, loads as resistances, the dp-bypass at its
 *   opening pressure, closed valves as near-zero conductance.
 */
import {
  bypassLaw,
  closed,
  kvLaw,
  oneWay,
  pipeLaw,
  pumpLaw,
  zeroLoss,
} from "@/lib/hydraulics/network/behaviour";
import type { Evaluate } from "@/lib/hydraulics/network/gga";
import type { ModelLink } from "@/lib/hydraulics/network/model";
import { pumpCurveIssues, type PumpCurve } from "@/lib/hydraulics/pumps/curve";
import type { Part, PartOf } from "@/lib/schematic/schema";
import type { EngineContext } from "./context";

/** PE-X loop roughness, mm (DIN 1988-300 plastic pipe, references.md §3.3). */
const UFH_ROUGHNESS_MM = 0.007;

export interface NetworkState {
  purpose: "design" | "simulate";
  mode: "heating" | "hot-water";
  /** zone and isolation valves: open? (default: as drawn) */
  valveOpen: ReadonlyMap<string, boolean>;
  /** diverter id → side joined to ab */
  diverter: ReadonlyMap<string, "a" | "b">;
  /** dp-bypass id → opening used when simulating (null: treated as shut) */
  bypassOpeningKpa: ReadonlyMap<string, number | null>;
}

/** A curve the pump module can evaluate (flows rising, ≥ 3 points), else null. */
export function usableCurve(curve: PumpCurve | null | undefined): PumpCurve | null {
  if (!curve) return null;
  return pumpCurveIssues(curve).some((m) => !m.startsWith("head rises")) ? null : curve;
}

function isOpen(part: Part, state: NetworkState): boolean {
  const drawn = "open" in part.props ? (part.props as { open: boolean }).open : true;
  return state.valveOpen.get(part.id) ?? drawn;
}

/** Law of a load's own resistance (used when simulating, and for its Δp at design flow). */
export function loadLaw(ctx: EngineContext, part: Part): Evaluate {
  const rho = ctx.fluid!.densityKgM3;
  switch (part.type) {
    case "radiator":
      return kvLaw(part.props.valveKv, rho);
    case "ufh-loop": {
      const p = (part as PartOf<"ufh-loop">).props;
      return pipeLaw(
        { innerDiameterM: p.innerDiameterMm / 1000, roughnessM: UFH_ROUGHNESS_MM / 1000, lengthM: p.loopLengthM, sumK: 0 },
        rho,
        ctx.fluid!.kinematicViscosityM2s,
      );
    }
    case "fan-coil":
    case "heat-load":
      return kvLaw(part.props.kv, rho);
    case "cylinder":
      return kvLaw(part.props.coilKv, rho);
    default:
      return zeroLoss;
  }
}

/** Law of a two-port valve/device part (role "link"). */
function deviceLaw(part: Part, state: NetworkState, rho: number): Evaluate {
  switch (part.type) {
    case "zone-valve":
      return isOpen(part, state) ? kvLaw(part.props.kvs, rho) : closed;
    case "isolation-valve":
      return isOpen(part, state) ? kvLaw(part.props.kv, rho) : closed;
    case "check-valve":
      return oneWay(kvLaw(part.props.kv, rho));
    case "balancing-valve":
    case "strainer":
    case "heat-meter":
      return kvLaw(part.props.kv, rho);
    default:
      return zeroLoss;
  }
}

export function linkLaw(ctx: EngineContext, link: ModelLink, state: NetworkState): Evaluate {
  const rho = ctx.fluid!.densityKgM3;
  const design = state.purpose === "design";
  if (link.role === "pipe") {
    const g = ctx.pipeGeom[link.index];
    return g ? pipeLaw(g, rho, ctx.fluid!.kinematicViscosityM2s) : zeroLoss;
  }
  const part = ctx.doc.parts[link.index]!;
  switch (link.role) {
    case "heat-source": {
      const p = (part as PartOf<"heat-pump">).props;
      const hx = kvLaw(p.kv, rho);
      const curve = usableCurve(p.pumpCurve);
      return !design && curve ? pumpLaw(curve, hx) : hx;
    }
    case "pump": {
      const curve = usableCurve((part as PartOf<"pump">).props.curve);
      return !design && curve ? pumpLaw(curve) : zeroLoss;
    }
    case "link":
      return deviceLaw(part, state, rho);
    case "bypass": {
      const opening = state.bypassOpeningKpa.get(part.id) ?? null;
      if (design || opening === null) return closed;
      return bypassLaw(opening, (part as PartOf<"dp-bypass-valve">).props.kvs, rho);
    }
    case "diverter-a":
    case "diverter-b": {
      const side = link.role === "diverter-a" ? "a" : "b";
      const kvs = (part as PartOf<"diverter-valve">).props.kvs;
      return state.diverter.get(part.id) === side ? kvLaw(kvs, rho) : closed;
    }
    case "load":
      return design ? closed : loadLaw(ctx, part);
    case "header-primary":
      return design ? closed : zeroLoss;
    case "header-secondary":
      return design ? zeroLoss : closed;
    case "header-top":
    case "header-bottom":
      return design ? closed : zeroLoss;
  }
}

/** True when the link is cut (no flow possible) in this state. */
export function isCut(ctx: EngineContext, link: ModelLink, state: NetworkState): boolean {
  if (link.role === "pipe") return false;
  const part = ctx.doc.parts[link.index]!;
  const design = state.purpose === "design";
  switch (link.role) {
    case "link":
      return (part.type === "zone-valve" || part.type === "isolation-valve") && !isOpen(part, state);
    case "bypass":
      return design || (state.bypassOpeningKpa.get(part.id) ?? null) === null;
    case "diverter-a":
      return state.diverter.get(part.id) !== "a";
    case "diverter-b":
      return state.diverter.get(part.id) !== "b";
    case "load":
    case "header-primary":
    case "header-top":
    case "header-bottom":
      return design;
    case "header-secondary":
      return !design;
    default:
      return false;
  }
}
