/** Workings of the plant summary: bypass, expansion vessel, volumes and hot water. */
import { expansionFraction, fluidProperties, fluidSource, waterDensityKgM3, waterSpecificHeatJkgK, WATER_SOURCE, type FluidSpec } from "@/lib/hydraulics/fluids";
import { REHEAT_SOURCE } from "@/lib/hydraulics/hot-water/cylinder";
import { KV_SOURCE } from "@/lib/hydraulics/losses/kv";
import { findPipeSize, pipeWaterVolumeLPerM } from "@/lib/hydraulics/pipes/catalogue";
import { BYPASS_MARGIN_FRACTION, BYPASS_MARGIN_MIN_KPA, BYPASS_RULE } from "@/lib/hydraulics/sizing/bypass-margin";
import { EN12828_SOURCE, en12828FinalPressureBar, en12828Vessel } from "@/lib/hydraulics/vessels/en12828";
import type { Results, Schematic } from "@/lib/schematic";
import { assumedLines, f, type Working, type WorkingLine } from "./working-base";

export function bypassOpeningWorking(doc: Schematic, results: Results): Working | null {
  const b = results.bypass;
  if (!b || b.recommendedOpeningKpa === null) return null;
  const need = Math.max(b.zonesDpKpa ?? -Infinity, b.openZonesDpKpa ?? -Infinity);
  return {
    title: `Opening setting of the bypass ${b.id}`,
    formula: `opening = max(Δp_need·(1 + ${BYPASS_MARGIN_FRACTION}), Δp_need + ${BYPASS_MARGIN_MIN_KPA} kPa),  Δp_need = max(zones at design, pump with every zone open)`,
    inputs: [
      { label: "zones' largest Δp between its ends, at design flow", value: `${f(b.zonesDpKpa, 3)} kPa` },
      { label: "Δp the pump puts across it, every zone open (simulated)", value: `${f(b.openZonesDpKpa, 3)} kPa` },
    ],
    steps: [
      { label: "Δp_need", value: `${f(Number.isFinite(need) ? need : null, 3)} kPa` },
      { label: `+ ${BYPASS_MARGIN_FRACTION * 100} %`, value: `${f(need * (1 + BYPASS_MARGIN_FRACTION), 3)} kPa` },
      { label: `+ ${BYPASS_MARGIN_MIN_KPA} kPa`, value: `${f(need + BYPASS_MARGIN_MIN_KPA, 3)} kPa` },
    ],
    result: `${f(b.recommendedOpeningKpa, 2)} kPa`,
    value: b.recommendedOpeningKpa,
    source: BYPASS_RULE,
    assumed: assumedLines(results, b.restsOn),
    figures: { needKpa: need },
  };
}

/** Flow the heat source keeps with every zone shut: what the "all zones shut" simulation passes through it. */
export function shutFlowWorking(doc: Schematic, results: Results): Working | null {
  const b = results.bypass;
  if (!b || b.heatSourceFlowAllZonesClosedM3h === null) return null;
  const sim = results.scenarios.find((s) => s.name === "all zones shut");
  const part = doc.parts.find((p) => p.id === b.id);
  const bp = sim?.parts.find((p) => p.id === b.id);
  const kvs = part?.type === "dp-bypass-valve" ? part.props.kvs : null;
  const opening = part?.type === "dp-bypass-valve" ? part.props.openingKpa ?? b.recommendedOpeningKpa : null;
  const dp = bp?.pressureDropKpa ?? null;
  const rho = results.fluid.densityKgM3;
  const qBypass = kvs !== null && opening !== null && dp !== null && rho && dp > opening ? kvs * Math.sqrt((dp - opening) / 100 / (rho / 1000)) : 0;
  const others: WorkingLine[] = (sim?.emitters ?? []).filter((e) => Math.abs(e.flowM3h ?? 0) > 1e-6).map((e) => ({ label: `still flowing: ${e.id}`, value: `${f(e.flowM3h, 4)} m³/h` }));
  const sum = qBypass + (sim?.emitters ?? []).reduce((s, e) => s + Math.abs(e.flowM3h ?? 0), 0);
  return {
    title: "Heat-source flow with every zone valve shut",
    formula: "simulated: pump on its curve, zone valves shut; the bypass passes q = Kvs·√((Δp − opening)/100 kPa · 1000/ρ) above its opening",
    inputs: [
      { label: `bypass ${b.id} Kvs`, value: f(kvs, 2) },
      { label: "its opening", value: `${f(opening, 2)} kPa` },
      { label: "Δp across it in the simulation", value: `${f(dp, 3)} kPa` },
      ...others,
    ],
    steps: [
      { label: "bypass flow", value: `${f(qBypass, 4)} m³/h (simulated ${f(bp?.flowM3h, 4)})` },
      { label: "sum of the open paths", value: `${f(sum, 4)} m³/h` },
    ],
    result: `${f(b.heatSourceFlowAllZonesClosedM3h, 3)} m³/h`,
    value: b.heatSourceFlowAllZonesClosedM3h,
    source: `gradient-method simulation (Todini & Pilati, 1988, as in EPANET); valve law: ${KV_SOURCE}`,
    assumed: assumedLines(results, b.restsOn),
    figures: { sumM3h: sum },
  };
}

