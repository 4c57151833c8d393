/**
 * Per-pipe design results: velocity, Reynolds number, friction factor, pressure
 * drop and gradient at the design flow (Darcy–Weisbach, pipes/pressure-drop.ts),
 * and the suggested size: the smallest catalogue size of the same material
 * whose velocity ≤ design.maxVelocityMps and friction gradient ≤
 * design.targetGradientPaPerM (CIBSE Guide B-style limits, references.md §9).
 */
import { pipeCatalogue, pipePressureDrop } from "@/lib/hydraulics/pipes";
import type { PipeResult } from "@/lib/schematic/results";
import type { EngineContext } from "./context";

const fin = (x: number): number | null => (Number.isFinite(x) ? x : null);

export function suggestSize(ctx: EngineContext, pipeIndex: number, flowM3h: number): string | null {
  const pipe = ctx.doc.pipes[pipeIndex]!;
  const fluid = ctx.fluid!;
  const geom = ctx.pipeGeom[pipeIndex];
  if (Math.abs(flowM3h) < 1e-9) return null;
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
  return ctx.doc.pipes.map((pipe, i) => {
    const k = ctx.model.linkOfPipe.get(pipe.id)!;
    const flowM3h = q[k]!;
    const geom = ctx.pipeGeom[i];
    const flow = fin(flowM3h);
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
}
