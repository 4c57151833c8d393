/**
 * The resistance (Kv) and water content the engine uses for every part: the
 * designer's value where given, else the typical value of typical-values.ts
 * (recorded as an assumption that the dependent numbers cite), else nothing,
 * recorded as "not counted". Built once per calculation.
 */
import { craneFt } from "@/lib/hydraulics/losses/crane";
import { kvForLossCoefficient, kvForPressureDrop } from "@/lib/hydraulics/losses/kv";
import { flowForHeat } from "@/lib/hydraulics/flow";
import { NO_FLOW_M3H, type PipeGeometry } from "@/lib/hydraulics/network/behaviour";
import { splitPortRef } from "@/lib/schematic/parts";
import type { Part, Schematic } from "@/lib/schematic/schema";
import type { Assumption } from "@/lib/schematic/results";
import { meterQpForBore, typicalValues, type TypicalRule, type TypicalValue } from "./typical-values";

export interface FluidForTypical {
  densityKgM3: number;
  specificHeatJkgK: number;
}

export interface ResolvedInputs {
  /**
   * By doc.parts index: Kv used for its own resistance field (given or typical); NaN: not counted.
   * Typed arrays, not maps by id: one slot per part costs no hashing and no growing table.
   */
  kv: Float64Array;
  /** by doc.parts index: water content used, L (given or typical); NaN: not counted */
  waterL: Float64Array;
  assumptions: Assumption[];
  /** part id → ref ("part.field") of its assumed Kv, for the hydraulic numbers resting on it */
  kvRefOfPart: Map<string, string>;
  notCounted: { part: string; field: string; kind: "resistance" | "water"; basis: string }[];
}

const fields = new Map<string, TypicalValue[]>();
for (const t of typicalValues) fields.set(t.type, [...(fields.get(t.type) ?? []), t]);

/** Smallest bore (mm) of the pipes joined to the part's ports, or null when none is usable. */
function boresOf(doc: Schematic, geom: (PipeGeometry | null)[]): Map<string, number> {
  const out = new Map<string, number>();
  doc.pipes.forEach((pipe, i) => {
    const g = geom[i];
    if (!g) return;
    for (const end of [pipe.from, pipe.to]) {
      const { partId } = splitPortRef(end);
      const d = g.innerDiameterM * 1000;
      out.set(partId, Math.min(out.get(partId) ?? Infinity, d));
    }
  });
  return out;
}

interface Ctx {
  bore: number | undefined;
  fluid: FluidForTypical | null;
  deltaTK: number | null;
}

/** Design flow of the part itself (m³/h) for a "Δp at its flow" rule, or null. */
function ownFlowM3h(part: Part, c: Ctx): number | null {
  const p = part.props as Record<string, unknown>;
  const own = typeof p.deltaTK === "number" ? p.deltaTK : c.deltaTK;
  const w = typeof p.ratedOutputKw === "number" ? p.ratedOutputKw * 1000 : typeof p.heatLoadW === "number" ? p.heatLoadW : null;
  if (!c.fluid || own === null || !(own > 0) || w === null || !(w > 0)) return null;
  return flowForHeat({ powerW: w, deltaTK: own, ...c.fluid }) * 3600;
}