function vesselSteps(doc: Schematic, results: Results) {
  const v = results.expansionVessel;
  if (!v || !v.systemVolumeL || v.expansionVolumeL === null) return null;
  const d = doc.design;
  const maxC = Math.max(d.maxFlowTemperatureC ?? d.flowTemperatureC, d.hotWaterFlowTemperatureC ?? d.flowTemperatureC, d.flowTemperatureC);
  try {
    const fluid = doc.fluid as FluidSpec;
    const e = Math.max(0, expansionFraction(fluid, d.fillTemperatureC, maxC));
    // The engine's own EN 12828 function with the engine's inputs (no density: 10 m of water per bar).
    const r = en12828Vessel({ systemVolumeL: v.systemVolumeL, expansionFraction: e, staticHeightM: d.staticHeightM, coldFillPressureBar: d.coldFillPressureBar, safetyValveBar: d.safetyValveBar });
    return { e, maxC, r, rhoFill: fluidProperties(fluid, d.fillTemperatureC).densityKgM3, rhoMax: fluidProperties(fluid, maxC).densityKgM3 };
  } catch {
    return null;
  }
}

const finalRule = (sv: number) => (sv <= 5 ? `p_SV − 0.5 bar (p_SV ≤ 5 bar): ${sv} − 0.5` : `0.9·p_SV (p_SV > 5 bar): 0.9 × ${sv}`);

export function vesselWorking(doc: Schematic, results: Results): Working | null {
  const v = results.expansionVessel;
  if (!v) return null;
  const s = vesselSteps(doc, results);
  const sv = doc.design.safetyValveBar;
  return {
    title: "Expansion vessel size",
    formula: "Vn = (Ve + Vwr) · (pe + 1) / (pe − p0),  Ve = e·Vs,  e = ρ(fill)/ρ(max) − 1,  Vwr = max(0.5 %·Vs, 3 L)",
    inputs: [
      { label: "system volume Vs", value: `${f(v.systemVolumeL, 1)} L` },
      { label: `fill ${doc.design.fillTemperatureC} °C → highest ${f(s?.maxC, 0)} °C: ρ`, value: `${f(s?.rhoFill, 2)} → ${f(s?.rhoMax, 2)} kg/m³` },
      { label: "static height h", value: `${f(doc.design.staticHeightM, 1)} m` },
      { label: "safety valve p_SV", value: `${f(sv, 2)} bar g` },
    ],
    steps: [
      { label: "expansion e", value: `${f(s ? s.e * 100 : null, 3)} %` },
      { label: "expansion volume Ve", value: `${f(v.expansionVolumeL, 2)} L` },
      { label: "water reserve Vwr", value: `${f(s?.r.waterReserveL, 2)} L` },
      { label: "pre-charge p0 = h/10 + 0.2 bar", value: `${f(v.recommendedPrechargeBar, 2)} bar g` },
      { label: `final pressure pe = ${finalRule(sv)}`, value: `${f(en12828FinalPressureBar(sv), 2)} bar g` },
    ],
    result: `${f(v.requiredVolumeL, 2)} L required (${f(v.providedVolumeL, 1)} L drawn)`,
    value: v.requiredVolumeL,
    source: `${EN12828_SOURCE}; densities: ${fluidSource(doc.fluid as FluidSpec)}`,
    assumed: assumedLines(results, v.restsOn),
    figures: { systemVolumeL: v.systemVolumeL ?? NaN, expansionFraction: s?.e ?? NaN, prechargeBar: v.recommendedPrechargeBar ?? NaN, finalPressureBar: en12828FinalPressureBar(sv) },
  };
}

export function prechargeWorking(doc: Schematic, results: Results): Working | null {
  const v = results.expansionVessel;
  if (!v || v.recommendedPrechargeBar === null) return null;
  const h = doc.design.staticHeightM;
  return {
    title: "Pre-charge to set on the expansion vessel",
    formula: "p0 = p_st + 0.2 bar,  p_st = h / 10 m per bar (vapour pressure nil below 100 °C)",
    inputs: [{ label: "static height above the vessel h", value: `${f(h, 2)} m` }],
    steps: [{ label: "static pressure p_st", value: `${f(h / 10, 3)} bar` }],
    result: `${f(v.recommendedPrechargeBar, 2)} bar g`,
    value: v.recommendedPrechargeBar,
    source: EN12828_SOURCE,
    figures: { staticHeightM: h },
  };
}

