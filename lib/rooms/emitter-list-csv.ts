/**
 * The firm's emitter list (the radiators it fits) from and to CSV: one row per
 * model with its EN 442 rating. Same reading rules as the rooms CSV
 * (csv-table.ts): headings matched loosely, messages by line and column.
 */
import { cellsByField, guessMapping, mappingIssues, readCsv, readNumber, writeCsv, type CsvField, type CsvIssue } from "./csv-table";
import { emitterEntrySchema, MAX_EMITTERS, type EmitterEntry } from "./schema";

export const emitterCsvFields: readonly CsvField[] = [
  { key: "name", label: "model name", required: true, synonyms: ["model", "emitter", "product"] },
  { key: "type", label: "type (e.g. double panel)", required: false, synonyms: ["kind", "style"] },
  { key: "heightMm", label: "height, mm", required: false, synonyms: ["height", "h"] },
  { key: "lengthMm", label: "length, mm", required: false, synonyms: ["length", "width", "l"] },
  { key: "outputAtDt50W", label: "output at ΔT 50 (75/65/20 °C), W", required: true, synonyms: ["output at dt50", "dt50 output", "rated output", "output w", "output"] },
  { key: "exponentN", label: "exponent n (blank: 1.3)", required: false, synonyms: ["exponent", "n", "exponent n"] },
  { key: "waterVolumeL", label: "water content, L", required: false, synonyms: ["water volume", "water content", "volume l"] },
];

const numeric = ["heightMm", "lengthMm", "outputAtDt50W", "exponentN", "waterVolumeL"] as const;

/** The list's entries, or every problem (line, column, what is wrong); nothing half-read. */
export function importEmitterCsv(text: string): { emitters: EmitterEntry[]; issues: CsvIssue[] } {
  const table = readCsv(text);
  const map = guessMapping(table.headers, emitterCsvFields);
  const issues: CsvIssue[] = [...table.issues, ...mappingIssues(table.headers, emitterCsvFields, map)];
  const column = (f: string) => map[f] ?? f;
  const emitters: EmitterEntry[] = [];
  for (const r of table.rows) {
    const cells = cellsByField(table.headers, r.cells, map);
    const values: Record<string, unknown> = { name: cells.name, type: cells.type };
    const own: CsvIssue[] = [];
    for (const f of numeric) {
      const n = readNumber(cells[f] ?? "", table.delimiter);
      if (n.ok) values[f] = n.value ?? undefined;
      else own.push({ line: r.line, column: column(f), message: n.message });
    }
    const parsed = emitterEntrySchema.safeParse(values);
    if (!parsed.success) {
      for (const i of parsed.error.issues) {
        const field = String(i.path[0] ?? "name");
        if (!own.some((x) => x.column === column(field))) own.push({ line: r.line, column: column(field), message: (cells[field] ?? "") === "" ? "is empty" : i.message });
      }
    }
    issues.push(...own);
    if (parsed.success && own.length === 0) emitters.push(parsed.data);
  }
  if (table.rows.length > MAX_EMITTERS) issues.push({ line: table.rows[MAX_EMITTERS]!.line, column: "", message: `at most ${MAX_EMITTERS} emitters in the list` });
  if (table.rows.length === 0) issues.push({ line: 1, column: "", message: "the list is empty: a header line and one line per emitter model" });
  return { emitters: issues.length ? [] : emitters, issues: issues.sort((a, b) => a.line - b.line) };
}

export function emittersToCsv(emitters: readonly EmitterEntry[]): string {
  return writeCsv(emitterCsvFields.map((f) => f.key),
    emitters.map((e) => [e.name, e.type, e.heightMm, e.lengthMm, e.outputAtDt50W, e.exponentN, e.waterVolumeL]));
}
