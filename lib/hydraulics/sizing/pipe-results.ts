/**
 * Per-pipe design results: velocity, Reynolds number, friction factor, pressure
 * drop and gradient at the design flow (Darcy–Weisbach, pipes/pressure-drop.ts),
 * and the suggested size: the smallest catalogue size of the same material
 * whose velocity ≤ design.maxVelocityMps and friction gradient ≤
 * design.targetGradientPaPerM (CIBSE Guide B-style limits, references.md §9).
 *
 * No flow: a design flow with |q| < PIPE_NO_FLOW_M3H is solver round-off (a
 * leg to a vessel or accessory solves to ±1e-13 m³/h, not to 0) and is
 * reported as exactly 0. Such a pipe has no Reynolds number or friction factor
 * (f = 64/Re is meaningless at Re → 0): both are null, its velocity, drop and
 * gradient are 0, no size is suggested (null, not the smallest size), and one
 * info finding `pipe.no-flow` names all of them, once for every mode (calculate.ts
 * gathers the modes' lists; called alone, pipeResults says it itself).
 */
import { pipeCatalogue, pipePressureDrop } from "@/lib/hydraulics/pipes";
import { PIPE_DROP_SLOTS, pipeDropInto } from "@/lib/hydraulics/pipes/pressure-drop";
import { transitionAnchorF, transitionAnchorIn } from "@/lib/hydraulics/friction/darcy";
import type { PipeResult } from "@/lib/schematic/results";
import type { PipeGeometry } from "@/lib/hydraulics/network/behaviour";
import type { EngineContext } from "./context";

const fin = (x: number): number | null => (Number.isFinite(x) ? x : null);

/** Below this |flow| (m³/h) a design pipe flow is solver round-off and is reported as 0. */
export const PIPE_NO_FLOW_M3H = 1e-9;

/** One material's catalogue as the per-candidate constants of pipeDropInto, built once per material. */
interface CatalogueColumns {
  size: string[];
  dM: Float64Array;
  areaM2: Float64Array;
  relRoughness: Float64Array;
  /** transitionAnchorF of each size (darcyF's anchorF), solved once per material, not per pipe */
  anchorF: Float64Array;
}
const columnsByMaterial = new Map<string, CatalogueColumns>();
function catalogueColumns(material: keyof typeof pipeCatalogue): CatalogueColumns {
  let c = columnsByMaterial.get(material);
  if (c) return c;
  const rows = pipeCatalogue[material];
  const n = rows.length;
  c = { size: [], dM: new Float64Array(n), areaM2: new Float64Array(n), relRoughness: new Float64Array(n), anchorF: new Float64Array(n) };
  rows.forEach((row, j) => {
    // The same expressions, in the same order, as pipePressureDrop on this row: the same bits.
    const dM = row.innerDiameterMm / 1000;
    c!.size.push(row.size);
    c!.dM[j] = dM;
    c!.areaM2[j] = (Math.PI * dM * dM) / 4;
    c!.relRoughness[j] = row.roughnessMm / 1000 / dM;
    c!.anchorF[j] = transitionAnchorF(c!.relRoughness[j]!);
  });
  columnsByMaterial.set(material, c);
  return c;
}
const suggestScratch = new Float64Array(PIPE_DROP_SLOTS);

