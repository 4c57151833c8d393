/**
 * What the engine does with a part's resistance or water content when the
 * designer leaves it empty: a stated typical value, "not counted" (no value is
 * safe: the numbers that would include it say they exclude it), or "computed"
 * (sizing really works it out). One row per part type and field; the board's
 * forms read the same table to say what an empty field does.
 *
 * Each typical value carries its basis: a published source, or "common
 * practice, from memory" where no single published figure exists. Values that
 * depend on size are stated per size (velocity heads at the connected pipe's
 * bore, a pressure drop at the part's own flow, litres per kW).
 */
import type { PartType } from "@/lib/schematic/schema";

export type TypicalRule =
  /** K = n·fT velocity heads at the bore of the pipe it sits in (Crane TP-410 K = n·fT method) */
  | { kind: "crane-k"; nFt: number }
  /** a fixed K (velocity heads) at the bore of the pipe it sits in */
  | { kind: "fixed-k"; k: number }
  /** a fixed Kv, m³/h at 1 bar */
  | { kind: "fixed-kv"; kv: number }
  /** Kv that loses dpKpa at the part's own design flow (heat source: rated output at the design ΔT) */
  | { kind: "dp-at-flow"; dpKpa: number }
  /** a heat meter sized to its pipe, at the pressure-loss limit at its permanent flow qp */
  | { kind: "meter-qp"; dpAtQpKpa: number }
  /** water content in litres per kW of `per` (a prop in kW or W) */
  | { kind: "litres-per-kw"; litresPerKw: number; per: string };

export type EmptyMeans = "typical" | "not-counted" | "computed";

export interface TypicalValue {
  type: PartType;
  field: string;
  kind: "resistance" | "water";
  empty: EmptyMeans;
  rule?: TypicalRule;
  /** what is assumed (or why nothing is), in words for the form and the finding */
  basis: string;
  /** published source, or "common practice, from memory" */
  source?: string;
}

const COMMON = "common practice, from memory";

