/**
 * A firm's price list (CSV: code, description, unit, price) read row by row, and matched to
 * the materials list. Every problem is reported with its line and column; a list with any
 * problem is refused whole. Matching reads the row's code and description:
 * - a pipe line (priced per metre) matches a row naming its material and size and no fitting;
 * - a fitting (each) matches a row naming its kind, material and size;
 * - a part (each) matches a row naming its type ("zone valve") and the value of its first
 *   ordering prop ("6" for Kvs 6, "300" for 300 L), and its connection size when the row names one.
 * The first matching row in the file wins, so a firm puts its preferred items first.
 */
import { partRegistry } from "@/lib/schematic";
import { guessMapping, mappingIssues, readCsv, readNumber, type CsvField, type CsvIssue } from "@/lib/rooms/csv-table";
import type { MaterialLine } from "./materials";

export interface PriceRow { line: number; code: string; description: string; unit: "m" | "each"; price: number }

export const priceListFields: CsvField[] = [
  { key: "code", label: "the firm's item code", required: true, synonyms: ["item code", "item", "sku", "part number", "ref"] },
  { key: "description", label: "what the item is", required: true, synonyms: ["item description", "name"] },
  { key: "unit", label: "m or each", required: true, synonyms: ["uom", "per"] },
  { key: "price", label: "unit price", required: true, synonyms: ["unit price", "cost", "rate", "net price"] },
];

const UNITS: Record<string, "m" | "each"> = {
  m: "m", metre: "m", meter: "m", metres: "m", meters: "m", lm: "m",
  each: "each", ea: "each", no: "each", nr: "each", item: "each", pc: "each", pcs: "each", piece: "each",
};
export const MAX_PRICE_ROWS = 5000;

/** The rows of a price list, or every problem in it (then no rows). */
export function readPriceList(text: string): { rows: PriceRow[]; issues: CsvIssue[] } {
  const table = readCsv(text);
  const mapping = guessMapping(table.headers, priceListFields);
  const issues: CsvIssue[] = [...table.issues, ...mappingIssues(table.headers, priceListFields, mapping)];
  if (issues.length) return { rows: [], issues };
  if (!table.rows.length) return { rows: [], issues: [{ line: 2, column: "code", message: "the list has a header but no items" }] };
  if (table.rows.length > MAX_PRICE_ROWS) return { rows: [], issues: [{ line: 1, column: "code", message: `at most ${MAX_PRICE_ROWS} items in a list` }] };
  const col = (key: string) => table.headers.indexOf(mapping[key]!);
  const rows: PriceRow[] = [];
  const seen = new Map<string, number>();
  for (const r of table.rows) {
    const cell = (key: string) => (r.cells[col(key)] ?? "").trim();
    const bad = (key: string, message: string) => issues.push({ line: r.line, column: mapping[key]!, message });
    const code = cell("code");
    const description = cell("description");
    const unitText = cell("unit").toLowerCase().replace(/\.$/, "");
    const unit = UNITS[unitText];
    if (!code) bad("code", "no code");
    else if (code.length > 60) bad("code", "a code is at most 60 characters");
    else if (seen.has(code.toLowerCase())) bad("code", `code '${code}' is already on line ${seen.get(code.toLowerCase())}`);
    else seen.set(code.toLowerCase(), r.line);
    if (!description) bad("description", "no description");
    else if (description.length > 300) bad("description", "a description is at most 300 characters");
    if (!unit) bad("unit", unitText ? `'${cell("unit")}' is not a unit: write m (per metre) or each` : "no unit: write m (per metre) or each");
    const priceText = cell("price").replace(/^[£€$]\s*/, "");
    const price = readNumber(priceText, table.delimiter);
    if (!price.ok) bad("price", price.message);
    else if (price.value === null) bad("price", "no price");
    else if (price.value < 0) bad("price", "a price cannot be negative");
    else if (price.value > 10_000_000) bad("price", "a price above 10,000,000 is surely a mistake");
    if (code && description && unit && price.ok && price.value !== null) rows.push({ line: r.line, code, description, unit, price: price.value });
  }
  return issues.length ? { rows: [], issues } : { rows, issues };
}

const norm = (s: string) => ` ${s.toLowerCase().replace(/[-_/]+/g, " ").replace(/\s+/g, " ")} `;
const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
/** A size or number as a whole token: "22" in "22mm" or "tube 22", not in "220" or "15x22x2". */
const hasNumber = (text: string, n: string) => new RegExp(`(?<![0-9a-z.])${escape(n.toLowerCase())}(?![0-9.]|x[0-9])`).test(text);
const hasWord = (text: string, w: string) => new RegExp(`(?<![a-z])${escape(w)}(?![a-z])`).test(text);

const materialAliases: Record<string, string[]> = { copper: ["copper", "cu"], steel: ["steel"], pex: ["pex", "pe x"], multilayer: ["multilayer", "multi layer", "mlcp"] };
const FITTING_WORDS = ["elbow", "bend", "tee", "reducer", "reducing", "coupling", "connector"];
const fittingAliases: Record<string, string[]> = { elbow: ["elbow"], bend: ["bend"], tee: ["tee"], reducer: ["reducer", "reducing"] };

/** The first row of the list that prices this line, or undefined. */
export const rowFor = (line: MaterialLine, rows: readonly PriceRow[]): PriceRow | undefined => rows.find((r) => matches(line, r));

function matches(line: MaterialLine, row: PriceRow): boolean {
  if (row.unit !== line.unit) return false;
  const text = norm(`${row.code} ${row.description}`).replace(/\s/g, " ");
  const material = !line.material || (materialAliases[line.material] ?? [line.material]).some((w) => hasWord(text, w));
  const size = (s: string | undefined) => !s || s.split("×").every((x) => hasNumber(text, x));
  if (line.kind === "pipe") return material && size(line.size) && !FITTING_WORDS.some((w) => hasWord(text, w));
  if (line.kind === "fitting") return material && size(line.size) && (fittingAliases[line.type ?? ""] ?? []).some((w) => hasWord(text, w));
  const label = norm(partRegistry[line.type as keyof typeof partRegistry]?.label ?? line.type ?? "").trim();
  if (!label || !text.includes(` ${label}`)) return false;
  const first = Object.values(line.props ?? {})[0];
  if (first !== undefined && !hasNumber(text, String(first))) return false;
  // a row that names a connection size must name this part's (largest) one
  const largest = line.size?.split("×")[0];
  return !largest || !/\d+\s?mm|dn\d+/.test(text) || hasNumber(text, largest);
}

export interface PricedList { lines: MaterialLine[]; unmatched: MaterialLine[]; total: number | null }

const round2 = (n: number) => Math.round(n * 100) / 100;

/** Lines with their price and total where a row matches; without a list, no prices and no total. */
export function applyPrices(lines: MaterialLine[], rows: PriceRow[] | null): PricedList {
  if (!rows) return { lines, unmatched: [], total: null };
  const priced = lines.map((l): MaterialLine => {
    const row = rowFor(l, rows);
    return row ? { ...l, code: row.code, price: row.price, total: round2(row.price * l.orderQuantity) } : l;
  });
  const unmatched = priced.filter((l) => l.price === undefined);
  return { lines: priced, unmatched, total: round2(priced.reduce((s, l) => s + (l.total ?? 0), 0)) };
}
