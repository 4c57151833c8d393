/**
 * Network states: the valve positions of a mode or scenario. Heating mode:
 * diverters to their heating side, zone and isolation valves as drawn.
 * Hot-water mode: diverters to the cylinder.
 */
import { diverterSides } from "@/lib/hydraulics/network/diverters";
import type { EngineContext } from "./context";
import type { NetworkState } from "./laws";

export function baseState(
  ctx: EngineContext,
  purpose: NetworkState["purpose"],
  mode: NetworkState["mode"],
  bypassOpeningKpa: ReadonlyMap<string, number | null> = new Map(),
): NetworkState {
  const diverter = new Map<string, "a" | "b">();
  for (const [id, sides] of diverterSides(ctx.doc, ctx.model)) {
    diverter.set(id, mode === "hot-water" && sides.hotWater ? sides.hotWater : sides.heating);
  }
  return { purpose, mode, valveOpen: new Map(), diverter, bypassOpeningKpa };
}
