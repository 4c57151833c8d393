/**
 * Per-pipe overlay data the canvas draws beside each pipe: flow, velocity and
 * pressure drop in the user's display units, the velocity band, and whether the
 * engine suggests another size. Pure: results + document in, plain data out.
 */
import type { Results, Schematic } from "@/lib/schematic";
import { showFlow, showPressure, type UnitPrefs } from "@/lib/units/display";
import { suggestedSizeChanges } from "../report/apply-suggested-sizes";
import { DEFAULT_VIEW, pipesInView } from "./results-view";
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
  view: string = DEFAULT_VIEW): Map<string, PipeLabel> {
  const out = new Map<string, PipeLabel>();
  if (!results) return out;
  const onIndex = indexCircuitIds(results, view);
  // the same suggestion "Apply suggested sizes" would make (largest over the modes)
  // (in a design view only: a simulated scenario is what the drawn sizes do, not a sizing)
  const design = results.modes.some((m) => m.mode === view);
  const suggested = new Map(design ? suggestedSizeChanges(doc, results).map((c) => [c.id, c.to]) : []);
  const rho = results.fluid.densityKgM3;
  for (const r of pipesInView(results, view)) {
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

/** Ids of pipes and parts on the index circuit(s) of a design mode, for tracing on the canvas (scenarios have none). */
export function indexCircuitIds(results: Results | null, view: string = DEFAULT_VIEW): Set<string> {
  const m = (results?.modes ?? []).find((x) => x.mode === view);
  return new Set(m ? m.circuits.filter((c) => c.index).flatMap((c) => c.path) : []);
}
