/**
 * First draft of a schematic from a project's rooms and a plant choice: a
 * pure function (no clock, no randomness, no I/O). It draws the plant room
 * (plant-room.ts) and the zones with each room's emitter (emitters.ts,
 * zones.ts) in the contract format, estimates every pipe's length by the
 * stated rule (rules.ts), sizes pipes, valves, pumps, vessel and bypass with
 * the engine's own answers (size.ts), and returns the document, its final
 * results and the draft's own findings (choices a designer should know of).
 */
import type { Finding, Results, Schematic } from "@/lib/schematic";
import { roomsDocSchema, type EmitterEntry, type Room } from "../schema";
import { DraftBuilder } from "./builder";
import { planEmitters } from "./emitters";
import { plantRoomIssues, plantSchema, type PathIssue, type Plant } from "./plant";
import { drawPlantRoom } from "./plant-room";
import { HOT_WATER_FLOW_C } from "./rules";
import { sizeDraft } from "./size";
import { drawZones, type DraftZone } from "./zones";
import { formatPath } from "@/lib/schematic";

export { plantSchema, type Plant, type PlantInput } from "./plant";

export interface Draft {
  schematic: Schematic;
  results: Results;
  /** The generator's own notes: emitters replaced or kept short, heat source against the total loss, … */
  findings: Finding[];
}

export type DraftOutcome = { ok: true; draft: Draft } | { ok: false; issues: PathIssue[] };

const kw = (w: number) => `${(w / 1000).toFixed(1)} kW`;

function planFindings(rooms: readonly Room[], plant: Plant): Finding[] {
  const out: Finding[] = [];
  const totalW = rooms.reduce((s, r) => s + r.heatLossW, 0);
  const ratedW = plant.heatSource.ratedOutputKw * 1000;
  const word = plant.heatSource.kind === "heat-pump" ? "heat pump" : "boiler";
  if (ratedW < totalW) {
    out.push({ severity: "warning", code: "draft.heat-source-small", message: `the ${word}'s ${kw(ratedW)} is below the rooms' total heat loss of ${kw(totalW)}: it cannot hold every room at design conditions; choose a larger one or check the losses`, refs: ["hs"] });
  }
  // A heat source with no Kv: the engine itself says what it assumes (a typical value for a heat
  // pump, the head excluding it for a boiler), so the draft adds no finding of its own.
  return out;
}

/** Parse and check the inputs (JSON paths in every message), then generate. */
export function generateDraft(roomsInput: unknown, plantInput: unknown, options: { name?: string; emitterList?: readonly EmitterEntry[] } = {}): DraftOutcome {
  const rooms = roomsDocSchema.safeParse(roomsInput);
  const plant = plantSchema.safeParse(plantInput);
  const issues: PathIssue[] = [];
  const add = (prefix: string, e: { issues: { path: PropertyKey[]; message: string }[] }) => {
    for (const i of e.issues) {
      const path = formatPath([prefix, ...i.path].filter((p) => p !== ""));
      issues.push({ path, message: `${path}: ${i.message}` });
    }
  };
  if (!rooms.success) add("", rooms.error);
  if (!plant.success) add("plant", plant.error);
  if (issues.length) return { ok: false, issues };
  const cross = plantRoomIssues(plant.data!, rooms.data!.rooms);
  if (cross.length) return { ok: false, issues: cross };
  return { ok: true, draft: draw(rooms.data!.rooms, plant.data!, options.name ?? "First draft from rooms", options.emitterList ?? []) };
}

function draw(rooms: readonly Room[], plant: Plant, name: string, list: readonly EmitterEntry[]): Draft {
  const { slots, findings } = planEmitters(rooms, plant, list);
  const byName = new Map(rooms.map((r) => [r.name.toLowerCase(), r]));
  const zones: DraftZone[] = plant.zones.map((z) => ({
    name: z.name,
    emitters: z.rooms.flatMap((n) => {
      const room = byName.get(n.toLowerCase())!;
      return slots.get(room.name)!.map((slot) => ({ room, slot }));
    }),
  }));
  const b = new DraftBuilder();
  drawZones(b, zones, drawPlantRoom(b, plant));
  const cylinder = plant.hotWaterCylinderL !== null;
  const doc = {
    format: "loopwright/schematic",
    version: 1,
    name,
    fluid: { kind: "water" },
    design: {
      flowTemperatureC: plant.flowTemperatureC,
      returnTemperatureC: plant.flowTemperatureC - plant.deltaTK,
      safetyValveBar: 3,
      staticHeightM: plant.staticHeightM,
      maxVelocityMps: 1,
      targetGradientPaPerM: 250,
      maxFlowTemperatureC: cylinder ? Math.max(plant.flowTemperatureC, HOT_WATER_FLOW_C[plant.heatSource.kind]) : null,
    },
    parts: b.parts,
    pipes: b.pipes,
  };
  const sized = sizeDraft(doc, plant.heatSource.minFlowM3h);
  return { schematic: sized.doc, results: sized.results, findings: [...planFindings(rooms, plant), ...findings, ...sized.findings] };
}
