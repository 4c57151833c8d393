/**
 * Reading a spreadsheet export (CSV) into header + rows with the line each row
 * starts on, and mapping its columns onto our fields. Parsing is papaparse's
 * (quotes, delimiter detection, line breaks inside quotes); this file adds line
 * numbers, the column mapping and number reading with messages a person can act
 * on: line, column, what is wrong.
 */
import Papa from "papaparse";

export interface CsvIssue {
  /** 1-based line of the file the message is about (1 = the header). */
  line: number;
  /** The file's column heading, or our field name when no column holds it. */
  column: string;
  message: string;
}

export interface CsvTable {
  headers: string[];
  rows: { line: number; cells: string[] }[];
  delimiter: string;
  issues: CsvIssue[];
}

export interface CsvField {
  key: string;
  /** Words for people ("heat loss, W"). */
  label: string;
  required: boolean;
  /** Other headings that mean this field (compared after normalising). */
  synonyms: readonly string[];
}

export type Mapping = Record<string, string | null>;

/** Header text compared without case, spaces or punctuation: "Heat loss (W)" → "heatlossw", "ΔT50" → "dt50". */
export const normaliseHeading = (s: string) =>
  s.toLowerCase().replace(/[Δδ]/g, "d").replace(/²/g, "2").replace(/³/g, "3").replace(/[^a-z0-9]+/g, "");
/** The same without a unit in brackets: "Heat loss (W)" → "heatloss". */
const withoutUnit = (s: string) => normaliseHeading(s.replace(/[([][^)\]]*[)\]]/g, ""));

/** Header + rows, each with the line it starts on (quoted line breaks counted). Blank lines are skipped. */
export function readCsv(text: string): CsvTable {
  const body = text.replace(/^\uFEFF/, ""); // a spreadsheet's byte-order mark is not part of the first heading
  const rows: { line: number; cells: string[] }[] = [];
  const issues: CsvIssue[] = [];
  let consumed = 0; // characters before the current row
  let line = 1;
  let delimiter = ",";
  const linesIn = (from: number, to: number) => {
    let n = 0;
    for (let i = from; i < to; i++) if (body.charCodeAt(i) === 10) n++;
    return n;
  };
  Papa.parse<string[]>(body, {
    header: false,
    skipEmptyLines: "greedy",
    delimitersToGuess: [",", ";", "\t"],
    step: (result) => {
      // Skip the line breaks (and greedy-skipped blank lines) before this row starts.
      let start = consumed;
      while (start < body.length && /\s/.test(body[start]!)) start++; // only line breaks are counted
      line += linesIn(consumed, start);
      consumed = start;
      delimiter = result.meta.delimiter || delimiter;
      for (const e of result.errors) issues.push({ line, column: "", message: quoteMessage(e.code, e.message) });
      const cells = (result.data as string[]).map((c) => c ?? "");
      if (cells.some((c) => c.trim() !== "")) rows.push({ line, cells });
      const end = result.meta.cursor;
      line += linesIn(consumed, end);
      consumed = end;
    },
  });
  const [head, ...data] = rows;
  return { headers: (head?.cells ?? []).map((h) => h.trim()), rows: data, delimiter, issues };
}

function quoteMessage(code: string, fallback: string): string {
  if (code === "MissingQuotes") return "a quoted value is never closed (a \" without its partner)";
  if (code === "InvalidQuotes") return "a quote mark inside a value that is not quoted as a whole";
  return fallback;
}

/** Best guess of which column holds each field: the heading equal to the field's key or a synonym. */
export function guessMapping(headers: readonly string[], fields: readonly CsvField[]): Mapping {
  const byNorm = new Map<string, string>();
  for (const h of headers) for (const n of [withoutUnit(h), normaliseHeading(h)]) if (n && !byNorm.has(n)) byNorm.set(n, h);
  const out: Mapping = {};
  const used = new Set<string>();
  for (const f of fields) {
    const hit = [f.key, ...f.synonyms].map((s) => byNorm.get(normaliseHeading(s))).find((h) => h !== undefined && !used.has(h));
    out[f.key] = hit ?? null;
    if (hit) used.add(hit);
  }
  return out;
}

/** Issues of a mapping: required fields with no column, columns that are not in the file. */
export function mappingIssues(headers: readonly string[], fields: readonly CsvField[], mapping: Mapping): CsvIssue[] {
  const issues: CsvIssue[] = [];
  for (const f of fields) {
    const col = mapping[f.key] ?? null;
    if (col !== null && !headers.includes(col)) issues.push({ line: 1, column: col, message: `no column '${col}' in the file (for ${f.key})` });
    else if (col === null && f.required) {
      issues.push({ line: 1, column: f.key, message: `no column for ${f.key} (${f.label}): add one to the file or choose which column holds it` });
    }
  }
  return issues;
}

/** The row's text for each mapped field (trimmed; "" when unmapped or missing). */
export function cellsByField(headers: readonly string[], cells: readonly string[], mapping: Mapping): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, col] of Object.entries(mapping)) {
    const i = col === null ? -1 : headers.indexOf(col);
    out[key] = i >= 0 ? (cells[i] ?? "").trim() : "";
  }
  return out;
}

/**
 * A number as written in a cell: "" → null; "1200", "20.5", "-3" → numbers.
 * A comma is refused when commas separate the columns ("1,200" is 1200 or
 * 1.2? we do not guess); with ";" or tab between columns a single comma is
 * the decimal mark ("20,5" → 20.5), as European spreadsheets write it.
 */
export function readNumber(text: string, delimiter: string): { ok: true; value: number | null } | { ok: false; message: string } {
  const t = text.trim().replace(/\s+/g, "");
  if (t === "") return { ok: true, value: null };
  let s = t;
  if (t.includes(",")) {
    const decimalComma = delimiter !== "," && /^-?\d+,\d+$/.test(t);
    if (!decimalComma) {
      return { ok: false, message: `'${text.trim()}' has a comma: write numbers with a point for decimals and no thousands separator (1200, 20.5)` };
    }
    s = t.replace(",", ".");
  }
  if (!/^-?(\d+\.?\d*|\.\d+)(e-?\d+)?$/i.test(s)) return { ok: false, message: `'${text.trim()}' is not a number` };
  const value = Number(s);
  return Number.isFinite(value) ? { ok: true, value } : { ok: false, message: `'${text.trim()}' is not a number` };
}

/** A table back to CSV text (papaparse: quotes values that hold commas, quotes or line breaks). */
export function writeCsv(headers: readonly string[], rows: readonly (readonly (string | number | null)[])[]): string {
  return Papa.unparse({ fields: [...headers], data: rows.map((r) => r.map((c) => (c === null ? "" : c))) }, { newline: "\n" });
}
