/**
 * Per-pipe overlay data the canvas draws beside each pipe: flow, velocity and
 * pressure drop in the user's display units, the velocity band, and whether the
 * engine suggests another size. Pure: results + document in, plain data out.
 */
import type { ModeResult, Results, Schematic } from "@/lib/schematic";
import { showFlow, showPressure, type UnitPrefs } from "@/lib/units/display";
import { suggestedSizeChanges } from "../report/apply-suggested-sizes";
import { modeOf } from "./results-mode";
import { bandStyle, velocityBand, type VelocityBand } from "./velocity-bands";

export interface PipeLabel {
  id: string;
  flow: string;
  velocity: string;
  pressureDrop: string;
  band: VelocityBand;
  color: string;
  suggestedSize: string | null;
  onIndexCircuit: boolean;
}

export function pipeLabels(results: Results | null, doc: Pick<Schematic, "pipes" | "design">, prefs: UnitPrefs,
  mode?: ModeResult["mode"]): Map<string, PipeLabel> {
  const out = new Map<string, PipeLabel>();
  const m = modeOf(results, mode);
  if (!results || !m) return out;
  const onIndex = new Set(m.circuits.filter((c) => c.index).flatMap((c) => c.path));
  // the same suggestion "Apply suggested sizes" would make (largest over the modes)
  const suggested = new Map(suggestedSizeChanges(doc, results).map((c) => [c.id, c.to]));
  const rho = results.fluid.densityKgM3;
  for (const r of m.pipes) {
    const band = velocityBand(r.velocityMps, doc.design.maxVelocityMps);
    out.set(r.id, {
      id: r.id,
      flow: showFlow(r.flowM3h, prefs).text,
      velocity: r.velocityMps === null ? "—" : `${Math.abs(r.velocityMps).toFixed(2)} m/s`,
      pressureDrop: showPressure(r.pressureDropKpa, prefs, rho).text,
      band,
      color: bandStyle[band].color,
      suggestedSize: suggested.get(r.id) ?? null,
      onIndexCircuit: onIndex.has(r.id),
    });
  }
  return out;
}

/** Ids of pipes and parts on the index circuit(s) of a mode, for tracing on the canvas. */
export function indexCircuitIds(results: Results | null, mode?: ModeResult["mode"]): Set<string> {
  const m = modeOf(results, mode);
  return new Set(m ? m.circuits.filter((c) => c.index).flatMap((c) => c.path) : []);
}
