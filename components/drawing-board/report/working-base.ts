// The shape of a working and the small helpers every working-*.ts file uses; working.ts
// gathers the workings for the report.
import type { Assumption, Results } from "@/lib/schematic";

export interface WorkingLine {
  label: string;
  value: string;
}

export interface Working {
  title: string;
  formula: string;
  inputs: WorkingLine[];
  /** intermediate values, in order */
  steps?: WorkingLine[];
  result: string;
  /** the reported number the result shows (its unit is in `result`) */
  value: number | null;
  source: string;
  /** typical values the number rests on, with their basis */
  assumed?: string[];
  /** raw numbers of the inputs and steps (unit in the key), from which `value` follows */
  figures?: Record<string, number>;
}

/** A number for a working: "—" when missing. */
export const f = (n: number | null | undefined, d = 2): string => (n === null || n === undefined || !Number.isFinite(n) ? "—" : n.toFixed(d));

/** The assumptions a number rests on, in words for the working. */
export function assumedLines(results: Results, refs: readonly string[] | undefined): string[] | undefined {
  if (!refs || refs.length === 0) return undefined;
  const byRef = new Map((results.assumptions ?? []).map((a: Assumption) => [a.ref, a]));
  return refs.map((r) => {
    const a = byRef.get(r);
    if (!a) return r;
    const v = a.kind === "water" ? `${a.value.toFixed(1)} L` : `Kv ${a.value.toFixed(2)}`;
    return `${a.part}: ${v} assumed — ${a.basis} (${a.source}); ${a.working}`;
  });
}
