/**
 * What differs between two versions of a schematic, by id: parts and pipes added,
 * removed, and changed (with the names of the fields that changed), and the document
 * settings that changed (design conditions, fluid, scenarios). Pure and client-safe;
 * the one place this comparison is made. The board's "results out of date" note words
 * it (doc-changes.ts), the revision history and side by side list it.
 *
 * `layout: false` (the default) compares what sizing sees; `layout: true` also names
 * moved, relabelled and turned parts (a reviewer reading the history wants those too).
 */
import type { Part, Pipe, Schematic } from "./schema";

export interface DocDiff {
  added: string[];
  removed: string[];
  changed: { id: string; fields: string[] }[];
  /** Changed settings: "design.flowTemperatureC", "fluid", "scenarios". */
  settings: string[];
}

export type DiffDoc = Pick<Schematic, "parts" | "pipes" | "design" | "fluid"> & { scenarios?: Schematic["scenarios"] };
export interface DiffOptions { layout?: boolean }

/** One kind of item (parts or pipes) compared by id; unchanged objects are skipped by identity first. */
export interface Delta<T> { added: T[]; removed: T[]; changed: { before: T; after: T; fields: string[] }[] }

export const same = (a: unknown, b: unknown) => a === b || JSON.stringify(a) === JSON.stringify(b);

/** Keys whose values differ between two flat records. */
export function differingKeys(a: Record<string, unknown>, b: Record<string, unknown>): string[] {
  return [...new Set([...Object.keys(a), ...Object.keys(b)])].filter((k) => !same(a[k], b[k]));
}

export const PIPE_FIELDS = ["from", "to", "material", "size", "lengthM", "fittings", "innerDiameterMm", "roughnessMm"] as const;

function pipeFields(a: Pipe, b: Pipe): string[] {
  return PIPE_FIELDS.filter((k) => !same(a[k], b[k]));
}

function partFields(a: Part, b: Part, layout: boolean): string[] {
  const fields = a.type !== b.type ? ["type"] : differingKeys(a.props as Record<string, unknown>, b.props as Record<string, unknown>);
  if (!layout) return fields;
  if (a.x !== b.x || a.y !== b.y) fields.push("position");
  for (const k of ["label", "rotation", "flipX"] as const) if (!same(a[k], b[k])) fields.push(k);
  return fields;
}

function byId<T extends { id: string }>(before: readonly T[], after: readonly T[], fields: (a: T, b: T) => string[]): Delta<T> {
  const out: Delta<T> = { added: [], removed: [], changed: [] };
  if (before === after) return out;
  const old = new Map(before.map((x) => [x.id, x]));
  const now = new Set(after.map((x) => x.id));
  for (const x of after) {
    const was = old.get(x.id);
    if (!was) out.added.push(x);
    else if (was !== x) {
      const f = fields(was, x);
      if (f.length > 0) out.changed.push({ before: was, after: x, fields: f });
    }
  }
  for (const x of before) if (!now.has(x.id)) out.removed.push(x);
  return out;
}

export interface DocDelta {
  parts: Delta<Part>;
  pipes: Delta<Pipe>;
  /** Names of the design conditions that changed. */
  design: string[];
  fluid: boolean;
  scenarios: boolean;
}

export function docDelta(before: DiffDoc, after: DiffDoc, opts: DiffOptions = {}): DocDelta {
  const layout = opts.layout ?? false;
  return {
    design: before === after ? [] : differingKeys(before.design as Record<string, unknown>, after.design as Record<string, unknown>),
    fluid: before !== after && !same(before.fluid, after.fluid),
    scenarios: before !== after && !same(before.scenarios ?? null, after.scenarios ?? null),
    parts: byId(before.parts, after.parts, (a, b) => partFields(a, b, layout)),
    pipes: byId(before.pipes, after.pipes, pipeFields),
  };
}

/** Ids added, removed and changed (parts first, then pipes), and the settings changed. */
export function docDiff(before: DiffDoc, after: DiffDoc, opts: DiffOptions = {}): DocDiff {
  const d = docDelta(before, after, opts);
  const ids = <T extends { id: string }>(xs: T[]) => xs.map((x) => x.id);
  return {
    added: [...ids(d.parts.added), ...ids(d.pipes.added)],
    removed: [...ids(d.parts.removed), ...ids(d.pipes.removed)],
    changed: [...d.parts.changed, ...d.pipes.changed].map((c) => ({ id: c.after.id, fields: c.fields })),
    settings: [...d.design.map((k) => `design.${k}`), ...(d.fluid ? ["fluid"] : []), ...(d.scenarios ? ["scenarios"] : [])],
  };
}

/** Everything in a document is new (the first revision). */
export function diffFromNothing(doc: DiffDoc): DocDiff {
  return { added: [...doc.parts.map((p) => p.id), ...doc.pipes.map((p) => p.id)], removed: [], changed: [], settings: [] };
}
