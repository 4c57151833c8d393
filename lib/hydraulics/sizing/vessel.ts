/**
 * System water volume, the expansion vessel (EN 12828 Annex D via
 * vessels/en12828.ts) and the heat source's minimum system volume.
 * System volume = every pipe's inner volume (πd²/4·L) + each UFH loop's pipe
 * (πd²/4·loop length) + the water content of the parts (heat source,
 * buffer/header, radiators, loads, cylinder coil): the designer's value, else
 * the typical value (typical/typical-values.ts), which the result then names
 * in `restsOn`; a part with no safe typical value (a boiler, a heat load) is
 * not counted, and says so (input.not-counted).
 */
import { expansionFraction, type FluidSpec } from "@/lib/hydraulics/fluids";
import { pipeWaterVolumeLPerM } from "@/lib/hydraulics/pipes";
import { en12828MinimumFillPressureBar, en12828Vessel } from "@/lib/hydraulics/vessels";
import type { Results } from "@/lib/schematic/results";
import type { EngineContext } from "./context";

export interface SystemVolume {
  /** pipes + UFH loops + parts, L */
  volumeL: number;
  /** pipe water (πd²/4·L summed over the pipes drawn), L */
  pipesL: number;
  /** UFH loop pipe water, L */
  loopsL: number;
  /** refs of the typical water contents included */
  restsOn: string[];
}

export function systemVolume(ctx: EngineContext): SystemVolume {
  let pipesL = 0;
  ctx.doc.pipes.forEach((pipe, i) => {
    const g = ctx.pipeGeom[i];
    if (g && g.lengthM > 0) pipesL += pipeWaterVolumeLPerM(g.innerDiameterM * 1000) * g.lengthM;
  });
  let loopsL = 0;
  let partsL = 0;
  const restsOn: string[] = [];
  const assumed = new Set(ctx.inputs.assumptions.filter((a) => a.kind === "water").map((a) => a.part));
  for (let index = 0; index < ctx.doc.parts.length; index++) {
    const part = ctx.doc.parts[index]!;
    if (part.type === "buffer-vessel" || part.type === "low-loss-header") partsL += part.props.volumeL;
    else if (part.type === "ufh-loop") loopsL += pipeWaterVolumeLPerM(part.props.innerDiameterMm) * part.props.loopLengthM;
    else {
      const v = ctx.inputs.waterL[index]!;
      if (Number.isNaN(v)) continue;
      partsL += v;
      if (assumed.has(part.id)) restsOn.push(ctx.inputs.assumptions.find((a) => a.part === part.id && a.kind === "water")!.ref);
    }
  }
  return { volumeL: pipesL + loopsL + partsL, pipesL, loopsL, restsOn };
}

export function vesselResult(ctx: EngineContext, sys: SystemVolume): Results["expansionVessel"] {
  const volumeL = sys.volumeL;
  const { doc, findings } = ctx;
  const vessels = doc.parts.filter((p) => p.type === "expansion-vessel");
  const provided = vessels.length ? vessels.reduce((s, p) => s + (p.props as { volumeL: number }).volumeL, 0) : null;
  const maxC = Math.max(doc.design.maxFlowTemperatureC ?? doc.design.flowTemperatureC, doc.design.hotWaterFlowTemperatureC ?? doc.design.flowTemperatureC, doc.design.flowTemperatureC);
  let r: ReturnType<typeof en12828Vessel> | null = null;
  try {
    const e = expansionFraction(doc.fluid as FluidSpec, doc.design.fillTemperatureC, maxC);
    r = en12828Vessel({
      systemVolumeL: volumeL,
      expansionFraction: Math.max(0, e),
      staticHeightM: doc.design.staticHeightM,
      coldFillPressureBar: doc.design.coldFillPressureBar,
      safetyValveBar: doc.design.safetyValveBar,
    });
  } catch (e) {
    findings.error("vessel.not-sizable", `expansion vessel: cannot be sized (${(e as Error).message})`, vessels.map((v) => v.id), ["design.staticHeightM", "design.safetyValveBar"]);
  }
  const ok = r && provided !== null ? provided >= r.nominalVolumeL : null;
  if (ok === false) {
    findings.error(
      "vessel.too-small",
      `expansion vessel: ${provided} L provided, EN 12828 needs ${r!.nominalVolumeL.toFixed(1)} L for ${volumeL.toFixed(0)} L of system water heated to ${maxC} °C`,
      vessels.map((v) => v.id),
    );
  }
  if (r) {
    // Fill pressure against the vessel actually drawn (its volume holds the water reserve), else the required one.
    const volume = provided !== null && provided > r.waterReserveL ? provided : r.nominalVolumeL;
    const minFill = en12828MinimumFillPressureBar(volume, r.prechargeBar, r.waterReserveL);
    const fill = doc.design.coldFillPressureBar;
    if (fill < minFill || fill >= r.finalPressureBar) {
      findings.warning(
        "vessel.fill-pressure",
        `design: cold fill ${fill} bar is outside ${minFill.toFixed(2)}–${r.finalPressureBar.toFixed(2)} bar for a ${volume.toFixed(1)} L vessel pre-charged to ${r.prechargeBar.toFixed(2)} bar (EN 12828 Annex D)`,
        vessels.map((v) => v.id),
        ["design.coldFillPressureBar"],
      );
    }
  }
  const fin = (x: number | undefined | null) => (x !== undefined && x !== null && Number.isFinite(x) ? x : null);
  return {
    systemVolumeL: fin(volumeL),
    expansionVolumeL: fin(r?.expansionVolumeL),
    requiredVolumeL: fin(r?.nominalVolumeL),
    recommendedPrechargeBar: fin(r?.prechargeBar),
    providedVolumeL: provided,
    ok,
    restsOn: sys.restsOn,
  };
}

export function volumeResult(ctx: EngineContext, sys: SystemVolume): Results["volume"] {
  const volumeL = sys.volumeL;
  const sources = ctx.doc.parts.filter((p) => p.type === "heat-pump" || p.type === "boiler");
  const mins = sources
    .map((p) => (p.props as { minSystemVolumeL: number | null }).minSystemVolumeL)
    .filter((v): v is number => v !== null);
  const minimumL = mins.length ? Math.max(...mins) : null;
  const bufferRecommended = minimumL === null ? null : volumeL < minimumL;
  if (bufferRecommended) {
    ctx.findings.warning(
      "system.volume-low",
      `system volume ${volumeL.toFixed(0)} L is below the heat source's minimum ${minimumL} L: add a buffer vessel (defrost, short cycling)`,
      sources.map((s) => s.id),
    );
  }
  return { systemL: Number.isFinite(volumeL) ? volumeL : null, minimumL, bufferRecommended, restsOn: sys.restsOn };
}
