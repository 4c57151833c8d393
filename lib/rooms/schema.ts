/**
 * Rooms of a project and the firm's emitter list: zod schemas, the one place
 * their fields, units and limits are defined. Field names are the contract's
 * part props (schematic-format.md): roomTemperatureC, outputAtDt50W,
 * exponentN, floorAreaM2, loopLengthM … so a room's emitter maps onto a
 * radiator or ufh-loop part without renaming.
 */
import { z } from "zod";

/** Most rooms one project holds: a large building's survey, well above a house (≈ 5–30 rooms). */
export const MAX_ROOMS = 500;
/** Most rows of a firm's emitter list. */
export const MAX_EMITTERS = 2000;

const num = () => z.number({ error: "must be a number" });

export const radiatorEmitterSchema = z.object({
  kind: z.literal("radiator"),
  outputAtDt50W: num().positive("must be more than 0 W").max(100_000, "at most 100,000 W")
    .describe("EN 442 output at ΔT 50 K (75/65/20 °C), W"),
  exponentN: num().min(1, "must be between 1 and 2").max(2, "must be between 1 and 2").default(1.3)
    .describe("EN 442 exponent n (≈ 1.3 panels)"),
  waterVolumeL: num().min(0).max(1000).nullable().default(null).describe("water content, L (null: not known)"),
});

export const ufhEmitterSchema = z.object({
  kind: z.literal("ufh-loop"),
  floorAreaM2: num().positive("must be more than 0 m²").max(10_000).describe("heated floor area, m²"),
  loopLengthM: num().positive().max(1000).nullable().default(null).describe("loop length, m (null: estimated)"),
  innerDiameterMm: num().min(4).max(100).default(12).describe("loop pipe inner diameter, mm"),
  maxSurfaceTemperatureC: num().min(15).max(45).default(29)
    .describe("floor surface limit, °C (EN 1264: 29 occupied zone)"),
});

export const roomEmitterSchema = z.discriminatedUnion("kind", [radiatorEmitterSchema, ufhEmitterSchema], {
  error: "must be radiator or ufh-loop",
});

export const roomSchema = z.object({
  name: z.string().trim().min(1, "give the room a name").max(80, "at most 80 characters"),
  roomTemperatureC: num().min(5, "must be between 5 and 35 °C").max(35, "must be between 5 and 35 °C"),
  heatLossW: num().positive("must be more than 0 W").max(100_000, "at most 100,000 W per room"),
  floorAreaM2: num().positive("must be more than 0 m²").max(10_000).nullable().default(null),
  emitter: roomEmitterSchema.nullable().default(null),
});

export const roomsDocSchema = z
  .object({
    rooms: z.array(roomSchema).max(MAX_ROOMS, `at most ${MAX_ROOMS} rooms per project`),
  })
  .superRefine((doc, ctx) => {
    const seen = new Map<string, number>();
    doc.rooms.forEach((r, i) => {
      const key = r.name.toLowerCase();
      if (seen.has(key)) {
        ctx.addIssue({ code: "custom", path: ["rooms", i, "name"], message: `'${r.name}' is used by room ${seen.get(key)! + 1} too; room names must differ` });
      } else seen.set(key, i);
    });
  });

export const emitterEntrySchema = z.object({
  name: z.string().trim().min(1, "give the emitter a name").max(120),
  type: z.string().trim().max(60).default(""),
  heightMm: num().positive().max(5000).nullable().default(null),
  lengthMm: num().positive().max(10_000).nullable().default(null),
  outputAtDt50W: radiatorEmitterSchema.shape.outputAtDt50W,
  exponentN: radiatorEmitterSchema.shape.exponentN,
  waterVolumeL: radiatorEmitterSchema.shape.waterVolumeL,
});

export const emitterListSchema = z.object({
  emitters: z.array(emitterEntrySchema).max(MAX_EMITTERS, `at most ${MAX_EMITTERS} emitters in the list`),
});

export type RoomEmitter = z.output<typeof roomEmitterSchema>;
export type Room = z.output<typeof roomSchema>;
export type RoomInput = z.input<typeof roomSchema>;
export type RoomsDoc = z.output<typeof roomsDocSchema>;
export type EmitterEntry = z.output<typeof emitterEntrySchema>;
