/** Workings of a pipe's numbers: design flow by continuity, velocity with Re and f, pressure drop. */
import { darcyFrictionFactor } from "@/lib/hydraulics/friction/darcy";
import { COLEBROOK_SOURCE } from "@/lib/hydraulics/friction/colebrook";
import { REYNOLDS_SOURCE } from "@/lib/hydraulics/friction/reynolds";
import { CRANE_SOURCE, sumFittingsK } from "@/lib/hydraulics/losses";
import { findPipeSize } from "@/lib/hydraulics/pipes/catalogue";
import { DARCY_WEISBACH_SOURCE } from "@/lib/hydraulics/pipes/pressure-drop";
import type { ModeResult, Pipe, Results, Schematic } from "@/lib/schematic";
import { modeOf } from "../overlay/results-mode";
import { assumedLines, f, type Working } from "./working-base";

function bore(pipe: Pipe): { dMm: number | null; epsMm: number | null } {
  const row = findPipeSize(pipe.material, pipe.size);
  return { dMm: pipe.innerDiameterMm ?? row?.innerDiameterMm ?? null, epsMm: pipe.roughnessMm ?? row?.roughnessMm ?? null };
}

function lookup(doc: Schematic, results: Results, pipeId: string, mode?: ModeResult | null) {
  const pipe = doc.pipes.find((p) => p.id === pipeId);
  const r = (mode ?? modeOf(results))?.pipes.find((p) => p.id === pipeId);
  return pipe && r ? { pipe, r, ...bore(pipe) } : null;
}

/** q in a pipe = Σ of the design flows of the loads whose circuits run through it (continuity). */
export function pipeFlowWorking(doc: Schematic, results: Results, pipeId: string, mode: ModeResult | null = modeOf(results)): Working | null {
  const x = lookup(doc, results, pipeId, mode);
  if (!x || !mode) return null;
  const loads = mode.circuits.filter((c) => c.path.includes(pipeId));
  const flows = loads.map((c) => ({ id: c.load, q: mode.parts.find((p) => p.id === c.load)?.flowM3h ?? 0 }));
  const sum = flows.reduce((s, l) => s + l.q, 0);
  const q = Math.abs(x.r.flowM3h ?? 0);
  const loop = Math.abs(sum - q) > 1e-6 * Math.max(1, q);
  return {
    title: `Design flow in pipe ${pipeId}`,
    formula: "q = Σ q_load over the loads whose circuits run through the pipe (continuity)",
    inputs: flows.length > 0 ? flows.map((l) => ({ label: `design flow of ${l.id}`, value: `${f(l.q, 4)} m³/h` })) : [{ label: "loads served", value: "none" }],
    steps: [
      { label: "sum", value: `${f(sum, 4)} m³/h` },
      ...(loop ? [{ label: "on a loop", value: "the split follows the resistances (gradient method)" }] : []),
      ...((x.r.flowM3h ?? 0) < 0 ? [{ label: "sign", value: "negative: the pipe is drawn against the flow" }] : []),
    ],
    result: `${f(x.r.flowM3h, 4)} m³/h`,
    value: x.r.flowM3h,
    source: "Continuity (conservation of mass) at every junction; loads at q = P/(ρ·cp·ΔT)",
    assumed: assumedLines(results, x.r.restsOn),
    figures: { sumM3h: sum, flowM3h: q },
  };
}