export function suggestSize(ctx: EngineContext, pipeIndex: number, flowM3h: number): string | null {
  const pipe = ctx.doc.pipes[pipeIndex]!;
  const fluid = ctx.fluid!;
  if (!(Math.abs(flowM3h) >= PIPE_NO_FLOW_M3H)) return null;
  const { maxVelocityMps, targetGradientPaPerM } = ctx.doc.design;
  const { densityKgM3, kinematicViscosityM2s } = fluid;
  // pipePressureDrop's own argument checks on the fluid (catalogue rows are valid by construction;
  // length does not enter velocity or gradient).
  if (!(Number.isFinite(densityKgM3) && densityKgM3 > 0)) throw new RangeError(`densityKgM3 must be > 0 and finite, got ${densityKgM3}`);
  if (!(Number.isFinite(kinematicViscosityM2s) && kinematicViscosityM2s > 0)) {
    throw new RangeError(`kinematicViscosityM2s must be > 0 and finite, got ${kinematicViscosityM2s}`);
  }
  const qM3s = Math.abs(flowM3h) / 3600;
  const cat = catalogueColumns(pipe.material);
  const out = suggestScratch;
  for (let j = 0; j < cat.size.length; j++) {
    // Velocity first: it needs no friction factor and rules out most small sizes.
    if (qM3s / cat.areaM2[j]! > maxVelocityMps) continue;
    // Darcy–Weisbach at this size without a result object (pipes/pressure-drop.ts, pipeDropInto).
    pipeDropInto(qM3s, cat.dM[j]!, cat.areaM2[j]!, 1, cat.relRoughness[j]!, densityKgM3, kinematicViscosityM2s, 0, out, 0, cat.anchorF[j]!);
    if (!Number.isFinite(out[2]!)) throw new RangeError(`re must be ≥ 0 and finite, got ${out[2]}`);
    if (Math.abs(out[4]!) <= maxVelocityMps && out[5]! <= targetGradientPaPerM) return cat.size[j]!;
  }
  return null;
}

const resultScratch = new Float64Array(PIPE_DROP_SLOTS);
const positiveFinite = (x: number) => Number.isFinite(x) && x > 0;
const nonNegativeFinite = (x: number) => Number.isFinite(x) && x >= 0;

/**
 * The numbers of pipePressureDrop (Darcy–Weisbach, pipes/pressure-drop.ts) for one pipe at its
 * design flow, without the input and result objects when every argument passes pipePressureDrop's
 * checks (pipeDropInto: same formulas, same bits); otherwise pipePressureDrop itself, which throws
 * its RangeError naming the field.
 */
function pipeDrop(geom: PipeGeometry, flowM3s: number, densityKgM3: number, kinematicViscosityM2s: number, anchors: Map<number, number>) {
  const { innerDiameterM, roughnessM, lengthM, sumK } = geom;
  if (
    !Number.isFinite(flowM3s) ||
    !positiveFinite(innerDiameterM) ||
    !nonNegativeFinite(lengthM) ||
    !nonNegativeFinite(roughnessM) ||
    !positiveFinite(densityKgM3) ||
    !positiveFinite(kinematicViscosityM2s) ||
    !nonNegativeFinite(sumK) ||
    !(roughnessM < innerDiameterM)
  ) {
    const r = pipePressureDrop({ ...geom, flowM3s, densityKgM3, kinematicViscosityM2s });
    return { velocityMps: r.velocityMps, reynolds: r.reynolds, frictionFactor: r.frictionFactor, dpPa: r.dpPa, gradientPaPerM: r.gradientPaPerM };
  }
  const out = resultScratch;
  const rel = roughnessM / innerDiameterM;
  pipeDropInto(flowM3s, innerDiameterM, (Math.PI * innerDiameterM * innerDiameterM) / 4, lengthM, rel, densityKgM3, kinematicViscosityM2s, sumK, out, 0, transitionAnchorIn(anchors, rel));
  if (!Number.isFinite(out[2]!)) throw new RangeError(`re must be ≥ 0 and finite, got ${out[2]}`);
  return { velocityMps: out[4]!, reynolds: out[2]!, frictionFactor: out[3]!, dpPa: out[0]! + out[1]!, gradientPaPerM: out[5]! };
}

/** The one `pipe.no-flow` note, in plain words. */
export function noFlowFinding(ctx: EngineContext, ids: readonly string[]): void {
  if (ids.length === 0) return;
  const n = ids.length;
  ctx.findings.info(
    "pipe.no-flow",
    `${n} pipe${n > 1 ? "s carry" : " carries"} no water when sized — legs to the expansion vessel and other accessories, shut valves, or circuits a mode does not use — so ${n > 1 ? "they have" : "it has"} no Reynolds number, friction factor or size suggestion`,
    ids,
  );
}

