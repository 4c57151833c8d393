/**
 * The head-loss law of every model link for one network state. Two purposes:
 * - design: pumps are loss-free links and loads (and the header's primary
 *   pass) are cut — their flows enter as fixed node demands — so flows follow
 *   from continuity and heads give each circuit's pressure drop;
 * - simulate: pumps on their curves, loads as resistances, the dp-bypass at its
 *   opening pressure, closed valves as near-zero conductance.
 */
import { kvCoefficient, LAW, LinkTable, type Law } from "@/lib/hydraulics/network/behaviour";
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

/** A load's Kv device on link k: own law Kv (or zero for "no Kv"), cut (closed) in design. No closure per call. */
function setLoadKv(t: LinkTable, k: number, v: number | null, rho: number, solver: Law | undefined): void {
  t.c[k] = kvCoefficient(v, rho);
  t.set(k, solver ?? (v === null ? LAW.zero : LAW.kv), v === null ? LAW.zero : LAW.kv);
}

/** The Kv a part is sized with: the designer's, else the typical one (typical/resolve.ts); null: not counted. */
const kvOf = (ctx: EngineContext, index: number): number | null => {
  const kv = ctx.inputs.kv[index]!;
  return Number.isNaN(kv) ? null : kv;
};

function setLoad(ctx: EngineContext, t: LinkTable, k: number, index: number, design: boolean): void {
  const part = ctx.doc.parts[index]!;
  const rho = ctx.fluid!.densityKgM3;
  const solver = design ? LAW.closed : undefined;
  switch (part.type) {
    case "radiator":
      return setLoadKv(t, k, kvOf(ctx, index), rho, solver);
    case "ufh-loop": {
      const p = part.props;
      const g = { innerDiameterM: p.innerDiameterMm / 1000, roughnessM: UFH_ROUGHNESS_MM / 1000, lengthM: p.loopLengthM, sumK: 0 };
      return t.setPipe(k, g, solver ?? LAW.pipe);
    }
    case "fan-coil":
    case "heat-load":
      return setLoadKv(t, k, kvOf(ctx, index), rho, solver);
    case "cylinder":
      return setLoadKv(t, k, part.props.coilKv, rho, solver);
    default:
      t.set(k, solver ?? LAW.zero, LAW.zero);
  }
}

/** A two-port device's Kv law on link k (check valve: one way). */
function setDeviceKv(t: LinkTable, k: number, v: number | null, rho: number, check: boolean): void {
  t.c[k] = kvCoefficient(v, rho);
  t.set(k, check ? LAW.check : v === null ? LAW.zero : LAW.kv);
}

/** Set a two-port valve/device part (role "link") on link k. */
function setDevice(ctx: EngineContext, t: LinkTable, k: number, index: number, state: NetworkState, rho: number): void {
  const part = ctx.doc.parts[index]!;
  switch (part.type) {
    case "zone-valve":
      setDeviceKv(t, k, part.props.kvs, rho, false);
      if (!isOpen(part, state)) t.set(k, LAW.closed, t.own[k] as Law);
      return;
    case "isolation-valve":
      setDeviceKv(t, k, kvOf(ctx, index), rho, false);
      if (!isOpen(part, state)) t.set(k, LAW.closed, t.own[k] as Law);
      return;
    case "check-valve":
      return setDeviceKv(t, k, kvOf(ctx, index), rho, true);
    case "balancing-valve":
    case "strainer":
    case "magnetic-filter":
    case "heat-meter":
      return setDeviceKv(t, k, kvOf(ctx, index), rho, false);
    default:
      t.set(k, LAW.zero);
  }
}

/** The laws of every link for this state, as one LinkTable. */
export function buildLaws(ctx: EngineContext, state: NetworkState): LinkTable {
  const { fluid, model } = ctx;
  const rho = fluid!.densityKgM3;
  const design = state.purpose === "design";
  const t = new LinkTable(model.links.length, rho, fluid!.kinematicViscosityM2s);
  model.links.forEach((link, k) => {
    if (link.role === "pipe") {
      const g = ctx.pipeGeom[link.index];
      if (g) t.setPipe(k, g);
      else t.set(k, LAW.zero);
      return;
    }
    const part = ctx.doc.parts[link.index]!;
    switch (link.role) {
      case "heat-source": {
        const p = (part as PartOf<"heat-pump">).props;
        const c = kvCoefficient(kvOf(ctx, link.index), rho);
        const curve = usableCurve(p.pumpCurve);
        t.c[k] = c;
        if (curve) t.setPump(k, curve, c, design ? LAW.kv : LAW.pump);
        else t.set(k, LAW.kv);
        if (design) t.own[k] = LAW.kv;
        return;
      }
      case "pump": {
        const curve = usableCurve((part as PartOf<"pump">).props.curve);
        if (curve) t.setPump(k, curve, 0, design ? LAW.zero : LAW.pump);
        else t.set(k, LAW.zero);
        return;
      }
      case "link":
        return setDevice(ctx, t, k, link.index, state, rho);
      case "bypass": {
        const opening = state.bypassOpeningKpa.get(part.id) ?? null;
        t.c[k] = kvCoefficient((part as PartOf<"dp-bypass-valve">).props.kvs, rho);
        t.opening[k] = opening ?? 0;
        t.set(k, design || opening === null ? LAW.closed : LAW.bypass);
        return;
      }
      case "diverter-a":
      case "diverter-b": {
        const side = link.role === "diverter-a" ? "a" : "b";
        t.c[k] = kvCoefficient((part as PartOf<"diverter-valve">).props.kvs, rho);
        t.set(k, state.diverter.get(part.id) === side ? LAW.kv : LAW.closed, LAW.kv);
        return;
      }
      case "load":
        return setLoad(ctx, t, k, link.index, design);
      case "header-primary":
        return t.set(k, design ? LAW.closed : LAW.zero, LAW.zero);
      case "header-secondary":
        return t.set(k, design ? LAW.zero : LAW.closed, LAW.zero);
      case "header-top":
      case "header-bottom":
        return t.set(k, design ? LAW.closed : LAW.zero, LAW.zero);
    }
  });
  return t;
}

/**
 * The valve positions a state comes to — each zone and isolation valve open or shut, each
 * diverter's side — as one string: two states with equal keys are the same network but for
 * dp-bypass openings.
 */
export function valveStateKey(ctx: EngineContext, state: NetworkState): string {
  let key = state.mode;
  for (const part of ctx.doc.parts) {
    if (part.type === "zone-valve" || part.type === "isolation-valve") key += isOpen(part, state) ? "1" : "0";
    else if (part.type === "diverter-valve") key += state.diverter.get(part.id) ?? "-";
  }
  return key;
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
