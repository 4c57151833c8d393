/**
 * Site events as the phone makes them and POST /api/v1/schematics/{id}/site/events
 * takes them: {id (uuid, made on the phone), kind, target?, data, madeAt}. Each kind's
 * data is checked here (client-safe, so the phone checks a form before it queues it).
 * Readings carry their unit; a reading of a kind or unit not listed is refused,
 * naming the field. A correction is a new event whose data names the one it corrects.
 */
import { z } from "zod";
import { flowUnits, pressureUnits } from "@/lib/units/display";

export const MAX_EVENTS_PER_BATCH = 500;

const text = (max: number) => z.string().trim().max(max);
const bar = (what: string) => z.number().min(0).max(60).describe(`${what}, bar gauge`);
const when = z.iso.datetime({ offset: true, error: "a date and time like 2026-05-04T09:30:00Z" });
const corrects = z.uuid({ error: "the id of the record this one corrects" }).optional();

export const pressureTestData = z.object({
  medium: z.enum(["water", "air", "inert-gas"]),
  testPressureBar: z.number().positive().max(60),
  startPressureBar: bar("reading at the start"),
  endPressureBar: bar("reading at the end"),
  startedAt: when,
  endedAt: when,
  ambientStartC: z.number().min(-40).max(60),
  ambientEndC: z.number().min(-40).max(60),
  witness: text(120).min(1, "who witnessed the test"),
  notes: text(1000).optional(),
  corrects,
}).refine((d) => Date.parse(d.endedAt) > Date.parse(d.startedAt), { path: ["endedAt"], message: "must be after startedAt" });

export const fillData = z.object({
  stage: z.enum(["flush", "fill", "inhibitor", "glycol"]),
  method: text(200).optional(),
  product: text(120).optional(),
  /** measured concentration, % by volume (glycol) or % of the maker's dose (inhibitor) */
  measuredPercent: z.number().min(0).max(100).optional(),
  /** the inhibitor maker's dose as a % to compare with (the design names none) */
  dosePercent: z.number().min(0).max(100).optional(),
  fillPressureBar: bar("cold fill pressure measured").optional(),
  volumeL: z.number().min(0).max(1_000_000).optional(),
  notes: text(1000).optional(),
  corrects,
});

const target = text(120).min(1).optional();
export const readingSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("heat-source-flow"), value: z.number().min(0).max(10_000), unit: z.enum(flowUnits) }),
  z.object({ kind: z.literal("flow-temperature"), value: z.number().min(-20).max(110), unit: z.literal("°C") }),
  z.object({ kind: z.literal("return-temperature"), value: z.number().min(-20).max(110), unit: z.literal("°C") }),
  z.object({ kind: z.literal("bypass-opening"), value: z.number().min(0).max(10_000), unit: z.enum(pressureUnits), target }),
  z.object({ kind: z.literal("pump-head"), value: z.number().min(0).max(10_000), unit: z.enum(pressureUnits), target: text(120).min(1), setting: text(120).optional() }),
  z.object({ kind: z.literal("vessel-precharge"), value: z.number().min(0).max(60), unit: z.enum(["bar", "kPa"]), target }),
  z.object({ kind: z.literal("safety-valve-test"), value: z.boolean(), unit: z.literal("lifted and reseated").optional(), target }),
], { error: "kind must be one of heat-source-flow, flow-temperature, return-temperature, bypass-opening, pump-head, vessel-precharge, safety-valve-test" });
export type Reading = z.output<typeof readingSchema>;

export const commissioningData = z.object({
  readings: z.array(readingSchema).min(1, "at least one reading").max(40),
  notes: text(1000).optional(),
  corrects,
});

export const noteData = z.object({ text: text(2000).min(1, "write the note") });

const envelope = {
  id: z.uuid({ error: "each event needs its own uuid" }),
  madeAt: when,
};

export const siteEventSchema = z.discriminatedUnion("kind", [
  z.object({ ...envelope, kind: z.literal("tick"), target: text(120).min(1, "which pipe or part"), data: z.object({}).loose().prefault({}) }),
  z.object({ ...envelope, kind: z.literal("untick"), target: text(120).min(1, "which pipe or part"), data: z.object({}).loose().prefault({}) }),
  z.object({ ...envelope, kind: z.literal("pressure-test"), target: z.null().optional(), data: pressureTestData }),
  z.object({ ...envelope, kind: z.literal("fill"), target: z.null().optional(), data: fillData }),
  z.object({ ...envelope, kind: z.literal("commissioning"), target: z.null().optional(), data: commissioningData }),
  z.object({ ...envelope, kind: z.literal("note"), target: text(120).min(1).nullable().optional(), data: noteData }),
], { error: "kind must be tick, untick, pressure-test, fill, commissioning or note" });

export type SiteEvent = z.output<typeof siteEventSchema>;
export type SiteEventKind = SiteEvent["kind"];
export type PressureTestData = z.output<typeof pressureTestData>;
export type FillData = z.output<typeof fillData>;
export type CommissioningData = z.output<typeof commissioningData>;

/** The batch envelope: a list, at most MAX_EVENTS_PER_BATCH long (checked before any event). */
export const eventBatchSchema = z.object({ events: z.array(z.unknown()) });

export type EventResult =
  | { id: string | null; status: "applied" | "duplicate" }
  | { id: string | null; status: "error"; error: string; issues?: { path: string; message: string }[] };
