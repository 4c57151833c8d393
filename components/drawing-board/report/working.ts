/**
 * "Show working" for a number in the sizing report: the formula, the inputs
 * as this schematic gives them, the engine's answer and the published source.
 * Inputs are read from the document and results; where a formula step is an
 * engine function (ΣK, LMTD, the EN 12828 vessel), that function is called
 * rather than re-typed, so the working can never drift from the engine.
 */
import { EN442_NOMINAL_LMTD_K, lmtdK } from "@/lib/hydraulics/emitters";
import { sumFittingsK } from "@/lib/hydraulics/losses";
import { findPipeSize } from "@/lib/hydraulics/pipes/catalogue";
import { en12828Vessel } from "@/lib/hydraulics/vessels";
import type { Part, Results, Schematic } from "@/lib/schematic";
import { modeOf } from "../overlay/results-mode";

export interface Working {
  title: string;
  formula: string;
  inputs: { label: string; value: string }[];
  result: string;
  source: string;
}

const f = (n: number | null | undefined, d = 2) => (n === null || n === undefined || !Number.isFinite(n) ? "—" : n.toFixed(d));

export function pipeDpWorking(doc: Schematic, results: Results, pipeId: string): Working | null {
  const pipe = doc.pipes.find((p) => p.id === pipeId);
  const r = modeOf(results)?.pipes.find((p) => p.id === pipeId);
  if (!pipe || !r) return null;
  const dMm = pipe.innerDiameterMm ?? findPipeSize(pipe.material, pipe.size)?.innerDiameterMm ?? null;
  const rho = results.fluid.densityKgM3;
  let sumK: number | null = null;
  try { sumK = dMm ? sumFittingsK(pipe.fittings, dMm) : null; } catch { sumK = null; }
  return {
    title: `Pressure drop in pipe ${pipe.id}`,
    formula: "Δp = (f·L/d + ΣK) · ρ·v²/2",
    inputs: [
      { label: "Darcy friction factor f (Colebrook)", value: f(r.frictionFactor, 4) },
      { label: "length L", value: `${f(pipe.lengthM, 1)} m` },
      { label: `inner diameter d (${pipe.material} ${pipe.size})`, value: `${f(dMm, 1)} mm` },
      { label: "fittings ΣK (Crane TP-410, K = n·fT)", value: f(sumK, 2) },
      { label: "density ρ", value: `${f(rho, 1)} kg/m³` },
      { label: "velocity v", value: `${f(r.velocityMps, 3)} m/s` },
    ],
    result: `${f(r.pressureDropKpa, 3)} kPa (${f(r.gradientPaPerM, 0)} Pa/m)`,
    source: "Darcy–Weisbach equation; friction factor by Colebrook (1939), J. Inst. Civ. Eng. 11; fitting K by Crane Co., Technical Paper No. 410, Appendix A.",
  };
}

type Load = Extract<Part, { type: "radiator" | "ufh-loop" | "fan-coil" | "heat-load" }>;

export function designFlowWorking(doc: Schematic, results: Results, partId: string): Working | null {
  const part = doc.parts.find((p): p is Load => p.id === partId && ["radiator", "ufh-loop", "fan-coil", "heat-load"].includes(p.type));
  if (!part) return null;
  const dT = (part.props as { deltaTK?: number | null }).deltaTK ?? doc.design.flowTemperatureC - doc.design.returnTemperatureC;
  const flow = modeOf(results)?.parts.find((p) => p.id === partId)?.flowM3h ?? null;
  return {
    title: `Design flow of ${part.label ?? part.id}`,
    formula: "q = P / (ρ · cp · ΔT)",
    inputs: [
      { label: "heat load P", value: `${f(part.props.heatLoadW, 0)} W` },
      { label: "density ρ", value: `${f(results.fluid.densityKgM3, 1)} kg/m³` },
      { label: "specific heat cp", value: `${f(results.fluid.specificHeatJkgK, 0)} J/(kg·K)` },
      { label: "ΔT = flow − return", value: `${f(dT, 1)} K` },
      { label: "fluid properties at", value: `${f(results.fluid.temperatureC, 1)} °C (mean of flow and return)` },
    ],
    result: `${f(flow, 3)} m³/h`,
    source: "Steady-flow energy balance Φ = ṁ·cp·ΔT; water properties IAPWS-95 / IAPWS 2008.",
  };
}