/** The typical value and the working that gives it, or null when the part lacks what the rule needs. */
function typicalValue(part: Part, rule: TypicalRule, c: Ctx): { value: number; working: string } | null {
  const p = part.props as Record<string, unknown>;
  switch (rule.kind) {
    case "fixed-kv":
      return { value: rule.kv, working: `Kv ${rule.kv}` };
    case "crane-k":
    case "fixed-k": {
      if (c.bore === undefined) return null;
      const fT = rule.kind === "crane-k" ? craneFt(c.bore) : null;
      const k = rule.kind === "crane-k" ? rule.nFt * fT! : rule.k;
      const kv = kvForLossCoefficient(k, c.bore);
      const kText = rule.kind === "crane-k" ? `K = ${rule.nFt}·fT = ${rule.nFt} × ${fT} = ${k.toFixed(3)}` : `K ${k}`;
      return { value: kv, working: `${kText} at ${c.bore.toFixed(1)} mm bore → Kv = 3600·A·√(200/K) = ${kv.toFixed(2)}` };
    }
    case "meter-qp": {
      if (c.bore === undefined) return null;
      const qp = meterQpForBore(c.bore);
      const kv = qp / Math.sqrt(rule.dpAtQpKpa / 100);
      return { value: kv, working: `qp ${qp} m³/h for a ${c.bore.toFixed(1)} mm bore, ${rule.dpAtQpKpa} kPa at qp → Kv = qp/√(Δp/100 kPa) = ${kv.toFixed(2)}` };
    }
    case "dp-at-flow": {
      const q = ownFlowM3h(part, c);
      // Below no flow a "Δp at its flow" Kv tends to 0 and its resistance past any float (a rating of 1e-300 kW).
      if (q === null || !c.fluid || q < NO_FLOW_M3H) return null;
      const kv = kvForPressureDrop(q, rule.dpKpa * 1000, c.fluid.densityKgM3);
      return { value: kv, working: `${rule.dpKpa} kPa at its flow ${q.toFixed(3)} m³/h → Kv = q·√((ρ/1000)/(Δp/100 kPa)) = ${kv.toFixed(2)}` };
    }
    case "litres-per-kw": {
      const raw = p[rule.per];
      if (typeof raw !== "number") return null;
      const kw = rule.per.endsWith("Kw") ? raw : raw / 1000;
      const litres = rule.litresPerKw * kw;
      return { value: litres, working: `${rule.litresPerKw} L/kW × ${kw.toFixed(2)} kW = ${litres.toFixed(1)} L` };
    }
  }
}

function store(out: ResolvedInputs, kind: "resistance" | "water", index: number, v: number): void {
  if (kind === "resistance") out.kv[index] = v;
  else out.waterL[index] = v;
}

export function resolveInputs(doc: Schematic, geom: (PipeGeometry | null)[], fluid: FluidForTypical | null, deltaTK: number | null): ResolvedInputs {
  const n = doc.parts.length;
  const out: ResolvedInputs = { kv: new Float64Array(n).fill(NaN), waterL: new Float64Array(n).fill(NaN), assumptions: [], kvRefOfPart: new Map(), notCounted: [] };
  let bores: Map<string, number> | null = null;
  for (let index = 0; index < n; index++) {
    const part = doc.parts[index]!;
    const rows = fields.get(part.type);
    const props = part.props as Record<string, unknown>;
    for (const row of rows ?? []) {
      const given = props[row.field];
      if (typeof given === "number") {
        store(out, row.kind, index, given);
        continue;
      }
      if (row.empty === "computed") continue;
      if (row.empty === "not-counted" || !row.rule) {
        out.notCounted.push({ part: part.id, field: row.field, kind: row.kind, basis: row.basis });
        continue;
      }
      bores ??= boresOf(doc, geom);
      const t = typicalValue(part, row.rule, { bore: bores.get(part.id), fluid, deltaTK });
      if (t === null || !Number.isFinite(t.value) || !(t.value > 0)) continue; // unconnected or no load: nothing flows through it
      store(out, row.kind, index, t.value);
      const ref = `${part.id}.${row.field}`;
      out.assumptions.push({
        ref, part: part.id, field: row.field, kind: row.kind, value: t.value,
        unit: row.kind === "resistance" ? "Kv (m³/h at 1 bar)" : "L", basis: row.basis, working: t.working, source: row.source ?? "",
      });
      if (row.kind === "resistance") out.kvRefOfPart.set(part.id, ref);
    }
    // Parts with a Kv field the table does not cover keep their own (nullable) value.
    if (Number.isNaN(out.kv[index]) && typeof props.kv === "number") out.kv[index] = props.kv;
  }
  return out;
}

/** Refs of the assumed Kv values of these parts (every part when none are named): what hydraulic numbers rest on. */
export function resistanceRefs(inputs: ResolvedInputs, partIds?: Iterable<string>): string[] {
  if (inputs.kvRefOfPart.size === 0) return [];
  if (!partIds) return [...inputs.kvRefOfPart.values()];
  const refs = new Set<string>();
  for (const id of partIds) {
    const ref = inputs.kvRefOfPart.get(id);
    if (ref) refs.add(ref);
  }
  return [...refs];
}
