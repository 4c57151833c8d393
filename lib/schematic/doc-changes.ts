/**
 * What changed between two versions of a schematic, in words, in the terms sizing sees:
 * parts (type, props), pipes (ends, material, size, length, fittings, bore), design
 * conditions, fluid and scenarios. Positions and labels are left out: they change the
 * drawing, not the numbers. Pure and client-safe; the board uses it to say why kept
 * results are out of date. The comparison itself is doc-diff.ts.
 */
import { docDelta, type Delta, type DiffDoc } from "./doc-diff";
import type { Part, Pipe } from "./schema";

export interface DocChange {
  kind: "added" | "removed" | "changed";
  /** The part or pipe id, or "design" / "fluid" / "scenarios". */
  ref: string;
  /** One line for a person, e.g. "pipe z1-f0: length 6 → 80 m". */
  text: string;
}

const show = (v: unknown): string => (v === undefined ? "—" : typeof v === "string" ? v : JSON.stringify(v));
const change = (word: string, a: unknown, b: unknown) => `${word} ${show(a)} → ${show(b)}`;
const pipeWords: Record<string, string> = { lengthM: "length", innerDiameterMm: "bore", roughnessMm: "roughness" };
type Rec = Record<string, unknown>;

function pipeText(a: Pipe, b: Pipe, k: string): string {
  return k === "lengthM" ? `length ${a.lengthM} → ${b.lengthM} m` : change(pipeWords[k] ?? k, (a as Rec)[k], (b as Rec)[k]);
}

function partText(a: Part, b: Part, k: string): string {
  return k === "type" ? `type ${a.type} → ${b.type}` : change(k, (a.props as Rec)[k], (b.props as Rec)[k]);
}

function worded<T extends { id: string }>(d: Delta<T>, noun: string, field: (a: T, b: T, k: string) => string, describe: (x: T) => string): DocChange[] {
  return [
    ...d.added.map((x) => ({ kind: "added" as const, ref: x.id, text: `${noun} ${x.id} added (${describe(x)})` })),
    ...d.changed.map((c) => ({ kind: "changed" as const, ref: c.after.id, text: `${noun} ${c.after.id}: ${c.fields.map((k) => field(c.before, c.after, k)).join(", ")}` })),
    ...d.removed.map((x) => ({ kind: "removed" as const, ref: x.id, text: `${noun} ${x.id} removed` })),
  ];
}

export function docChanges(before: DiffDoc, after: DiffDoc): DocChange[] {
  if (before === after) return [];
  const d = docDelta(before, after);
  const out: DocChange[] = [];
  if (d.design.length > 0) out.push({ kind: "changed", ref: "design", text: `design: ${d.design.map((k) => change(k, (before.design as Rec)[k], (after.design as Rec)[k])).join(", ")}` });
  if (d.fluid) out.push({ kind: "changed", ref: "fluid", text: `fluid ${show(before.fluid)} → ${show(after.fluid)}` });
  if (d.scenarios) out.push({ kind: "changed", ref: "scenarios", text: "scenarios changed" });
  out.push(...worded(d.parts, "part", partText, (p) => p.type), ...worded(d.pipes, "pipe", pipeText, (p) => `${p.from} → ${p.to}`));
  return out;
}