export const typicalValues: readonly TypicalValue[] = [
  {
    type: "heat-pump", field: "kv", kind: "resistance", empty: "typical", rule: { kind: "dp-at-flow", dpKpa: 20 },
    basis: "plate heat exchanger losing 20 kPa at the heat pump's rated flow (rated output at the design ΔT); makers' sheets give about 15–30 kPa. If the pump curve typed is already the head left at the connections, type a Kv of 1000 so the drop is not counted twice",
    source: COMMON,
  },
  {
    type: "boiler", field: "kv", kind: "resistance", empty: "not-counted",
    basis: "boiler heat exchangers range from a negligible drop (cast-iron sections) to tens of kPa (low-content exchangers), so no typical value is safe",
  },
  {
    type: "heat-pump", field: "waterVolumeL", kind: "water", empty: "typical", rule: { kind: "litres-per-kw", litresPerKw: 0.3, per: "ratedOutputKw" },
    basis: "0.3 L per kW of rated output (a monobloc unit's plate exchanger and internal pipework)", source: COMMON,
  },
  {
    type: "boiler", field: "waterVolumeL", kind: "water", empty: "not-counted",
    basis: "boiler water content ranges from under 1 L to over 100 L, so no typical value is safe",
  },
  {
    type: "isolation-valve", field: "kv", kind: "resistance", empty: "typical", rule: { kind: "crane-k", nFt: 3 },
    basis: "full-bore ball valve, K = 3·fT at the bore of the pipe it sits in",
    source: "Crane Co., Technical Paper No. 410, Appendix A (ball valve, β = 1)",
  },
  {
    type: "check-valve", field: "kv", kind: "resistance", empty: "typical", rule: { kind: "crane-k", nFt: 100 },
    basis: "swing check valve, K = 100·fT at the bore of the pipe it sits in (spring-loaded ones lose more)",
    source: "Crane Co., Technical Paper No. 410, Appendix A (swing check valve)",
  },
  {
    type: "strainer", field: "kv", kind: "resistance", empty: "typical", rule: { kind: "fixed-k", k: 3 },
    basis: "clean Y-strainer, K = 3 at the bore of the pipe it sits in (a part-blocked screen loses several times more)", source: COMMON,
  },
  {
    type: "magnetic-filter", field: "kv", kind: "resistance", empty: "typical", rule: { kind: "fixed-k", k: 5 },
    basis: "in-line magnetic filter / dirt separator, clean, K = 5 at the bore of the pipe it sits in", source: COMMON,
  },
  {
    type: "heat-meter", field: "kv", kind: "resistance", empty: "typical", rule: { kind: "meter-qp", dpAtQpKpa: 25 },
    basis: "a meter sized to its pipe (bore ≤ 16 mm: qp 1.5 m³/h; ≤ 22: 2.5; ≤ 28: 3.5; ≤ 37: 6; ≤ 44: 10; larger: 15) at the 25 kPa pressure-loss limit at qp",
    source: "EN 1434-1, pressure-loss limit at qp (from memory); meter size per bore is common practice",
  },
  {
    type: "balancing-valve", field: "kv", kind: "resistance", empty: "computed",
    basis: "sizing computes the preset that absorbs its circuit's excess pressure",
  },
  {
    type: "radiator", field: "valveKv", kind: "resistance", empty: "typical", rule: { kind: "fixed-kv", kv: 1 },
    basis: "radiator valve pair (thermostatic valve at a 2 K proportional band and an open lockshield) with Kv 1.0", source: COMMON,
  },
  {
    type: "radiator", field: "waterVolumeL", kind: "water", empty: "typical", rule: { kind: "litres-per-kw", litresPerKw: 3.5, per: "outputAtDt50W" },
    basis: "3.5 L per kW of EN 442 output at ΔT 50 K (steel panel radiators hold about 3–4 L/kW)", source: COMMON,
  },
  {
    type: "fan-coil", field: "kv", kind: "resistance", empty: "typical", rule: { kind: "dp-at-flow", dpKpa: 20 },
    basis: "water coil losing 20 kPa at its design flow (fan-coil coils are usually selected for 10–30 kPa)", source: COMMON,
  },
  {
    type: "fan-coil", field: "waterVolumeL", kind: "water", empty: "typical", rule: { kind: "litres-per-kw", litresPerKw: 0.5, per: "heatLoadW" },
    basis: "0.5 L per kW of heat load (a fan-coil water coil)", source: COMMON,
  },
  {
    type: "heat-load", field: "kv", kind: "resistance", empty: "not-counted",
    basis: "a heat load stands for any emitter, so no typical resistance is safe",
  },
  {
    type: "heat-load", field: "waterVolumeL", kind: "water", empty: "not-counted",
    basis: "a heat load stands for any emitter, so no typical water content is safe",
  },
  {
    type: "cylinder", field: "coilWaterVolumeL", kind: "water", empty: "typical", rule: { kind: "litres-per-kw", litresPerKw: 0.6, per: "coilOutputKw" },
    basis: "0.6 L per kW of coil output (a heat-pump cylinder's smooth-tube coil)", source: COMMON,
  },
];

const byKey = new Map(typicalValues.map((t) => [`${t.type}.${t.field}`, t]));

/** The table row for a part type's field, if the engine has a rule for leaving it empty. */
export function typicalFor(type: PartType, field: string): TypicalValue | undefined {
  return byKey.get(`${type}.${field}`);
}

/** Permanent flow qp (m³/h) of a heat meter sized to a pipe of this bore (common practice). */
export function meterQpForBore(innerDiameterMm: number): number {
  const steps: [number, number][] = [[16, 1.5], [22, 2.5], [28, 3.5], [37, 6], [44, 10]];
  return steps.find(([bore]) => innerDiameterMm <= bore)?.[1] ?? 15;
}
