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
 * info finding `pipe.no-flow` per mode names all of them.
 */
import { pipeCatalogue, pipePressureDrop } from "@/lib/hydraulics/pipes";
import type { PipeResult } from "@/lib/schematic/results";
import type { EngineContext } from "./context";

const fin = (x: number): number | null => (Number.isFinite(x) ? x : null);

/** Below this |flow| (m³/h) a design pipe flow is solver round-off and is reported as 0. */
export const PIPE_NO_FLOW_M3H = 1e-9;

export function suggestSize(ctx: EngineContext, pipeIndex: number, flowM3h: number): string | null {
  const pipe = ctx.doc.pipes[pipeIndex]!;
  const fluid = ctx.fluid!;
  const geom = ctx.pipeGeom[pipeIndex];
  if (!(Math.abs(flowM3h) >= PIPE_NO_FLOW_M3H)) return null;
  const qM3s = Math.abs(flowM3h) / 3600;
  for (const row of pipeCatalogue[pipe.material]) {
    // Velocity first: it needs no friction factor and rules out most small sizes.
    const dM = row.innerDiameterMm / 1000;
    if (qM3s / ((Math.PI * dM * dM) / 4) > ctx.doc.design.maxVelocityMps) continue;
    const r = pipePressureDrop({
      flowM3s: Math.abs(flowM3h) / 3600,
      innerDiameterM: row.innerDiameterMm / 1000,
      roughnessM: row.roughnessMm / 1000,
      lengthM: geom?.lengthM ?? 1,
      densityKgM3: fluid.densityKgM3,
      kinematicViscosityM2s: fluid.kinematicViscosityM2s,
      sumK: 0,
    });
    if (Math.abs(r.velocityMps) <= ctx.doc.design.maxVelocityMps && r.gradientPaPerM <= ctx.doc.design.targetGradientPaPerM) {
      return row.size;
    }
  }
  return null;
}

export function pipeResults(ctx: EngineContext, q: Float64Array, mode: string): PipeResult[] {
  const fluid = ctx.fluid!;
  const { design } = ctx.doc;
  const noFlow: string[] = [];
  const out = ctx.doc.pipes.map((pipe, i) => {
    const k = ctx.model.linkOfPipe.get(pipe.id)!;
    const raw = q[k]!;
    const flowM3h = Math.abs(raw) < PIPE_NO_FLOW_M3H ? 0 : raw;
    const geom = ctx.pipeGeom[i];
    const flow = fin(flowM3h);
    if (flowM3h === 0) {
      noFlow.push(pipe.id);
      const zero = geom ? 0 : null;
      return { id: pipe.id, flowM3h: 0, velocityMps: zero, reynolds: null, frictionFactor: null, pressureDropKpa: zero, gradientPaPerM: zero, suggestedSize: null };
    }
    if (!geom) {
      return { id: pipe.id, flowM3h: flow, velocityMps: null, reynolds: null, frictionFactor: null, pressureDropKpa: null, gradientPaPerM: null, suggestedSize: flow === null ? null : suggestSize(ctx, i, flowM3h) };
    }
    const r = pipePressureDrop({ ...geom, flowM3s: flowM3h / 3600, densityKgM3: fluid.densityKgM3, kinematicViscosityM2s: fluid.kinematicViscosityM2s });
    const suggested = suggestSize(ctx, i, flowM3h);
    if (Math.abs(r.velocityMps) > design.maxVelocityMps) {
      ctx.findings.warning(
        "pipe.velocity-high",
        `pipe ${pipe.id}: ${Math.abs(r.velocityMps).toFixed(2)} m/s in ${mode} mode is above the ${design.maxVelocityMps} m/s limit${suggested ? `; ${suggested} would do` : ""}`,
        [pipe.id],
      );
    }
    if (r.gradientPaPerM > design.targetGradientPaPerM) {
      ctx.findings.warning(
        "pipe.gradient-high",
        `pipe ${pipe.id}: ${r.gradientPaPerM.toFixed(0)} Pa/m in ${mode} mode is above the ${design.targetGradientPaPerM} Pa/m target${suggested ? `; ${suggested} would do` : ""}`,
        [pipe.id],
      );
    }
    if (suggested === null && Math.abs(flowM3h) > 1e-9) {
      ctx.findings.warning(
        "pipe.no-size",
        `pipe ${pipe.id}: no ${pipe.material} size in the catalogue meets ${design.maxVelocityMps} m/s and ${design.targetGradientPaPerM} Pa/m at ${Math.abs(flowM3h).toFixed(3)} m³/h`,
        [pipe.id],
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
    };
  });
  if (noFlow.length > 0) {
    ctx.findings.info(
      "pipe.no-flow",
      `${noFlow.length} pipe${noFlow.length > 1 ? "s carry" : " carries"} no flow in ${mode} mode (legs to vessels and accessories, shut valves, circuits this mode does not serve): Reynolds number, friction factor and suggested size are left blank`,
      noFlow,
    );
  }
  return out;
}
