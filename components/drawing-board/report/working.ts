/**
 * "Show working" for the numbers in the sizing report: the formula, the
 * inputs with their units as this schematic gives them, the intermediate
 * values, the answer and the published source — the citation the engine's
 * own function carries (imported from it, never re-typed). Where a step is an
 * engine function (ΣK, LMTD, the EN 12828 vessel, fluid properties) it is
 * called rather than re-implemented, so the working cannot drift from the
 * engine. Each working also carries its raw `figures`, so a check (and a
 * reader) can reproduce the reported number from them.
 */
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

export { pipeDpWorking, pipeFlowWorking, velocityWorking } from "./working-pipes";
export { balancingKvWorking, circuitDpWorking, designFlowWorking, excessWorking } from "./working-circuits";
export { availableHeadWorking, pumpSettingWorking, requiredHeadWorking } from "./working-pump";
export { bypassOpeningWorking, minVolumeWorking, prechargeWorking, reheatWorking, shutFlowWorking, systemVolumeWorking, vesselWorking } from "./working-plant";
export { emitterWorking } from "./working-emitters";
