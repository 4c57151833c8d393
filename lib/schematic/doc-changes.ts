/**
 * What changed between two versions of a schematic, in the terms sizing sees:
 * parts (type, props), pipes (ends, material, size, length, fittings, bore),
 * design conditions, fluid and scenarios. Positions and labels are left out:
 * they change the drawing, not the numbers. Pure and client-safe; the board
 * uses it to say why kept results are out of date, review and compare may too.
 */
import type { Part, Pipe, Schematic } from "./schema";

export interface DocChange {
  kind: "added" | "removed" | "changed";
  /** The part or pipe id, or "design" / "fluid" / "scenarios". */
  ref: string;
  /** One line for a person, e.g. "pipe z1-f0: length 6 → 80 m". */
  text: string;
}

type Doc = Pick<Schematic, "parts" | "pipes" | "design" | "fluid"> & { scenarios?: Schematic["scenarios"] };

const show = (v: unknown): string => (v === undefined ? "—" : typeof v === "string" ? v : JSON.stringify(v));
const same = (a: unknown, b: unknown) => a === b || JSON.stringify(a) === JSON.stringify(b);

/** Keys whose values differ between two flat records, as "key a → b". */
function fieldChanges(a: Record<string, unknown>, b: Record<string, unknown>, keys?: readonly string[]): string[] {
  const all = keys ?? [...new Set([...Object.keys(a), ...Object.keys(b)])];
  return all.filter((k) => !same(a[k], b[k])).map((k) => `${k} ${show(a[k])} → ${show(b[k])}`);
}

const PIPE_FIELDS = ["from", "to", "material", "size", "lengthM", "fittings", "innerDiameterMm", "roughnessMm"] as const;
const pipeWords: Record<string, string> = { lengthM: "length", innerDiameterMm: "bore", roughnessMm: "roughness" };

function pipeChange(a: Pipe, b: Pipe): string[] {
  return PIPE_FIELDS.filter((k) => !same(a[k], b[k])).map((k) =>
    k === "lengthM" ? `length ${a.lengthM} → ${b.lengthM} m` : `${pipeWords[k] ?? k} ${show(a[k])} → ${show(b[k])}`);
}

function partChange(a: Part, b: Part): string[] {
  if (a.type !== b.type) return [`type ${a.type} → ${b.type}`];
  return fieldChanges(a.props as Record<string, unknown>, b.props as Record<string, unknown>);
}

function byId<T extends { id: string }>(
  before: readonly T[], after: readonly T[], noun: string, changed: (a: T, b: T) => string[], describe: (x: T) => string,
): DocChange[] {
  const out: DocChange[] = [];
  const old = new Map(before.map((x) => [x.id, x]));
  const now = new Set(after.map((x) => x.id));
  for (const x of after) {
    const was = old.get(x.id);
    if (!was) out.push({ kind: "added", ref: x.id, text: `${noun} ${x.id} added (${describe(x)})` });
    else if (was !== x) {
      const what = changed(was, x);
      if (what.length > 0) out.push({ kind: "changed", ref: x.id, text: `${noun} ${x.id}: ${what.join(", ")}` });
    }
  }
  for (const x of before) if (!now.has(x.id)) out.push({ kind: "removed", ref: x.id, text: `${noun} ${x.id} removed` });
  return out;
}

export function docChanges(before: Doc, after: Doc): DocChange[] {
  if (before === after) return [];
  const out: DocChange[] = [];
  const design = fieldChanges(before.design as Record<string, unknown>, after.design as Record<string, unknown>);
  if (design.length > 0) out.push({ kind: "changed", ref: "design", text: `design: ${design.join(", ")}` });
  if (!same(before.fluid, after.fluid)) out.push({ kind: "changed", ref: "fluid", text: `fluid ${show(before.fluid)} → ${show(after.fluid)}` });
  if (!same(before.scenarios ?? null, after.scenarios ?? null)) out.push({ kind: "changed", ref: "scenarios", text: "scenarios changed" });
  if (before.parts !== after.parts) out.push(...byId(before.parts, after.parts, "part", partChange, (p) => p.type));
  if (before.pipes !== after.pipes) out.push(...byId(before.pipes, after.pipes, "pipe", pipeChange, (p) => `${p.from} → ${p.to}`));
  return out;
}
