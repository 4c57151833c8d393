/**
 * A room's emitter at a flow temperature and design temperature drop, by the
 * engine's own formulas, so the check on the rooms page and the sizing of a
 * generated schematic agree:
 * - radiator: EN 442-2 characteristic with the logarithmic mean excess
 *   temperature (lib/hydraulics/emitters/en442.ts), return = flow − Δt;
 *   its lowest flow temperature solved in closed form (en442-inverse.ts);
 * - underfloor loop: EN 1264-2 basic characteristic q = 8.92·(θ_F,m − θ_i)^1.1
 *   (en1264.ts) with the mean floor surface at most min(surface limit, mean
 *   water temperature) — the engine's floor check (sizing/emitters.ts).
 */
import {
  en1264HeatFluxWm2,
  en1264SurfaceTemperatureC,
  en442FlowTemperatureForOutput,
  en442Output,
  en442RatingForOutput,
} from "@/lib/hydraulics/emitters";
import type { EmitterEntry, Room, RoomEmitter } from "./schema";

/** Exponent assumed for a radiator yet to be chosen (EN 442 panels ≈ 1.3, references.md §7). */
export const DEFAULT_EXPONENT_N = 1.3;

export interface Temperatures {
  flowC: number;
  deltaTK: number;
}

/** W the emitter gives; 0 when there is none or the return is not above the room. */
export function emitterOutputW(emitter: RoomEmitter | null, roomC: number, t: Temperatures): number {
  if (!emitter) return 0;
  if (emitter.kind === "ufh-loop") {
    const surfaceC = Math.min(emitter.maxSurfaceTemperatureC, t.flowC - t.deltaTK / 2);
    return emitter.floorAreaM2 * en1264HeatFluxWm2(surfaceC, roomC);
  }
  return radiatorOutputW(emitter.outputAtDt50W, emitter.exponentN, roomC, t);
}

export function radiatorOutputW(outputAtDt50W: number, exponentN: number, roomC: number, t: Temperatures): number {
  if (!(t.flowC - t.deltaTK > roomC)) return 0;
  return en442Output({ outputAtDt50W, exponentN, flowC: t.flowC, returnC: t.flowC - t.deltaTK, roomC });
}

/** Met, allowing for rounding in the last place (the solved lowest temperature counts as met). */
export const meets = (outputW: number, loadW: number) => outputW >= loadW * (1 - 1e-9);

/** Rating (Φ50, W) a radiator of exponent n needs to give the room's loss; null when the return is not above the room. */
export function neededRatingW(room: Room, t: Temperatures, exponentN = DEFAULT_EXPONENT_N): number | null {
  if (!(t.flowC - t.deltaTK > room.roomTemperatureC)) return null;
  return en442RatingForOutput({ outputW: room.heatLossW, exponentN, flowC: t.flowC, returnC: t.flowC - t.deltaTK, roomC: room.roomTemperatureC });
}

/**
 * The lowest flow temperature (°C) at which the room's emitter gives its loss,
 * at a fixed Δt; null when none does (no emitter, or a floor that would need a
 * surface above its limit).
 */
export function lowestFlowForRoomC(room: Room, deltaTK: number): number | null {
  const e = room.emitter;
  if (!e) return null;
  if (e.kind === "radiator") {
    return en442FlowTemperatureForOutput({ outputW: room.heatLossW, outputAtDt50W: e.outputAtDt50W, exponentN: e.exponentN, deltaTK, roomC: room.roomTemperatureC });
  }
  const surfaceC = en1264SurfaceTemperatureC(room.heatLossW / e.floorAreaM2, room.roomTemperatureC);
  return surfaceC > e.maxSurfaceTemperatureC ? null : surfaceC + deltaTK / 2;
}

/** The smallest entry of the firm's list (by rating, then length) that gives the room's loss at t. */
export function smallestListEmitter(list: readonly EmitterEntry[], room: Room, t: Temperatures): (EmitterEntry & { outputW: number }) | null {
  let best: (EmitterEntry & { outputW: number }) | null = null;
  for (const e of list) {
    const outputW = radiatorOutputW(e.outputAtDt50W, e.exponentN, room.roomTemperatureC, t);
    if (!meets(outputW, room.heatLossW)) continue;
    const smaller = !best || e.outputAtDt50W < best.outputAtDt50W
      || (e.outputAtDt50W === best.outputAtDt50W && (e.lengthMm ?? Infinity) < (best.lengthMm ?? Infinity));
    if (smaller) best = { ...e, outputW };
  }
  return best;
}
