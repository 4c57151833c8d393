/**
 * Rooms from and to CSV. One row per room; the columns below (headings are
 * matched without case, spaces or units, so "Heat loss (W)" finds heatLossW).
 * The emitter is a radiator (outputAtDt50W, exponentN) or an underfloor loop
 * (emitterFloorAreaM2, defaulting to the room's floor area), or none.
 */
import { cellsByField, guessMapping, mappingIssues, readCsv, readNumber, writeCsv, type CsvField, type CsvIssue, type Mapping } from "./csv-table";
import { MAX_ROOMS, roomSchema, type Room } from "./schema";

export const roomCsvFields: readonly CsvField[] = [
  { key: "name", label: "room name", required: true, synonyms: ["room", "room name", "space"] },
  { key: "roomTemperatureC", label: "design room temperature, °C", required: true, synonyms: ["room temperature", "design temperature", "temperature", "temp", "internal temperature"] },
  { key: "heatLossW", label: "design heat loss, W", required: true, synonyms: ["heat loss", "design heat loss", "heat loss w", "loss", "heat load"] },
  { key: "floorAreaM2", label: "floor area, m²", required: false, synonyms: ["floor area", "area", "area m2"] },
  { key: "emitterKind", label: "emitter: radiator, ufh-loop or blank", required: false, synonyms: ["emitter", "emitter type", "emitter kind", "type"] },
  { key: "outputAtDt50W", label: "radiator output at ΔT 50 (75/65/20 °C), W", required: false, synonyms: ["output at dt50", "dt50 output", "rated output", "output dt50", "radiator output", "output w"] },
  { key: "exponentN", label: "radiator exponent n (blank: 1.3)", required: false, synonyms: ["exponent", "n", "exponent n"] },
  { key: "waterVolumeL", label: "radiator water content, L", required: false, synonyms: ["water volume", "water content", "volume l"] },
  { key: "emitterFloorAreaM2", label: "underfloor loop floor area, m² (blank: the room's)", required: false, synonyms: ["loop area", "ufh area", "loop floor area"] },
];

const numericFields = ["roomTemperatureC", "heatLossW", "floorAreaM2", "outputAtDt50W", "exponentN", "waterVolumeL", "emitterFloorAreaM2"] as const;
const kindWords: Record<string, "radiator" | "ufh-loop" | "none"> = {
  radiator: "radiator", rad: "radiator", panel: "radiator", convector: "radiator",
  ufh: "ufh-loop", "ufh-loop": "ufh-loop", ufhloop: "ufh-loop", underfloor: "ufh-loop", "underfloor loop": "ufh-loop", floor: "ufh-loop",
  none: "none", "-": "none",
};

export interface ImportRow {
  line: number;
  /** The row's text per field, as mapped. */
  cells: Record<string, string>;
  /** The room, when the row has no problems. */
  room: Room | null;
}
export interface RoomsImport {
  headers: string[];
  mapping: Mapping;
  rows: ImportRow[];
  issues: CsvIssue[];
}

/** Which field of ours a zod path points at (emitter.floorAreaM2 is the loop's area column). */
function fieldOfPath(path: readonly PropertyKey[]): string {
  if (path[0] !== "emitter") return String(path[0] ?? "name");
  if (path[1] === "floorAreaM2") return "emitterFloorAreaM2";
  return path[1] === undefined || path[1] === "kind" ? "emitterKind" : String(path[1]);
}

