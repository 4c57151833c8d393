/**
 * The flow-temperature check of a project's rooms: at a design flow
 * temperature and temperature drop Δt, each room's emitter output against its
 * heat loss, the shortfall, the rating an emitter would need and the smallest
 * emitter of the firm's list that meets it; the lowest flow temperature at
 * which every room is met (each room's own lowest, solved in closed form —
 * emitter-output.ts — and the highest of them); and the share of rooms and of
 * heat met from 35 to 75 °C for the chart.
 */
import {
  emitterOutputW,
  lowestFlowForRoomC,
  meets,
  neededRatingW,
  smallestListEmitter,
  type Temperatures,
} from "./emitter-output";
import type { EmitterEntry, Room } from "./schema";

export const CHART_FROM_C = 35;
export const CHART_TO_C = 75;

export interface RoomCheck {
  name: string;
  heatLossW: number;
  outputW: number;
  shortfallW: number;
  met: boolean;
  /** Φ50 (W) a radiator of the room's exponent (or 1.3) needs here; null for a floor loop or when the return is not above the room. */
  neededOutputAtDt50W: number | null;
  /** The firm list's smallest emitter that meets the room here (radiator rooms and rooms without an emitter). */
  suggested: { name: string; outputAtDt50W: number; exponentN: number; outputW: number } | null;
  /** The room's own lowest flow temperature at this Δt, °C; null when none meets it. */
  lowestFlowTemperatureC: number | null;
  note: string | null;
}

export interface FlowCheck {
  flowC: number;
  deltaK: number;
  rooms: RoomCheck[];
  /** Highest of the rooms' own lowest flow temperatures; null when some room is met at none. */
  lowestFlowTemperatureC: number | null;
  /** The room that sets it (or the first that no temperature meets). */
  limitingRoom: string | null;
  curve: { flowC: number; roomsMetPercent: number; heatMetPercent: number }[];
}

function note(room: Room, t: Temperatures, lowest: number | null): string | null {
  const returnC = t.flowC - t.deltaTK;
  if (!room.emitter) return "no emitter yet: choose one of the needed rating";
  if (room.emitter.kind === "ufh-loop") {
    return lowest === null ? `the floor would need a surface above its ${room.emitter.maxSurfaceTemperatureC} °C limit at any flow temperature: add a radiator or reduce the loss` : null;
  }
  if (!(returnC > room.roomTemperatureC)) return `the return (${returnC} °C) is not above the room's ${room.roomTemperatureC} °C, so a radiator gives no heat`;
  return null;
}

export function checkRoom(room: Room, t: Temperatures, list: readonly EmitterEntry[]): RoomCheck {
  const outputW = emitterOutputW(room.emitter, room.roomTemperatureC, t);
  const radiatorRoom = room.emitter?.kind !== "ufh-loop";
  const exponentN = room.emitter?.kind === "radiator" ? room.emitter.exponentN : undefined;
  const lowest = lowestFlowForRoomC(room, t.deltaTK);
  const s = radiatorRoom ? smallestListEmitter(list, room, t) : null;
  return {
    name: room.name,
    heatLossW: room.heatLossW,
    outputW,
    shortfallW: Math.max(0, room.heatLossW - outputW),
    met: meets(outputW, room.heatLossW),
    neededOutputAtDt50W: radiatorRoom ? neededRatingW(room, t, exponentN) : null,
    suggested: s && { name: s.name, outputAtDt50W: s.outputAtDt50W, exponentN: s.exponentN, outputW: s.outputW },
    lowestFlowTemperatureC: lowest,
    note: note(room, t, lowest),
  };
}

export function flowTemperatureCheck(rooms: readonly Room[], t: Temperatures, list: readonly EmitterEntry[] = []): FlowCheck {
  const checks = rooms.map((r) => checkRoom(r, t, list));
  let lowest: number | null = rooms.length ? -Infinity : null;
  let limiting: string | null = null;
  for (const c of checks) {
    if (c.lowestFlowTemperatureC === null) {
      lowest = null;
      limiting = c.name;
      break;
    }
    if (c.lowestFlowTemperatureC > lowest!) {
      lowest = c.lowestFlowTemperatureC;
      limiting = c.name;
    }
  }
  const totalW = rooms.reduce((s, r) => s + r.heatLossW, 0);
  const curve = [];
  for (let f = CHART_FROM_C; f <= CHART_TO_C; f++) {
    let met = 0;
    let heat = 0;
    for (const r of rooms) {
      const out = emitterOutputW(r.emitter, r.roomTemperatureC, { flowC: f, deltaTK: t.deltaTK });
      if (meets(out, r.heatLossW)) met++;
      heat += Math.min(out, r.heatLossW);
    }
    curve.push({ flowC: f, roomsMetPercent: rooms.length ? (100 * met) / rooms.length : 0, heatMetPercent: totalW ? (100 * heat) / totalW : 0 });
  }
  return { flowC: t.flowC, deltaK: t.deltaTK, rooms: checks, lowestFlowTemperatureC: lowest, limitingRoom: limiting, curve };
}
