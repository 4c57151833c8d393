/**
 * The rooms table's rows: every cell as the text being typed, turned into the
 * rooms document (lib/rooms/schema.ts) to validate and save. Fields a row does
 * not show (water content, loop length, surface limit) ride along unchanged.
 */
import { roomsDocSchema, type Room } from "@/lib/rooms/schema";

export const columns = [
  { key: "name", label: "Room", width: "w-40" },
  { key: "roomTemperatureC", label: "Room °C", width: "w-16" },
  { key: "heatLossW", label: "Heat loss W", width: "w-20" },
  { key: "floorAreaM2", label: "Floor m²", width: "w-16" },
  { key: "kind", label: "Emitter", width: "w-28" },
  { key: "outputAtDt50W", label: "Φ50 W", width: "w-20" },
  { key: "exponentN", label: "n", width: "w-14" },
  { key: "emitterFloorAreaM2", label: "Loop m²", width: "w-16" },
] as const;
export type ColumnKey = (typeof columns)[number]["key"];

export type RoomRow = Record<ColumnKey, string> & { key: string; extra: Record<string, unknown> };

const text = (n: number | null | undefined) => (n === null || n === undefined ? "" : String(n));
let counter = 0;
export const newKey = () => `row-${++counter}`;

export function roomToRow(r: Room): RoomRow {
  const e = r.emitter;
  const { kind: _k, ...extra } = e ?? { kind: "" };
  return {
    key: newKey(), name: r.name, roomTemperatureC: text(r.roomTemperatureC), heatLossW: text(r.heatLossW), floorAreaM2: text(r.floorAreaM2),
    kind: e?.kind ?? "", outputAtDt50W: e?.kind === "radiator" ? text(e.outputAtDt50W) : "", exponentN: e?.kind === "radiator" ? text(e.exponentN) : "",
    emitterFloorAreaM2: e?.kind === "ufh-loop" ? text(e.floorAreaM2) : "", extra,
  };
}

export const emptyRow = (): RoomRow => ({
  key: newKey(), name: "", roomTemperatureC: "20", heatLossW: "", floorAreaM2: "", kind: "radiator", outputAtDt50W: "", exponentN: "1.3", emitterFloorAreaM2: "", extra: {},
});

/** "" → null; a number's text → the number; anything else stays text so the schema says "must be a number". */
const num = (s: string): number | string | null => (s.trim() === "" ? null : Number.isFinite(Number(s)) ? Number(s) : s);

export function rowToRoom(r: RoomRow): unknown {
  const { waterVolumeL, loopLengthM, innerDiameterMm, maxSurfaceTemperatureC } = r.extra as Record<string, unknown>;
  const emitter = r.kind === "radiator"
    ? { kind: "radiator", outputAtDt50W: num(r.outputAtDt50W), exponentN: num(r.exponentN) ?? undefined, waterVolumeL }
    : r.kind === "ufh-loop"
      ? { kind: "ufh-loop", floorAreaM2: num(r.emitterFloorAreaM2) ?? num(r.floorAreaM2), loopLengthM, innerDiameterMm, maxSurfaceTemperatureC }
      : null;
  return { name: r.name, roomTemperatureC: num(r.roomTemperatureC), heatLossW: num(r.heatLossW), floorAreaM2: num(r.floorAreaM2), emitter };
}

/** Which column a document path points at (rooms[i].emitter.floorAreaM2 is the loop's area). */
function columnOf(path: readonly PropertyKey[]): ColumnKey {
  const [, , field, sub] = path;
  if (field !== "emitter") return (columns.some((c) => c.key === field) ? field : "name") as ColumnKey;
  if (sub === "floorAreaM2") return "emitterFloorAreaM2";
  return (sub === "outputAtDt50W" || sub === "exponentN" ? sub : "kind") as ColumnKey;
}

/** Problems per row and column ("rowIndex:column" → message), from the same schema the server uses. */
export function rowProblems(rows: readonly RoomRow[]): Map<string, string> {
  const out = new Map<string, string>();
  const parsed = roomsDocSchema.safeParse({ rooms: rows.map(rowToRoom) });
  if (parsed.success) return out;
  for (const i of parsed.error.issues) {
    if (typeof i.path[1] !== "number") continue;
    const column = columnOf(i.path);
    const k = `${i.path[1]}:${column}`;
    const empty = (rows[i.path[1]]?.[column] ?? "").trim() === "";
    if (!out.has(k)) out.set(k, i.code === "invalid_type" && empty ? "needed" : i.message);
  }
  return out;
}
