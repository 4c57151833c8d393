/**
 * Presentation-only port positions of each symbol (the contract has port
 * names, not geometry). Sizes are in flow pixels at 100 %, multiples of the
 * 20 px grid where they can be, small enough that the seed plant rooms
 * (parts 100 px apart) do not overlap. A part's x/y is its symbol's centre.
 */
import type { PartType } from "@/lib/schematic";

export type Side = "left" | "right" | "top" | "bottom";
export interface PortSpot {
  side: Side;
  /** 0..1 along the side, from top (left/right) or from the left (top/bottom). */
  at: number;
}
export interface SymbolLayout {
  w: number;
  h: number;
  ports: Record<string, PortSpot>;
  /** Which orientations auto-orient may pick: big plant keeps its upright look. */
  turns: "all" | "flips";
}

const L = (at = 0.5): PortSpot => ({ side: "left", at });
const R = (at = 0.5): PortSpot => ({ side: "right", at });
const T = (at = 0.5): PortSpot => ({ side: "top", at });
const B = (at = 0.5): PortSpot => ({ side: "bottom", at });

const link = (h = 40): SymbolLayout => ({ w: 60, h, ports: { a: L(), b: R() }, turns: "all" });
const source = (w: number, h: number): SymbolLayout => ({ w, h, ports: { flow: R(0.3), return: R(0.7) }, turns: "flips" });
const emitter: SymbolLayout = { w: 80, h: 60, ports: { flow: T(0.25), return: B(0.75) }, turns: "flips" };
const header = (w: number): SymbolLayout => ({ w, h: 120, ports: { p1: L(0.25), p2: L(0.75), p3: R(0.25), p4: R(0.75) }, turns: "flips" });
const accessory = (spot: PortSpot, w = 40, h = 40): SymbolLayout => ({ w, h, ports: { connection: spot }, turns: "flips" });

const fixed: Record<Exclude<PartType, "manifold">, SymbolLayout> = {
  "heat-pump": source(100, 80),
  boiler: source(80, 100),
  pump: { w: 60, h: 60, ports: { in: L(), out: R() }, turns: "all" },
  "zone-valve": link(60),
  "diverter-valve": { w: 60, h: 60, ports: { ab: L(), a: R(), b: B() }, turns: "all" },
  "dp-bypass-valve": link(60),
  "balancing-valve": link(60),
  "isolation-valve": link(40),
  "check-valve": link(40),
  strainer: link(60),
  "magnetic-filter": { w: 60, h: 80, ports: { a: L(0.3), b: R(0.3) }, turns: "all" },
  "heat-meter": link(40),
  tee: { w: 40, h: 40, ports: { a: L(), b: R(), c: B() }, turns: "all" },
  "buffer-vessel": header(80),
  "low-loss-header": header(60),
  cylinder: { w: 80, h: 120, ports: { coilFlow: R(0.35), coilReturn: R(0.75) }, turns: "flips" },
  radiator: emitter,
  "ufh-loop": emitter,
  "fan-coil": emitter,
  "heat-load": emitter,
  "expansion-vessel": accessory(B(), 60, 80),
  "safety-valve": accessory(B(), 40, 60),
  "air-vent": accessory(B()),
  "drain-cock": accessory(T()),
  "pressure-gauge": accessory(B()),
  "temperature-sensor": accessory(B()),
  "filling-loop": accessory(L(), 80, 40),
};

/** Manifold width grows with its outlets p1…pN along the bottom. */
function manifoldLayout(outlets: number): SymbolLayout {
  const n = Math.max(1, outlets);
  const w = Math.max(80, 30 * (n + 1));
  const ports: Record<string, PortSpot> = { common: L() };
  for (let i = 1; i <= n; i++) ports[`p${i}`] = B((i + 0.5) / (n + 1.5));
  return { w, h: 40, ports, turns: "flips" };
}

const manifolds = new Map<number, SymbolLayout>();
export function layoutOf(type: PartType, props?: unknown): SymbolLayout {
  if (type !== "manifold") return fixed[type];
  const n = (props as { outlets?: number } | undefined)?.outlets ?? 2;
  let l = manifolds.get(n);
  if (!l) manifolds.set(n, (l = manifoldLayout(n)));
  return l;
}