function rowToRoom(cells: Record<string, string>, line: number, delimiter: string, column: (field: string) => string, unmapped: Set<string>) {
  const issues: CsvIssue[] = [];
  const n: Record<string, number | null> = {};
  for (const f of numericFields) {
    const r = readNumber(cells[f] ?? "", delimiter);
    if (r.ok) n[f] = r.value;
    else issues.push({ line, column: column(f), message: r.message });
  }
  const word = (cells.emitterKind ?? "").trim().toLowerCase();
  let kind = word === "" ? (n.outputAtDt50W != null ? "radiator" : n.emitterFloorAreaM2 != null ? "ufh-loop" : "none") : kindWords[word];
  if (kind === undefined) {
    issues.push({ line, column: column("emitterKind"), message: `'${cells.emitterKind}' is not an emitter kind: write radiator, ufh-loop or leave it blank` });
    kind = "none";
  }
  const emitter =
    kind === "radiator" ? { kind, outputAtDt50W: n.outputAtDt50W, exponentN: n.exponentN ?? undefined, waterVolumeL: n.waterVolumeL }
    : kind === "ufh-loop" ? { kind, floorAreaM2: n.emitterFloorAreaM2 ?? n.floorAreaM2 }
    : null;
  const parsed = roomSchema.safeParse({ name: cells.name ?? "", roomTemperatureC: n.roomTemperatureC, heatLossW: n.heatLossW, floorAreaM2: n.floorAreaM2, emitter });
  if (!parsed.success) {
    for (const i of parsed.error.issues) {
      const field = fieldOfPath(i.path);
      // A number already reported as unreadable is not "required" as well; a field with no
      // column at all is reported once, on the header line.
      if (issues.some((x) => x.column === column(field)) || unmapped.has(field)) continue;
      const missing = i.code === "invalid_type" && (cells[field] ?? "") === "";
      issues.push({ line, column: column(field), message: missing ? `is empty; ${roomCsvFields.find((f) => f.key === field)?.label ?? field} is needed` : i.message });
    }
  }
  return { room: parsed.success && issues.length === 0 ? parsed.data : null, issues };
}

/**
 * Parse a rooms CSV: the rows as rooms and every problem (line, column, what
 * is wrong). `mapping` overrides the guessed column of a field. Rooms past
 * MAX_ROOMS are not read; one issue says so.
 */
export function importRoomsCsv(text: string, mapping?: Partial<Mapping>): RoomsImport {
  const table = readCsv(text);
  const guessed = guessMapping(table.headers, roomCsvFields);
  const map: Mapping = { ...guessed, ...Object.fromEntries(Object.entries(mapping ?? {}).map(([k, v]) => [k, v === "" ? null : v ?? null])) };
  const issues: CsvIssue[] = [...table.issues, ...mappingIssues(table.headers, roomCsvFields, map)];
  if (table.headers.length === 0) issues.push({ line: 1, column: "", message: "the file is empty: it needs a header line and one line per room" });
  const column = (field: string) => map[field] ?? field;
  const unmapped = new Set(roomCsvFields.filter((f) => f.required && !map[f.key]).map((f) => f.key));
  const rows: ImportRow[] = [];
  const seen = new Map<string, number>();
  for (const r of table.rows.slice(0, MAX_ROOMS)) {
    if (r.cells.length > table.headers.length) {
      issues.push({ line: r.line, column: "", message: `${r.cells.length} values where the header has ${table.headers.length} columns: a comma inside a number (write 1200, not 1,200) or text with a comma that is not in quotes` });
    }
    const cells = cellsByField(table.headers, r.cells, map);
    const { room, issues: own } = rowToRoom(cells, r.line, table.delimiter, column, unmapped);
    const key = (cells.name ?? "").toLowerCase();
    if (key && seen.has(key)) own.push({ line: r.line, column: column("name"), message: `'${cells.name}' is already the name of the room on line ${seen.get(key)}; room names must differ` });
    else if (key) seen.set(key, r.line);
    issues.push(...own);
    rows.push({ line: r.line, cells, room: own.length ? null : room });
  }
  if (table.rows.length > MAX_ROOMS) {
    issues.push({ line: table.rows[MAX_ROOMS]!.line, column: "", message: `the file has ${table.rows.length.toLocaleString("en")} rooms; a project holds at most ${MAX_ROOMS}: split the building into projects or import fewer rows (lines after ${table.rows[MAX_ROOMS - 1]!.line} were not read)` });
  }
  if (table.headers.length > 0 && table.rows.length === 0) issues.push({ line: 2, column: "", message: "no rooms: the file has a header line but no rows" });
  issues.sort((a, b) => a.line - b.line);
  return { headers: table.headers, mapping: map, rows, issues };
}

/** Rooms as CSV with our own headings (re-importing it gives the same rooms). */
export function roomsToCsv(rooms: readonly Room[]): string {
  const headers = roomCsvFields.map((f) => f.key);
  const rows = rooms.map((r) => {
    const e = r.emitter;
    return [r.name, r.roomTemperatureC, r.heatLossW, r.floorAreaM2, e?.kind ?? "",
      e?.kind === "radiator" ? e.outputAtDt50W : null, e?.kind === "radiator" ? e.exponentN : null,
      e?.kind === "radiator" ? e.waterVolumeL : null, e?.kind === "ufh-loop" ? e.floorAreaM2 : null];
  });
  return writeCsv(headers, rows);
}
