/**
 * Everything a calculation shares: the parsed document, the network model and
 * its symbolic factorisation, fluid properties at the mean design temperature,
 * each pipe's geometry, and the findings collector. Built once per calculate().
 */
import { fluidProperties, type FluidSpec } from "@/lib/hydraulics/fluids";
import { sumFittingsK } from "@/lib/hydraulics/losses";
import { prepare, type Prepared } from "@/lib/hydraulics/network/gga";
import { buildModel, type NetworkModel } from "@/lib/hydraulics/network/model";
import type { PipeGeometry } from "@/lib/hydraulics/network/behaviour";
import { findPipeSize } from "@/lib/hydraulics/pipes";
import type { Findings } from "@/lib/hydraulics/findings/finding";
import { resolveInputs, type ResolvedInputs } from "@/lib/hydraulics/typical/resolve";
import { inputFindings } from "@/lib/hydraulics/typical/findings";
import type { Schematic } from "@/lib/schematic/schema";

export interface FluidState {
  temperatureC: number;
  densityKgM3: number;
  kinematicViscosityM2s: number;
  specificHeatJkgK: number;
}

export interface EngineContext {
  doc: Schematic;
  model: NetworkModel;
  prep: Prepared;
  fluid: FluidState | null;
  flowC: number;
  returnC: number;
  /** design ΔT = flow − return, K; null when not positive (input.delta-t) */
  deltaTK: number | null;
  /** by doc.pipes index; null when the pipe's geometry is unusable (input.* finding) */
  pipeGeom: (PipeGeometry | null)[];
  /** Kv and water content each part is sized with: given, typical (an assumption), or not counted */
  inputs: ResolvedInputs;
  findings: Findings;
  /**
   * Converged simulated flows of this calculation by valve state (laws.ts valveStateKey):
   * a later simulation of the same valves starts from them (scenarios/simulate.ts).
   */
  settled: Map<string, Float64Array>;
}

/**
 * A pipe's geometry made by a constructor, not an object literal: V8 moves literal sites
 * whose objects outlive a minor GC (these live through the whole calculation) straight to
 * the old generation, and that allocation cost 7 % of a 10,000-pipe solve (network/model.ts, Link).
 */
class Geometry implements PipeGeometry {
  constructor(
    public innerDiameterM: number,
    public roughnessM: number,
    public lengthM: number,
    public sumK: number,
  ) {}
}

function pipeGeometry(doc: Schematic, findings: Findings): (PipeGeometry | null)[] {
  // A zero length is computed (two ports joined directly: fittings only, no
  // friction) but is usually a length not yet typed in: a warning, said once.
  const zero = doc.pipes.filter((p) => p.lengthM === 0).map((p) => p.id);
  if (zero.length > 0) {
    findings.warning(
      "input.pipe-length",
      `${zero.length === 1 ? `pipe ${zero[0]}: length` : `pipes ${zero.slice(0, 5).join(", ")}${zero.length > 5 ? ` and ${zero.length - 5} more` : ""}: lengths`} 0 m — treated as a direct joint (fittings only, no pipe friction); type the length if it has one`,
      zero,
    );
  }
  return doc.pipes.map((pipe) => {
    const row = findPipeSize(pipe.material, pipe.size);
    const dMm = pipe.innerDiameterMm ?? row?.innerDiameterMm;
    const epsMm = pipe.roughnessMm ?? row?.roughnessMm;
    if (dMm === undefined || epsMm === undefined) {
      findings.error(
        "input.pipe-size",
        `pipe ${pipe.id}: no ${pipe.material} size "${pipe.size}" in the catalogue and no inner diameter and roughness typed for it`,
        [pipe.id],
      );
      return null;
    }
    let ok = true;
    // Below 1 mm nothing is a heating pipe; it would only overflow the velocity.
    if (!(dMm >= 1)) {
      findings.error("input.pipe-diameter", `pipe ${pipe.id}: inner diameter ${dMm} mm is not a usable pipe bore (≥ 1 mm)`, [pipe.id]);
      ok = false;
    }
    // Colebrook's ε/D must stay below 1 (a roughness as deep as the bore is no pipe): typed values can give it.
    if (ok && !(epsMm < dMm)) {
      findings.error("input.pipe-roughness", `pipe ${pipe.id}: roughness ${epsMm} mm is not below its inner diameter ${dMm} mm`, [pipe.id]);
      ok = false;
    }
    if (!(pipe.lengthM >= 0)) {
      findings.error("input.pipe-length", `pipe ${pipe.id}: length ${pipe.lengthM} m is negative`, [pipe.id]);
      ok = false;
    }
    if (!ok) return null;
    let sumK = 0;
    try {
      sumK = sumFittingsK(pipe.fittings, dMm);
    } catch (e) {
      findings.error("input.pipe-fittings", `pipe ${pipe.id}: fittings not usable (${(e as Error).message})`, [pipe.id]);
      return null;
    }
    return new Geometry(dMm / 1000, epsMm / 1000, pipe.lengthM, sumK);
  });
}

export function createContext(doc: Schematic, findings: Findings): EngineContext {
  const model = buildModel(doc);
  const from = new Int32Array(model.links.length);
  const to = new Int32Array(model.links.length);
  model.links.forEach((l, k) => {
    from[k] = l.from;
    to[k] = l.to;
  });
  const prep = prepare({ nodeCount: model.nodeCount, from, to, fixed: model.fixed });
  const flowC = doc.design.flowTemperatureC;
  const returnC = doc.design.returnTemperatureC;
  const deltaTK = flowC - returnC > 0 ? flowC - returnC : null;
  if (deltaTK === null) {
    findings.error(
      "input.delta-t",
      `design: flow ${flowC} °C is not above return ${returnC} °C, so no design flow can be computed (ΔT must be > 0)`,
      [],
      ["design.flowTemperatureC", "design.returnTemperatureC"],
    );
  }
  const meanC = (flowC + returnC) / 2;
  let fluid: FluidState | null = null;
  try {
    const p = fluidProperties(doc.fluid as FluidSpec, meanC);
    fluid = {
      temperatureC: meanC,
      densityKgM3: p.densityKgM3,
      kinematicViscosityM2s: p.kinematicViscosityM2s,
      specificHeatJkgK: p.specificHeatJkgK,
    };
  } catch (e) {
    findings.error(
      "fluid.out-of-range",
      `fluid: no properties for ${doc.fluid.kind} at ${meanC} °C (${(e as Error).message.replace(/^tC: /, "")}); hydraulic results are not computed`,
      [],
      ["fluid.kind", "fluid.percentByVolume", "design.flowTemperatureC"],
    );
  }
  const pipeGeom = pipeGeometry(doc, findings);
  const inputs = resolveInputs(doc, pipeGeom, fluid, deltaTK);
  inputFindings(doc, inputs, findings);
  return { doc, model, prep, fluid, flowC, returnC, deltaTK, pipeGeom, inputs, findings, settled: new Map() };
}
