/**
 * Network states: the valve positions of a mode or scenario. Heating mode:
 * diverters to their heating side, zone and isolation valves as drawn.
 * Hot-water mode: diverters to the cylinder.
 */
import { diverterSides, type DiverterSides } from "@/lib/hydraulics/network/diverters";
import type { EngineContext } from "./context";
import type { NetworkState } from "./laws";

/**
 * Diverter sides depend on the document and model only, which a calculation
 * never changes: worked out once per model, not once per state (every mode,
 * bypass sizing and scenario asks).
 */
const sidesOf = new WeakMap<object, Map<string, DiverterSides>>();

export function baseState(
  ctx: EngineContext,
  purpose: NetworkState["purpose"],
  mode: NetworkState["mode"],
  bypassOpeningKpa: ReadonlyMap<string, number | null> = new Map(),
): NetworkState {
  const diverter = new Map<string, "a" | "b">();
  let all = sidesOf.get(ctx.model);
  if (!all) sidesOf.set(ctx.model, (all = diverterSides(ctx.doc, ctx.model)));
  for (const [id, sides] of all) {
    diverter.set(id, mode === "hot-water" && sides.hotWater ? sides.hotWater : sides.heating);
  }
  return { purpose, mode, valveOpen: new Map(), diverter, bypassOpeningKpa };
}
