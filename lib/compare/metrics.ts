/**
 * The numbers side by side puts next to each other, read from one design's sizing
 * results (the engine's answer, kept or computed — never a second calculation) and, for
 * pipe lengths, from its document. Pure and client-safe.
 *
 * Design values are the heating mode's (the mode a system is sized for); the largest
 * velocity is over every design mode, since the velocity limit holds in each.
 */
import type { Results, Schematic, Severity } from "@/lib/schematic";

export const severities = ["error", "warning", "info"] as const satisfies readonly Severity[];

export interface Metrics {
  heatSourceFlowM3h: number | null;
  pumpRequiredHeadKpa: number | null;
  pumpAvailableHeadKpa: number | null;
  /** The index circuit of the pump with the largest required head: its load's id. */
  indexCircuit: string | null;
  bypassOpeningKpa: number | null;
  heatSourceFlowAllZonesClosedM3h: number | null;
  systemVolumeL: number | null;
  minimumVolumeL: number | null;
  bufferRecommended: boolean | null;
  vesselRequiredL: number | null;
  maxVelocityMps: number | null;
  maxVelocityPipe: string | null;
  /** The design's own limit (design.maxVelocityMps), to say when a velocity is too high. */
  velocityLimitMps: number | null;
  /** Sum of the emitters' output at design; null when any emitter's output is unknown. */
  emitterOutputW: number | null;
  /** Emitters whose output at design falls short of their heat load. */
  emitterShortfalls: string[];
  /** Pipe length by material, then catalogue size (the document's lengths). */
  pipeLengthM: Record<string, Record<string, number>>;
  /** Findings by severity: how many, and their distinct codes. */
  findings: Record<Severity, { count: number; codes: string[] }>;
  /** The circulating fluid's density (kg/m³), for pressures shown as metres of head. */
  fluidDensityKgM3: number | null;
}

function pipeLengths(doc: Pick<Schematic, "pipes">): Metrics["pipeLengthM"] {
  const out: Metrics["pipeLengthM"] = {};
  for (const p of doc.pipes) {
    const bySize = (out[p.material] ??= {});
    bySize[p.size] = (bySize[p.size] ?? 0) + p.lengthM;
  }
  return out;
}

function findingsBySeverity(results: Results | null): Metrics["findings"] {
  const out = {} as Metrics["findings"];
  for (const s of severities) {
    const list = (results?.findings ?? []).filter((f) => f.severity === s);
    out[s] = { count: list.length, codes: [...new Set(list.map((f) => f.code))].sort() };
  }
  return out;
}

function largestVelocity(results: Results): { mps: number | null; pipe: string | null } {
  let best: { mps: number | null; pipe: string | null } = { mps: null, pipe: null };
  for (const m of results.modes) {
    for (const p of m.pipes) {
      if (p.velocityMps !== null && (best.mps === null || p.velocityMps > best.mps)) best = { mps: p.velocityMps, pipe: p.id };
    }
  }
  return best;
}

/** The heat-source flow with every zone shut: the bypass check's, else the engine's "all zones shut" scenario. */
function allZonesShutFlow(results: Results): number | null {
  const bypass = results.bypass?.heatSourceFlowAllZonesClosedM3h;
  if (bypass !== undefined && bypass !== null) return bypass;
  return results.scenarios.find((s) => s.name === "all zones shut")?.heatSourceFlowM3h ?? null;
}

function emitterSum(results: Results): number | null {
  let sum = 0;
  for (const e of results.emitters) {
    if (e.outputAtDesignW === null) return null;
    sum += e.outputAtDesignW;
  }
  return sum;
}

/** The metrics of one design; `results` null (the engine could not size it): every number null. */
export function designMetrics(doc: Pick<Schematic, "pipes" | "design">, results: Results | null): Metrics {
  const base = { pipeLengthM: pipeLengths(doc), findings: findingsBySeverity(results), velocityLimitMps: doc.design.maxVelocityMps ?? null };
  if (!results) {
    return { ...base, heatSourceFlowM3h: null, pumpRequiredHeadKpa: null, pumpAvailableHeadKpa: null, indexCircuit: null,
      bypassOpeningKpa: null, heatSourceFlowAllZonesClosedM3h: null, systemVolumeL: null, minimumVolumeL: null,
      bufferRecommended: null, vesselRequiredL: null, maxVelocityMps: null, maxVelocityPipe: null, emitterOutputW: null,
      emitterShortfalls: [], fluidDensityKgM3: null };
  }
  const heating = results.modes.find((m) => m.mode === "heating") ?? results.modes[0];
  const pump = heating?.pump ?? null;
  const index = heating?.circuits.find((c) => c.index && (!pump || c.pump === pump.id)) ?? heating?.circuits.find((c) => c.index);
  const v = largestVelocity(results);
  return {
    ...base,
    heatSourceFlowM3h: heating?.heatSourceFlowM3h ?? null,
    pumpRequiredHeadKpa: pump?.requiredHeadKpa ?? null,
    pumpAvailableHeadKpa: pump?.availableHeadKpa ?? null,
    indexCircuit: index?.load ?? null,
    bypassOpeningKpa: results.bypass?.recommendedOpeningKpa ?? null,
    heatSourceFlowAllZonesClosedM3h: allZonesShutFlow(results),
    systemVolumeL: results.volume.systemL,
    minimumVolumeL: results.volume.minimumL,
    bufferRecommended: results.volume.bufferRecommended,
    vesselRequiredL: results.expansionVessel?.requiredVolumeL ?? null,
    maxVelocityMps: v.mps,
    maxVelocityPipe: v.pipe,
    emitterOutputW: emitterSum(results),
    emitterShortfalls: results.emitters.filter((e) => e.ok === false).map((e) => e.id),
    fluidDensityKgM3: results.fluid.densityKgM3,
  };
}
