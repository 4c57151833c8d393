/**
 * Each room's emitter(s) in the draft. A radiator that meets the room at the
 * plant's flow temperature is kept; one that falls short is, with
 * emitters "upsize", replaced by the firm list's smallest that meets it or
 * else by a radiator of the rating it needs (rounded up to 10 W); with "keep"
 * it stays and the shortfall is a finding. A room without an emitter gets one
 * as for upsizing. An underfloor room becomes one loop per ≤ 100 m of pipe
 * (rules.ts), sharing the room's loss and floor by area.
 */
import type { Finding } from "@/lib/schematic";
import { emitterOutputW, meets, neededRatingW, smallestListEmitter, DEFAULT_EXPONENT_N, type Temperatures } from "../emitter-output";
import type { EmitterEntry, Room } from "../schema";
import type { Plant } from "./plant";
import { ufhLoops } from "./rules";

export interface EmitterSlot {
  type: "radiator" | "ufh-loop";
  label: string;
  props: Record<string, unknown>;
}

const w = (x: number) => `${Math.round(x).toLocaleString("en")} W`;

function radiator(room: Room, label: string, outputAtDt50W: number, exponentN: number, waterVolumeL: number | null): EmitterSlot {
  return { type: "radiator", label, props: { outputAtDt50W, exponentN, roomTemperatureC: room.roomTemperatureC, heatLoadW: room.heatLossW, waterVolumeL } };
}

function replacement(room: Room, t: Temperatures, list: readonly EmitterEntry[], exponentN: number): { slot: EmitterSlot; what: string } {
  const pick = smallestListEmitter(list, room, t);
  if (pick) return { slot: radiator(room, `${room.name} — ${pick.name}`, pick.outputAtDt50W, pick.exponentN, pick.waterVolumeL), what: `${pick.name} from the firm's list (${w(pick.outputAtDt50W)} at ΔT 50, gives ${w(pick.outputW)})` };
  const need = Math.ceil(neededRatingW(room, t, exponentN)! / 10) * 10;
  return { slot: radiator(room, `${room.name} — new radiator ${w(need)} (ΔT 50)`, need, exponentN, null), what: `a radiator of ${w(need)} at ΔT 50 (none in the firm's list is large enough)` };
}

export function planEmitters(rooms: readonly Room[], plant: Plant, list: readonly EmitterEntry[]): { slots: Map<string, EmitterSlot[]>; findings: Finding[] } {
  const t: Temperatures = { flowC: plant.flowTemperatureC, deltaTK: plant.deltaTK };
  const temps = `${t.flowC}/${t.flowC - t.deltaTK} °C`;
  const slots = new Map<string, EmitterSlot[]>();
  const findings: Finding[] = [];
  const note = (severity: Finding["severity"], code: string, message: string) => findings.push({ severity, code, message, refs: [] });
  for (const room of rooms) {
    const e = room.emitter;
    if (e?.kind === "ufh-loop") {
      const split = e.loopLengthM ? { count: 1, loopLengthM: e.loopLengthM } : ufhLoops(e.floorAreaM2);
      slots.set(room.name, Array.from({ length: split.count }, (_, i) => ({
        type: "ufh-loop" as const,
        label: split.count > 1 ? `${room.name} — floor loop ${i + 1} of ${split.count}` : `${room.name} — floor loop`,
        props: { heatLoadW: room.heatLossW / split.count, floorAreaM2: e.floorAreaM2 / split.count, loopLengthM: split.loopLengthM,
          innerDiameterMm: e.innerDiameterMm, roomTemperatureC: room.roomTemperatureC, maxSurfaceTemperatureC: e.maxSurfaceTemperatureC },
      })));
      if (split.count > 1) note("info", "draft.ufh-loops", `${room.name}: ${e.floorAreaM2} m² of floor needs ${split.count} loops of about ${split.loopLengthM} m (150 mm spacing, ≤ 100 m a loop)`);
      const out = emitterOutputW(e, room.roomTemperatureC, t);
      if (!meets(out, room.heatLossW)) {
        note("warning", "draft.ufh-short", `${room.name}: the floor gives at most ${w(out)} at ${temps} against a loss of ${w(room.heatLossW)}; add a radiator or raise the flow temperature`);
      }
      continue;
    }
    if (!e) {
      const { slot, what } = replacement(room, t, list, DEFAULT_EXPONENT_N);
      slots.set(room.name, [slot]);
      note("info", "draft.emitter-added", `${room.name}: no emitter given; drawn with ${what}`);
      continue;
    }
    const out = emitterOutputW(e, room.roomTemperatureC, t);
    if (meets(out, room.heatLossW)) {
      slots.set(room.name, [radiator(room, room.name, e.outputAtDt50W, e.exponentN, e.waterVolumeL)]);
    } else if (plant.emitters === "keep") {
      slots.set(room.name, [radiator(room, room.name, e.outputAtDt50W, e.exponentN, e.waterVolumeL)]);
      note("warning", "draft.emitter-short", `${room.name}: the radiator (${w(e.outputAtDt50W)} at ΔT 50) gives ${w(out)} at ${temps}, ${w(room.heatLossW - out)} short of the room's ${w(room.heatLossW)}; kept as asked`);
    } else {
      const { slot, what } = replacement(room, t, list, e.exponentN);
      slots.set(room.name, [slot]);
      note("info", "draft.emitter-upsized", `${room.name}: the radiator (${w(e.outputAtDt50W)} at ΔT 50) gives ${w(out)} at ${temps} against ${w(room.heatLossW)}; drawn as ${what}`);
    }
  }
  return { slots, findings };
}
