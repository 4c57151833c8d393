/**
 * Reads a part's zod props schema into form field descriptions, so the details
 * form is generated from the same schema the store and server validate with.
 * Units come from the field-name suffix (the contract puts the unit in the
 * name); label and hint from the field's `.describe()` text.
 */
import type { z } from "zod";
import { readNumber } from "@/lib/units/read-number";

export type FieldKind = "number" | "boolean" | "enum" | "curve" | "other";
export interface FieldInfo {
  name: string;
  kind: FieldKind;
  label: string;
  unit: string;
  help: string;
  nullable: boolean;
  /** What null means, from "(null: …)" in the description. */
  nullHint: string;
  integer: boolean;
  options: string[];
}

type Def = { type: string; innerType?: ZodLike; entries?: Record<string, string> };
type ZodLike = { _zod: { def: Def }; description?: string; isInt?: boolean };

const suffixes: [RegExp, string][] = [
  [/M3h$/, "m³/h"], [/Kpa$/, "kPa"], [/Kw$/, "kW"], [/Bar$/, "bar"], [/Mm$/, "mm"], [/Mps$/, "m/s"],
  [/^(kv|kvs)$|Kv$/, ""], [/Dt50W$|W$/, "W"], [/L$/, "L"], [/C$/, "°C"], [/K$/, "K"], [/M$/, "m"],
];
export const unitOf = (name: string) => suffixes.find(([re]) => re.test(name))?.[1] ?? "";

const words = (name: string) => name.replace(/([A-Z])/g, " $1").toLowerCase();
const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

export function describeField(name: string, schema: ZodLike): FieldInfo {
  let node: ZodLike | undefined = schema;
  let description = "";
  let nullable = false;
  while (node && ["default", "prefault", "nullable", "optional"].includes(node._zod.def.type)) {
    description ||= node.description ?? "";
    if (node._zod.def.type === "nullable") nullable = true;
    node = node._zod.def.innerType;
  }
  description ||= node?.description ?? "";
  const t = node?._zod.def.type;
  const kind: FieldKind = t === "number" ? "number" : t === "boolean" ? "boolean" : t === "enum" ? "enum" : t === "array" ? "curve" : "other";
  const nullHint = /\(null: ([^)]*)\)/.exec(description)?.[1] ?? "";
  const text = description.replace(/\s*\(null: [^)]*\)/, "");
  const comma = text.indexOf(", ");
  const head = comma > 0 ? text.slice(0, comma) : text;
  return {
    name,
    kind,
    label: cap(head || words(name)),
    unit: unitOf(name),
    // the tail after the comma is often just the unit, already shown beside the input
    help: comma > 0 && !["litres", unitOf(name), "W", "m", "kW", "°C", "m³/h", "kPa", "mm", "K", "m²"].includes(text.slice(comma + 2)) ? text.slice(comma + 2) : "",
    nullable,
    nullHint,
    integer: node?.isInt === true,
    options: t === "enum" ? Object.values(node?._zod.def.entries ?? {}) : [],
  };
}

export function fieldsOf(schema: z.ZodObject): FieldInfo[] {
  return Object.entries(schema.shape).map(([name, s]) => describeField(name, s as unknown as ZodLike));
}

/** A zod issue in words a designer reads beside the field. */
export function issueMessage(issue: z.core.$ZodIssue, unit: string): string {
  const u = unit ? ` ${unit}` : "";
  if (issue.code === "too_small") return `Must be ${issue.inclusive ? "at least" : "more than"} ${String(issue.minimum)}${u}.`;
  if (issue.code === "too_big") return `Must be ${issue.inclusive ? "at most" : "less than"} ${String(issue.maximum)}${u}.`;
  if (issue.code === "invalid_type") return issue.expected === "int" ? "Must be a whole number." : "Enter a number.";
  return issue.message;
}

/** The browser's locale, which decides how "1,500" reads (lib/units/read-number.ts); en-GB outside a browser. */
export const typingLocale = (): string => (typeof navigator !== "undefined" && navigator.language ? navigator.language : "en-GB");

/** A typed number in the user's locale, or null when it is not one or can be read two ways. */
export function parseNumber(text: string, locale: string = typingLocale()): number | null {
  const r = readNumber(text, locale);
  return r.ok ? r.value : null;
}
