/**
 * The plant choice a first draft is generated from, and its checks against
 * the rooms (every room in exactly one zone, names that exist, a return
 * warmer than every radiator room). Issues name the JSON path, as
 * parseSchematic's do.
 */
import { z } from "zod";
import type { Room } from "../schema";

export const MAX_ZONES = 20;

const num = () => z.number({ error: "must be a number" });

export const plantSchema = z.object({
  heatSource: z.object({
    kind: z.enum(["heat-pump", "boiler"], { error: "must be heat-pump or boiler" }),
    ratedOutputKw: num().positive("must be more than 0 kW").max(1000, "at most 1000 kW"),
    minFlowM3h: num().min(0, "must be 0 or more").max(100).default(0),
    kv: num().min(0.001).max(1000).nullable().default(null).describe("heat exchanger resistance, Kv (null: not known)"),
    waterVolumeL: num().min(0).max(10_000).default(0),
    minSystemVolumeL: num().min(0).max(100_000).nullable().default(null),
  }),
  flowTemperatureC: num().min(25, "must be between 25 and 90 °C").max(90, "must be between 25 and 90 °C"),
  deltaTK: num().min(1, "must be between 1 and 30 K").max(30, "must be between 1 and 30 K"),
  zones: z.array(z.object({
    name: z.string().trim().min(1, "give the zone a name").max(60),
    rooms: z.array(z.string().trim().min(1)).min(1, "a zone needs at least one room"),
  })).min(1, "at least one zone").max(MAX_ZONES, `at most ${MAX_ZONES} zones`),
  hotWaterCylinderL: num().min(30, "a cylinder of 30 L or more, or null for none").max(5000).nullable().default(null),
  separation: z.enum(["bypass", "buffer", "low-loss-header"], { error: "must be bypass, buffer or low-loss-header" }).default("bypass"),
  emitters: z.enum(["upsize", "keep"], { error: "must be upsize or keep" }).default("upsize"),
  staticHeightM: num().min(0).max(100).default(5).describe("static height above the expansion vessel, m"),
});

export type Plant = z.output<typeof plantSchema>;
export type PlantInput = z.input<typeof plantSchema>;
export interface PathIssue {
  path: string;
  message: string;
}

/** Cross-checks of a parsed plant against the rooms. */
export function plantRoomIssues(plant: Plant, rooms: readonly Room[]): PathIssue[] {
  const issues: PathIssue[] = [];
  if (rooms.length === 0) issues.push({ path: "rooms", message: "rooms: no rooms to draw; add or import rooms first" });
  const byName = new Map(rooms.map((r) => [r.name.toLowerCase(), r]));
  const zoneOf = new Map<string, number>();
  plant.zones.forEach((z, zi) => {
    z.rooms.forEach((name, ri) => {
      const path = `plant.zones[${zi}].rooms[${ri}]`;
      const key = name.toLowerCase();
      if (!byName.has(key)) issues.push({ path, message: `${path}: no room named '${name}'` });
      else if (zoneOf.has(key)) issues.push({ path, message: `${path}: '${name}' is already in zone '${plant.zones[zoneOf.get(key)!]!.name}'; a room belongs to one zone` });
      else zoneOf.set(key, zi);
    });
  });
  const missing = rooms.filter((r) => !zoneOf.has(r.name.toLowerCase())).map((r) => `'${r.name}'`);
  if (missing.length) issues.push({ path: "plant.zones", message: `plant.zones: ${missing.slice(0, 5).join(", ")}${missing.length > 5 ? ` and ${missing.length - 5} more` : ""} ${missing.length === 1 ? "is" : "are"} in no zone` });
  const returnC = plant.flowTemperatureC - plant.deltaTK;
  const cold = rooms.filter((r) => r.emitter?.kind !== "ufh-loop" && !(returnC > r.roomTemperatureC));
  if (cold.length) {
    const r = cold[0]!;
    issues.push({ path: "plant.flowTemperatureC", message: `plant.flowTemperatureC: the return (${plant.flowTemperatureC} − ${plant.deltaTK} = ${returnC} °C) is not above the ${r.roomTemperatureC} °C of '${r.name}'${cold.length > 1 ? ` and ${cold.length - 1} more` : ""}, so a radiator there gives no heat; raise the flow temperature` });
  }
  return issues;
}