/** The water each part holds, as the engine counted it: given, typical (an assumption) or not counted. */
function partWater(doc: Schematic, results: Results): { id: string; litres: number; how: string }[] {
  const typical = new Map((results.assumptions ?? []).filter((a) => a.kind === "water").map((a) => [a.part, a.value]));
  const out: { id: string; litres: number; how: string }[] = [];
  for (const part of doc.parts) {
    const p = part.props as Record<string, unknown>;
    if (part.type === "buffer-vessel" || part.type === "low-loss-header") out.push({ id: part.id, litres: part.props.volumeL, how: "its volume" });
    else if (part.type === "ufh-loop") out.push({ id: part.id, litres: pipeWaterVolumeLPerM(part.props.innerDiameterMm) * part.props.loopLengthM, how: `loop pipe, ${part.props.loopLengthM} m of ${part.props.innerDiameterMm} mm bore` });
    else {
      const given = typeof p.waterVolumeL === "number" ? p.waterVolumeL : part.type === "cylinder" ? part.props.coilWaterVolumeL : null;
      if (typeof given === "number") out.push({ id: part.id, litres: given, how: "given" });
      else if (typical.has(part.id)) out.push({ id: part.id, litres: typical.get(part.id)!, how: "typical value assumed" });
    }
  }
  return out.filter((x) => x.litres !== 0 || x.how !== "given");
}

export function systemVolumeWorking(doc: Schematic, results: Results): Working | null {
  const total = results.volume.systemL;
  if (total === null) return null;
  let pipesL = 0;
  for (const pipe of doc.pipes) {
    const d = pipe.innerDiameterMm ?? findPipeSize(pipe.material, pipe.size)?.innerDiameterMm;
    if (d && d >= 1 && pipe.lengthM > 0) pipesL += pipeWaterVolumeLPerM(d) * pipe.lengthM;
  }
  const parts = partWater(doc, results);
  const sum = pipesL + parts.reduce((s, x) => s + x.litres, 0);
  return {
    title: "System water volume",
    formula: "Vs = Σ pipes π·d²/4·L + Σ UFH loops π·d²/4·L + Σ water content of the parts",
    inputs: [
      { label: `${doc.pipes.length} pipes, π·d²/4·L each`, value: `${f(pipesL, 2)} L` },
      ...parts.map((x) => ({ label: `${x.id} (${x.how})`, value: `${f(x.litres, 2)} L` })),
    ],
    steps: [{ label: "sum", value: `${f(sum, 2)} L` }],
    result: `${f(total, 1)} L`,
    value: total,
    source: "Geometry (inner volume of each pipe from its catalogue bore) and the parts' water contents; typical values from the engine's table",
    assumed: assumedLines(results, results.volume.restsOn),
    figures: { sumL: sum },
  };
}

export function minVolumeWorking(doc: Schematic, results: Results): Working | null {
  const min = results.volume.minimumL;
  if (min === null) return null;
  const sources = doc.parts.filter((p) => p.type === "heat-pump" || p.type === "boiler");
  return {
    title: "Minimum system volume",
    formula: "V_min = the largest minimum stated by a heat source (its maker's defrost or short-cycling figure); buffer when Vs < V_min",
    inputs: sources.map((s) => ({ label: s.id, value: `${f((s.props as { minSystemVolumeL: number | null }).minSystemVolumeL, 0)} L` })),
    steps: [{ label: "system volume Vs", value: `${f(results.volume.systemL, 1)} L` }],
    result: `${f(min, 0)} L`,
    value: min,
    source: "the heat source maker's stated minimum water volume (as typed on the heat source)",
  };
}

export function reheatWorking(doc: Schematic, results: Results): Working | null {
  const hw = results.hotWater;
  const cyl = doc.parts.find((p) => p.id === hw?.id);
  if (!hw || hw.reheatMinutes === null || cyl?.type !== "cylinder") return null;
  const c = cyl.props;
  const sourceKw = doc.parts.reduce((s, p) => s + (p.type === "heat-pump" || p.type === "boiler" ? p.props.ratedOutputKw : 0), 0);
  const coil = sourceKw > 0 ? Math.min(c.coilOutputKw, sourceKw) : c.coilOutputKw;
  const meanC = (c.coldWaterC + c.storeTemperatureC) / 2;
  const rho = waterDensityKgM3(meanC);
  const cp = waterSpecificHeatJkgK(meanC);
  const energyJ = (c.volumeL / 1000) * rho * cp * (c.storeTemperatureC - c.coldWaterC);
  return {
    title: `Reheat time of ${cyl.label ?? cyl.id}`,
    formula: "t = V·ρ·cp·(θ_store − θ_cold) / P,  P = min(coil output, heat source output)",
    inputs: [
      { label: "stored volume V", value: `${f(c.volumeL, 0)} L` },
      { label: "cold feed θ_cold → store θ_store", value: `${f(c.coldWaterC, 1)} → ${f(c.storeTemperatureC, 1)} °C` },
      { label: `water ρ and cp at ${f(meanC, 1)} °C`, value: `${f(rho, 2)} kg/m³, ${f(cp, 1)} J/(kg·K)` },
      { label: "coil output / heat source output", value: `${f(c.coilOutputKw, 2)} / ${f(sourceKw, 2)} kW` },
    ],
    steps: [
      { label: "energy to store", value: `${f(energyJ / 3.6e6, 3)} kWh` },
      { label: "power P", value: `${f(coil, 2)} kW` },
    ],
    result: `${f(hw.reheatMinutes, 1)} min`,
    value: hw.reheatMinutes,
    source: `${REHEAT_SOURCE}; water: ${WATER_SOURCE}`,
    figures: { energyJ, powerW: coil * 1000 },
  };
}