/** v = q/A, Re = v·d/ν, f by Colebrook (64/Re laminar). */
export function velocityWorking(doc: Schematic, results: Results, pipeId: string, mode?: ModeResult | null): Working | null {
  const x = lookup(doc, results, pipeId, mode);
  if (!x || x.dMm === null || x.epsMm === null) return null;
  const q = Math.abs(x.r.flowM3h ?? 0);
  const nu = results.fluid.kinematicViscosityM2s;
  const d = x.dMm / 1000;
  const area = (Math.PI * d * d) / 4;
  const v = q / 3600 / area;
  const re = nu ? (v * d) / nu : null;
  const rel = x.epsMm / x.dMm;
  let fr: number | null = null;
  let regime = "";
  try {
    if (re !== null && re > 0) ({ f: fr, regime } = darcyFrictionFactor(re, rel));
  } catch { fr = null; }
  return {
    title: `Velocity, Reynolds number and friction factor in pipe ${pipeId}`,
    formula: "v = q / (π·d²/4),  Re = v·d/ν,  1/√f = −2·log10((ε/d)/3.7 + 2.51/(Re·√f))",
    inputs: [
      { label: "design flow q", value: `${f(q, 4)} m³/h` },
      { label: `inner diameter d (${x.pipe.material} ${x.pipe.size})`, value: `${f(x.dMm, 1)} mm` },
      { label: "roughness ε", value: `${f(x.epsMm, 4)} mm` },
      { label: `kinematic viscosity ν at ${f(results.fluid.temperatureC, 1)} °C`, value: `${nu === null ? "—" : nu.toExponential(4)} m²/s` },
    ],
    steps: [
      { label: "cross-section A = π·d²/4", value: `${area.toExponential(4)} m²` },
      { label: "velocity v = q/A", value: `${f(v, 4)} m/s` },
      { label: "Reynolds number Re", value: re === null ? "—" : re.toFixed(0) },
      { label: "relative roughness ε/d", value: rel.toExponential(3) },
      { label: `friction factor f (${regime || "no flow"})`, value: f(fr, 5) },
    ],
    result: `${f(Math.abs(x.r.velocityMps ?? 0), 2)} m/s (Re ${x.r.reynolds === null ? "—" : x.r.reynolds.toFixed(0)}, f ${f(x.r.frictionFactor, 4)})`,
    value: x.r.velocityMps === null ? null : Math.abs(x.r.velocityMps),
    source: `${REYNOLDS_SOURCE}; friction factor: ${COLEBROOK_SOURCE}`,
    assumed: assumedLines(results, x.r.restsOn),
    figures: { flowM3h: q, innerDiameterMm: x.dMm, roughnessMm: x.epsMm, kinematicViscosityM2s: nu ?? NaN, velocityMps: v, reynolds: re ?? NaN, frictionFactor: fr ?? NaN },
  };
}

/** Δp = (f·L/d + ΣK)·ρv²/2 and the gradient f/d·ρv²/2. */
export function pipeDpWorking(doc: Schematic, results: Results, pipeId: string, mode?: ModeResult | null): Working | null {
  const x = lookup(doc, results, pipeId, mode);
  if (!x) return null;
  const { pipe, r, dMm } = x;
  const rho = results.fluid.densityKgM3;
  let sumK: number | null = null;
  try { sumK = dMm ? sumFittingsK(pipe.fittings, dMm) : null; } catch { sumK = null; }
  const v = Math.abs(r.velocityMps ?? 0);
  const dyn = rho === null ? null : (rho * v * v) / 2;
  const fl = r.frictionFactor === null || dMm === null ? null : (r.frictionFactor * pipe.lengthM) / (dMm / 1000);
  const fittings = Object.entries(pipe.fittings).filter(([, n]) => n > 0).map(([k, n]) => `${n} ${k}`).join(", ");
  return {
    title: `Pressure drop in pipe ${pipe.id}`,
    formula: "Δp = (f·L/d + ΣK) · ρ·v²/2,  gradient = (f/d) · ρ·v²/2",
    inputs: [
      { label: "Darcy friction factor f (Colebrook)", value: f(r.frictionFactor, 5) },
      { label: "length L", value: `${f(pipe.lengthM, 2)} m` },
      { label: `inner diameter d (${pipe.material} ${pipe.size})`, value: `${f(dMm, 1)} mm` },
      { label: `fittings ΣK${fittings ? ` (${fittings})` : ""}`, value: f(sumK, 3) },
      { label: `density ρ at ${f(results.fluid.temperatureC, 1)} °C`, value: `${f(rho, 2)} kg/m³` },
      { label: "velocity v", value: `${f(v, 4)} m/s` },
    ],
    steps: [
      { label: "dynamic pressure ρ·v²/2", value: `${f(dyn, 2)} Pa` },
      { label: "f·L/d", value: f(fl, 4) },
      { label: "friction (f·L/d)·ρv²/2", value: `${f(fl !== null && dyn !== null ? fl * dyn : null, 1)} Pa` },
      { label: "fittings ΣK·ρv²/2", value: `${f(sumK !== null && dyn !== null ? sumK * dyn : null, 1)} Pa` },
      { label: "gradient (f/d)·ρv²/2", value: `${f(r.gradientPaPerM, 1)} Pa/m` },
    ],
    result: `${f(r.pressureDropKpa, 3)} kPa (${f(r.gradientPaPerM, 0)} Pa/m)`,
    value: r.pressureDropKpa,
    source: `${DARCY_WEISBACH_SOURCE}; friction factor: ${COLEBROOK_SOURCE}; fitting K: ${CRANE_SOURCE}`,
    assumed: assumedLines(results, x.r.restsOn),
    figures: { frictionFactor: r.frictionFactor ?? NaN, lengthM: pipe.lengthM, innerDiameterMm: dMm ?? NaN, sumK: sumK ?? NaN, densityKgM3: rho ?? NaN, velocityMps: v },
  };
}
