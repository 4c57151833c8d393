/**
 * The engine's simulated scenarios (valves as they are, pumps on their curves) that both
 * designs share, by name: what flows through the heat source and the heat the emitters
 * deliver in each. Pure and client-safe.
 */
import type { Results, ScenarioResult } from "@/lib/schematic";

export interface ScenarioSide {
  heatSourceFlowM3h: number | null;
  /** Sum of the emitters' output in the scenario; null when any is unknown. */
  heatDeliveredW: number | null;
  converged: boolean;
}

export interface SharedScenario { name: string; a: ScenarioSide; b: ScenarioSide }

function side(s: ScenarioResult): ScenarioSide {
  let heat: number | null = 0;
  for (const e of s.emitters) heat = heat === null || e.outputW === null ? null : heat + e.outputW;
  return { heatSourceFlowM3h: s.heatSourceFlowM3h, heatDeliveredW: heat, converged: s.converged };
}

/** Scenarios named alike on both sides, in side a's order. */
export function sharedScenarios(a: Results | null, b: Results | null): SharedScenario[] {
  const theirs = new Map((b?.scenarios ?? []).map((s) => [s.name, s]));
  return (a?.scenarios ?? []).flatMap((s) => {
    const other = theirs.get(s.name);
    return other ? [{ name: s.name, a: side(s), b: side(other) }] : [];
  });
}