/**
 * `noFlow`: where to gather the ids of pipes without flow; without it the finding is raised here.
 * `restsOn`: the assumed values every pipe's flow rests on (design.ts: where loops split it).
 */
export function pipeResults(ctx: EngineContext, q: Float64Array, mode: string, noFlowSink?: string[], restsOn: readonly string[] = []): PipeResult[] {
  const fluid = ctx.fluid!;
  const { design } = ctx.doc;
  const noFlow: string[] = [];
  const anchors = new Map<number, number>();
  const out = ctx.doc.pipes.map((pipe, i) => {
    const k = ctx.model.pipeLink[i]!;
    const raw = q[k]!;
    const flowM3h = Math.abs(raw) < PIPE_NO_FLOW_M3H ? 0 : raw;
    const geom = ctx.pipeGeom[i];
    const flow = fin(flowM3h);
    if (flowM3h === 0) {
      noFlow.push(pipe.id);
      const zero = geom ? 0 : null;
      return { id: pipe.id, flowM3h: 0, velocityMps: zero, reynolds: null, frictionFactor: null, pressureDropKpa: zero, gradientPaPerM: zero, suggestedSize: null, restsOn: [] };
    }
    if (!geom) {
      return { id: pipe.id, flowM3h: flow, velocityMps: null, reynolds: null, frictionFactor: null, pressureDropKpa: null, gradientPaPerM: null, suggestedSize: flow === null ? null : suggestSize(ctx, i, flowM3h), restsOn: [...restsOn] };
    }
    const r = pipeDrop(geom, flowM3h / 3600, fluid.densityKgM3, fluid.kinematicViscosityM2s, anchors);
    const suggested = suggestSize(ctx, i, flowM3h);
    if (Math.abs(r.velocityMps) > design.maxVelocityMps) {
      ctx.findings.warning(
        "pipe.velocity-high",
        `pipe ${pipe.id}: ${Math.abs(r.velocityMps).toFixed(2)} m/s in ${mode} mode is above the ${design.maxVelocityMps} m/s limit${suggested ? `; ${suggested} would do` : ""}`,
        [pipe.id],
        ["design.maxVelocityMps"],
      );
    }
    if (r.gradientPaPerM > design.targetGradientPaPerM) {
      ctx.findings.warning(
        "pipe.gradient-high",
        `pipe ${pipe.id}: ${r.gradientPaPerM.toFixed(0)} Pa/m in ${mode} mode is above the ${design.targetGradientPaPerM} Pa/m target${suggested ? `; ${suggested} would do` : ""}`,
        [pipe.id],
        ["design.targetGradientPaPerM"],
      );
    }
    if (suggested === null && Math.abs(flowM3h) > 1e-9) {
      ctx.findings.warning(
        "pipe.no-size",
        `pipe ${pipe.id}: no ${pipe.material} size in the catalogue meets ${design.maxVelocityMps} m/s and ${design.targetGradientPaPerM} Pa/m at ${Math.abs(flowM3h).toFixed(3)} m³/h`,
        [pipe.id],
        ["design.maxVelocityMps", "design.targetGradientPaPerM"],
      );
    }
    return {
      id: pipe.id,
      flowM3h: flow,
      velocityMps: fin(r.velocityMps),
      reynolds: fin(r.reynolds),
      frictionFactor: fin(r.frictionFactor),
      pressureDropKpa: fin(r.dpPa / 1000),
      gradientPaPerM: fin(r.gradientPaPerM),
      suggestedSize: suggested,
      restsOn: [...restsOn],
    };
  });
  if (noFlowSink) noFlowSink.push(...noFlow);
  else noFlowFinding(ctx, noFlow);
  return out;
}
