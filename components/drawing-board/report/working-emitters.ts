/** Workings of emitter outputs at the design temperatures: radiators (EN 442), floors (EN 1264), fixed loads. */
import { EN1264_SOURCE, en1264HeatFluxWm2, EN442_NOMINAL_LMTD_K, EN442_SOURCE, lmtdK } from "@/lib/hydraulics/emitters";
import { HEAT_BALANCE_SOURCE } from "@/lib/hydraulics/flow";
import type { Part, Results, Schematic } from "@/lib/schematic";
import { f, type Working } from "./working-base";

const returnOf = (doc: Schematic, own: number | null) => doc.design.flowTemperatureC - (own ?? doc.design.flowTemperatureC - doc.design.returnTemperatureC);

function radiator(doc: Schematic, part: Extract<Part, { type: "radiator" }>, r: Results["emitters"][number]): Working {
  const p = part.props;
  const t1 = doc.design.flowTemperatureC;
  const t2 = returnOf(doc, p.deltaTK);
  let lmtd: number | null = null;
  try { lmtd = lmtdK(t1, t2, p.roomTemperatureC); } catch { lmtd = null; }
  const ratio = lmtd === null ? null : lmtd / EN442_NOMINAL_LMTD_K;
  return {
    title: `Output of ${part.label ?? part.id} at design temperatures`,
    formula: "Φ = Φ50 · (ΔT_ln / ΔT_n)^n,  ΔT_ln = (t1 − t2) / ln((t1 − tr)/(t2 − tr)),  ΔT_n = ΔT_ln(75/65/20) = 49.83 K",
    inputs: [
      { label: "rated output Φ50 (75/65/20 °C)", value: `${f(p.outputAtDt50W, 0)} W` },
      { label: "exponent n", value: f(p.exponentN, 2) },
      { label: "flow t1 / return t2 / room tr", value: `${f(t1, 1)} / ${f(t2, 1)} / ${f(p.roomTemperatureC, 1)} °C` },
      { label: "room heat load", value: `${f(r.heatLoadW, 0)} W` },
    ],
    steps: [
      { label: "log-mean excess ΔT_ln", value: `${f(lmtd, 3)} K` },
      { label: "ΔT_ln / ΔT_n", value: f(ratio, 4) },
      { label: "(ΔT_ln / ΔT_n)^n", value: f(ratio === null ? null : ratio ** p.exponentN, 4) },
    ],
    result: `${f(r.outputAtDesignW, 0)} W`,
    value: r.outputAtDesignW,
    source: EN442_SOURCE,
    figures: { outputAtDt50W: p.outputAtDt50W, exponentN: p.exponentN, lmtdK: lmtd ?? NaN, nominalLmtdK: EN442_NOMINAL_LMTD_K },
  };
}

function floor(doc: Schematic, part: Extract<Part, { type: "ufh-loop" }>, r: Results["emitters"][number]): Working {
  const p = part.props;
  const dT = p.deltaTK ?? doc.design.flowTemperatureC - doc.design.returnTemperatureC;
  const meanWater = doc.design.flowTemperatureC - dT / 2;
  const surface = Math.min(p.maxSurfaceTemperatureC, meanWater);
  const flux = en1264HeatFluxWm2(surface, p.roomTemperatureC);
  const capacity = p.floorAreaM2 === null ? null : p.floorAreaM2 * flux;
  return {
    title: `Output of ${part.label ?? part.id} at design temperatures`,
    formula: p.floorAreaM2 === null
      ? "no floor area: output = the heat load its design flow carries (q·ρ·cp·ΔT), not checked against the floor"
      : "q = 8.92·(θF,m − θi)^1.1 W/m² at θF,m = min(surface limit, mean water);  output = min(load, A·q)",
    inputs: [
      { label: "heat load", value: `${f(p.heatLoadW, 0)} W` },
      { label: "floor area A", value: p.floorAreaM2 === null ? "not given" : `${f(p.floorAreaM2, 2)} m²` },
      { label: "surface limit / mean water / room", value: `${f(p.maxSurfaceTemperatureC, 1)} / ${f(meanWater, 1)} / ${f(p.roomTemperatureC, 1)} °C` },
    ],
    steps: p.floorAreaM2 === null ? [] : [
      { label: "mean surface θF,m", value: `${f(surface, 1)} °C` },
      { label: "heat flux q", value: `${f(flux, 1)} W/m²` },
      { label: "floor capacity A·q", value: `${f(capacity, 0)} W` },
    ],
    result: `${f(r.outputAtDesignW, 0)} W`,
    value: r.outputAtDesignW,
    source: p.floorAreaM2 === null ? HEAT_BALANCE_SOURCE : EN1264_SOURCE,
    figures: { heatLoadW: p.heatLoadW, capacityW: capacity ?? NaN },
  };
}

export function emitterWorking(doc: Schematic, results: Results, partId: string): Working | null {
  const part = doc.parts.find((p) => p.id === partId);
  const r = results.emitters.find((e) => e.id === partId);
  if (!part || !r) return null;
  if (part.type === "radiator") return radiator(doc, part, r);
  if (part.type === "ufh-loop") return floor(doc, part, r);
  if (part.type !== "fan-coil" && part.type !== "heat-load") return null;
  return {
    title: `Output of ${part.label ?? part.id} at design`,
    formula: "a fixed load: its design flow q = P/(ρ·cp·ΔT) carries its heat load, so the output is the load",
    inputs: [{ label: "heat load P", value: `${f(part.props.heatLoadW, 0)} W` }],
    result: `${f(r.outputAtDesignW, 0)} W`,
    value: r.outputAtDesignW,
    source: HEAT_BALANCE_SOURCE,
    figures: { heatLoadW: part.props.heatLoadW },
  };
}
