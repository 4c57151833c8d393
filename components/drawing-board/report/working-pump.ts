/** Workings of a pump duty: head needed, head available off the curve, and the setting that meets the duty. */
import { AFFINITY_SOURCE, PUMP_OVERSIZE_MARGIN } from "@/lib/hydraulics/pumps/affinity";
import { PUMP_CURVE_SOURCE, pumpHeadKpa, SERIES_SOURCE, seriesCurve, type PumpCurve } from "@/lib/hydraulics/pumps/curve";
import type { ModeResult, PumpDuty, Results, Schematic } from "@/lib/schematic";
import { assumedLines, f, type Working } from "./working-base";

export function curveOf(doc: Schematic, id: string): PumpCurve {
  const part = doc.parts.find((p) => p.id === id);
  if (part?.type === "pump") return part.props.curve ?? [];
  if (part?.type === "heat-pump" || part?.type === "boiler") return part.props.pumpCurve ?? [];
  return [];
}

/** Head needed = the largest circuit drop among the circuits this pump drives (its index circuit). */
export function requiredHeadWorking(doc: Schematic, results: Results, mode: ModeResult, d: PumpDuty): Working | null {
  if (d.requiredHeadKpa === null) return null;
  const circuits = mode.circuits.filter((c) => c.pump === d.id && c.pressureDropKpa !== null);
  const max = circuits.reduce((m, c) => Math.max(m, c.pressureDropKpa!), 0);
  return {
    title: `Head needed from ${d.id} (${mode.mode})`,
    formula: "H_required = max over its circuits of Δp_circuit (the index circuit)",
    inputs: circuits.map((c) => ({ label: `circuit through ${c.load}${c.index ? " (index)" : ""}`, value: `${f(c.pressureDropKpa, 3)} kPa` })),
    steps: [{ label: "largest", value: `${f(max, 3)} kPa` }],
    result: `${f(d.requiredHeadKpa, 3)} kPa at ${f(d.designFlowM3h, 3)} m³/h`,
    value: d.requiredHeadKpa,
    source: "The pump must give the pressure drop of its index circuit at the design flow (circuits in parallel see the same head)",
    assumed: assumedLines(results, d.restsOn),
    figures: { maxCircuitKpa: max },
  };
}

/** The two curve points either side of q, and the head between them. */
function bracket(curve: PumpCurve, q: number) {
  for (let i = 1; i < curve.length; i++) if (q <= curve[i]![0]) return { a: curve[i - 1]!, b: curve[i]! };
  return null;
}

/** Head available: the curve drawn, read at the design flow by linear interpolation. */
export function availableHeadWorking(doc: Schematic, results: Results, mode: ModeResult, d: PumpDuty): Working | null {
  const curve = curveOf(doc, d.id);
  const q = d.designFlowM3h;
  if (curve.length < 2 || q === null || d.availableHeadKpa === null) return null;
  const br = bracket(curve, q);
  let h: number | null = null;
  try { h = pumpHeadKpa(curve, q); } catch { h = null; }
  return {
    title: `Head available from ${d.id} (${mode.mode})`,
    formula: "H(q) = H₀ + (q − q₀)/(q₁ − q₀) · (H₁ − H₀), between the curve points either side of q",
    inputs: [
      { label: "design flow q", value: `${f(q, 4)} m³/h` },
      { label: "point below (q₀, H₀)", value: br ? `${f(br.a[0], 3)} m³/h, ${f(br.a[1], 2)} kPa` : "—" },
      { label: "point above (q₁, H₁)", value: br ? `${f(br.b[0], 3)} m³/h, ${f(br.b[1], 2)} kPa` : "beyond the curve" },
    ],
    steps: [
      { label: "head of this curve at q", value: `${f(h, 3)} kPa` },
      ...(h !== null && Math.abs(h - d.availableHeadKpa) > 1e-9 ? [{ label: "with the other pumps in series on this side", value: `${f(d.availableHeadKpa, 3)} kPa` }] : []),
    ],
    result: `${f(d.availableHeadKpa, 3)} kPa`,
    value: d.availableHeadKpa,
    source: PUMP_CURVE_SOURCE,
    figures: { flowM3h: q, q0: br?.a[0] ?? NaN, h0: br?.a[1] ?? NaN, q1: br?.b[0] ?? NaN, h1: br?.b[1] ?? NaN },
  };
}

/** The setting that meets the duty: speed by the affinity laws, or the head to set in constant-pressure mode. */
export function pumpSettingWorking(doc: Schematic, results: Results, mode: ModeResult, d: PumpDuty): Working | null {
  if (d.requiredHeadKpa === null || d.designFlowM3h === null || d.availableHeadKpa === null) return null;
  const n = d.speedFraction;
  const q = d.designFlowM3h;
  // pumps in series on the side: their summed curve, all at the one speed
  const series = d.pumpIds.length > 1;
  let atSpeed: number | null = null;
  try {
    const curve = series ? seriesCurve(d.pumpIds.map((id) => curveOf(doc, id))) : curveOf(doc, d.id);
    atSpeed = n ? pumpHeadKpa(curve, q / n) : null;
  } catch { atSpeed = null; }
  const surplus = d.surplusKpa ?? d.availableHeadKpa - d.requiredHeadKpa;
  return {
    title: `Setting for ${d.id} (${mode.mode})`,
    formula: "at speed n the curve is H_n(q) = n²·H(q/n); n solves n²·H(q/n) = H_required. Constant pressure: set H_required",
    inputs: [
      { label: "design flow q", value: `${f(q, 4)} m³/h` },
      { label: "head needed", value: `${f(d.requiredHeadKpa, 3)} kPa` },
      { label: "head available at full curve", value: `${f(d.availableHeadKpa, 3)} kPa` },
    ],
    steps: [
      { label: "surplus", value: `${f(surplus, 2)} kPa (${d.requiredHeadKpa > 0 ? f((surplus / d.requiredHeadKpa) * 100, 0) : "—"} %; oversized beyond ${PUMP_OVERSIZE_MARGIN * 100} %)` },
      { label: "q/n", value: n ? `${f(q / n, 4)} m³/h` : "—" },
      ...(series ? [{ label: "pumps in series", value: `${d.pumpIds.join(" + ")}: heads added at one flow` }] : []),
      { label: series ? "H(q/n) on their summed curve" : "H(q/n) on the curve drawn", value: `${f(atSpeed, 3)} kPa` },
      { label: "n²·H(q/n)", value: `${f(n && atSpeed !== null ? n * n * atSpeed : null, 3)} kPa` },
      { label: "constant-pressure head to set", value: `${f(d.constantPressureHeadKpa, 2)} kPa` },
    ],
    result: n ? `${f(n * 100, 1)} % speed, or ${f(d.constantPressureHeadKpa, 1)} kPa constant pressure` : "no slower setting found on the curve drawn",
    value: n,
    source: `${AFFINITY_SOURCE}${series ? `; ${SERIES_SOURCE}` : ""}; the ${PUMP_OVERSIZE_MARGIN * 100} % margin is common practice`,
    assumed: assumedLines(results, d.restsOn),
    figures: { flowM3h: q, requiredKpa: d.requiredHeadKpa, speedFraction: n ?? NaN, headAtQOverN: atSpeed ?? NaN },
  };
}