export function emitterWorking(doc: Schematic, results: Results, partId: string): Working | null {
  const part = doc.parts.find((p) => p.id === partId);
  const r = results.emitters.find((e) => e.id === partId);
  if (!part || part.type !== "radiator" || !r) return null;
  const p = part.props;
  const t1 = doc.design.flowTemperatureC;
  const t2 = t1 - (p.deltaTK ?? t1 - doc.design.returnTemperatureC);
  let lmtd: number | null = null;
  try { lmtd = lmtdK(t1, t2, p.roomTemperatureC); } catch { lmtd = null; }
  return {
    title: `Output of ${part.label ?? part.id} at design temperatures`,
    formula: "Φ = Φ50 · (ΔT_ln / 49.83 K)^n,  ΔT_ln = (t1 − t2) / ln((t1 − tr)/(t2 − tr))",
    inputs: [
      { label: "rated output Φ50 (75/65/20 °C)", value: `${f(p.outputAtDt50W, 0)} W` },
      { label: "exponent n", value: f(p.exponentN, 2) },
      { label: "flow t1 / return t2 / room tr", value: `${f(t1, 1)} / ${f(t2, 1)} / ${f(p.roomTemperatureC, 1)} °C` },
      { label: "log-mean excess ΔT_ln", value: `${f(lmtd, 2)} K (nominal ${f(EN442_NOMINAL_LMTD_K, 2)} K)` },
      { label: "room heat load", value: `${f(r.heatLoadW, 0)} W` },
    ],
    result: `${f(r.outputAtDesignW, 0)} W`,
    source: "EN 442-2:2014, characteristic equation of heating appliances (log-mean temperature difference).",
  };
}

export function vesselWorking(doc: Schematic, results: Results): Working | null {
  const v = results.expansionVessel;
  if (!v) return null;
  // Re-run the engine's EN 12828 function on the engine's own volumes for the intermediate terms.
  let steps: { waterReserveL: number; finalPressureBar: number } | null = null;
  try {
    if (v.systemVolumeL && v.expansionVolumeL !== null) {
      steps = en12828Vessel({ systemVolumeL: v.systemVolumeL, expansionFraction: v.expansionVolumeL / v.systemVolumeL,
        staticHeightM: doc.design.staticHeightM, coldFillPressureBar: doc.design.coldFillPressureBar,
        safetyValveBar: doc.design.safetyValveBar, densityKgM3: results.fluid.densityKgM3 ?? undefined });
    }
  } catch { steps = null; }
  const reserve = steps?.waterReserveL ?? null;
  const pe = steps?.finalPressureBar ?? null;
  return {
    title: "Expansion vessel size",
    formula: "Vn = (Ve + Vwr) · (pe + 1) / (pe − p0),  Ve = e·Vs,  Vwr = max(0.5 %·Vs, 3 L)",
    inputs: [
      { label: "system volume Vs", value: `${f(v.systemVolumeL, 1)} L` },
      { label: "expansion volume Ve", value: `${f(v.expansionVolumeL, 2)} L` },
      { label: "water reserve Vwr", value: `${f(reserve, 2)} L` },
      { label: "pre-charge p0 (static height + 0.2 bar)", value: `${f(v.recommendedPrechargeBar, 2)} bar g` },
      { label: "final pressure pe (safety valve − 0.5 bar)", value: `${f(pe, 2)} bar g` },
      { label: "vessel drawn", value: `${f(v.providedVolumeL, 1)} L` },
    ],
    result: `${f(v.requiredVolumeL, 2)} L required`,
    source: "EN 12828:2012+A1:2014, Annex D (diaphragm expansion vessels).",
  };
}
