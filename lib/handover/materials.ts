/**
 * The materials list of a schematic, to order and price from (client-safe, pure):
 * - pipes by material and size: the net length as drawn, plus an allowance for offcuts
 *   and waste (default 10 % — common practice for pipework take-offs, not a published
 *   value; the firm changes it per list);
 * - fittings by kind and size: elbows, bends and reducers from each pipe's fitting counts;
 *   tees are the tee parts drawn (sized by the pipes on their ports). A pipe's teeRun /
 *   teeBranch counts are the pressure losses of passing through those same tees, so they
 *   are not counted again;
 * - parts by type with the props that matter when ordering (connection size, Kv, volume,
 *   output), grouped when they are the same.
 */
import { partRegistry, splitPortRef, type Part, type Schematic } from "@/lib/schematic";

export const DEFAULT_ALLOWANCE_PCT = 10;

export interface MaterialLine {
  kind: "pipe" | "fitting" | "part";
  /** Stable id of the line ("pipe:copper:22", "fitting:elbow:copper:22", "part:zone-valve:28:kvs=6"). */
  key: string;
  /** Words for people ("Copper pipe 22", "Elbow, copper 22", "Zone valve 28, Kvs 6"). */
  description: string;
  material?: string;
  size?: string;
  /** Fitting kind or part type. */
  type?: string;
  /** A part's ordering props (Kvs, volumeL, …). */
  props?: Record<string, number | string>;
  /** Pipes: net length as drawn, m. */
  lengthM?: number;
  allowancePct?: number;
  /** Pipes: net length plus the allowance (m, to the centimetre); others: how many. */
  orderQuantity: number;
  unit: "m" | "each";
  /** From the price list, when one matched: its code, unit price and the line's total. */
  code?: string;
  price?: number;
  total?: number;
}

const round = (n: number, d: number) => Math.round(n * 10 ** d) / 10 ** d;

export const materialWords: Record<string, string> = { copper: "Copper", steel: "Steel", pex: "PE-X", multilayer: "Multilayer" };
const fittingWords: Record<string, string> = { elbow: "Elbow", bend: "Bend", reducer: "Reducer", tee: "Tee" };

/** Sizes in catalogue order: numbers by value ("10" < "22" < "108"), then text. */
export function compareSize(a: string, b: string): number {
  const na = Number.parseFloat(a.replace(/^DN/i, ""));
  const nb = Number.parseFloat(b.replace(/^DN/i, ""));
  return Number.isFinite(na) && Number.isFinite(nb) && na !== nb ? na - nb : a.localeCompare(b);
}

/** The props a supplier asks for, per part type (others need only the type and connection size). */
const orderingProps: Partial<Record<Part["type"], string[]>> = {
  "heat-pump": ["ratedOutputKw"], boiler: ["ratedOutputKw"],
  "zone-valve": ["kvs"], "diverter-valve": ["kvs"], "dp-bypass-valve": ["kvs"],
  "balancing-valve": ["kv"], "isolation-valve": ["kv"], "check-valve": ["kv"], strainer: ["kv"], "magnetic-filter": ["kv"], "heat-meter": ["kv"],
  "buffer-vessel": ["volumeL"], "low-loss-header": ["volumeL"], "expansion-vessel": ["volumeL"],
  cylinder: ["volumeL", "coilOutputKw"], radiator: ["outputAtDt50W"], "ufh-loop": ["loopLengthM"], "fan-coil": ["heatLoadW"],
  "safety-valve": ["setBar"],
};
const propWords: Record<string, (v: number) => string> = {
  ratedOutputKw: (v) => `${v} kW`, kvs: (v) => `Kvs ${v}`, kv: (v) => `Kv ${v}`, volumeL: (v) => `${v} L`, coilOutputKw: (v) => `coil ${v} kW`,
  outputAtDt50W: (v) => `${v} W at ΔT 50 K`, loopLengthM: (v) => `${v} m loop`, heatLoadW: (v) => `${v} W`, setBar: (v) => `${v} bar`,
};

function pipeSizesAt(doc: Schematic): Map<string, { material: string; size: string }[]> {
  const at = new Map<string, { material: string; size: string }[]>();
  for (const p of doc.pipes) {
    for (const ref of [p.from, p.to]) {
      const id = splitPortRef(ref).partId;
      at.set(id, [...(at.get(id) ?? []), { material: p.material, size: p.size }]);
    }
  }
  return at;
}

function pipeLines(doc: Schematic, allowancePct: number): MaterialLine[] {
  const net = new Map<string, { material: string; size: string; lengthM: number }>();
  for (const p of doc.pipes) {
    const key = `pipe:${p.material}:${p.size}`;
    const row = net.get(key) ?? { material: p.material, size: p.size, lengthM: 0 };
    row.lengthM += Math.max(0, p.lengthM);
    net.set(key, row);
  }
  return [...net.entries()].map(([key, r]) => {
    const lengthM = round(r.lengthM, 3);
    return { kind: "pipe" as const, key, description: `${materialWords[r.material] ?? r.material} pipe ${r.size}`, material: r.material, size: r.size,
      lengthM, allowancePct, orderQuantity: round(lengthM * (1 + allowancePct / 100), 2), unit: "m" as const };
  });
}

function fittingLines(doc: Schematic, sizesAt: Map<string, { material: string; size: string }[]>): MaterialLine[] {
  const counts = new Map<string, { type: string; material: string; size: string; n: number }>();
  const add = (type: string, material: string, size: string, n: number) => {
    if (n <= 0) return;
    const key = `fitting:${type}:${material}:${size}`;
    const row = counts.get(key) ?? { type, material, size, n: 0 };
    row.n += n;
    counts.set(key, row);
  };
  for (const p of doc.pipes) for (const k of ["elbow", "bend", "reducer"] as const) add(k, p.material, p.size, p.fittings[k]);
  for (const part of doc.parts) {
    if (part.type !== "tee") continue;
    const on = [...(sizesAt.get(part.id) ?? [])].sort((a, b) => compareSize(b.size, a.size));
    if (!on.length) continue;
    add("tee", on[0]!.material, on.map((s) => s.size).join("×"), 1);
  }
  return [...counts.entries()].map(([key, r]) => ({ kind: "fitting" as const, key,
    description: `${fittingWords[r.type]}, ${materialWords[r.material] ?? r.material} ${r.size}`, material: r.material, size: r.size, type: r.type,
    orderQuantity: r.n, unit: "each" as const }));
}

function partLines(doc: Schematic, sizesAt: Map<string, { material: string; size: string }[]>): MaterialLine[] {
  const lines = new Map<string, MaterialLine>();
  for (const part of doc.parts) {
    if (part.type === "tee") continue;
    const sizes = [...new Set((sizesAt.get(part.id) ?? []).map((s) => s.size))].sort((a, b) => compareSize(b, a));
    const size = sizes.length ? sizes.join("×") : undefined;
    const props: Record<string, number> = {};
    for (const k of orderingProps[part.type] ?? []) {
      const v = (part.props as Record<string, unknown>)[k];
      if (typeof v === "number" && Number.isFinite(v)) props[k] = v;
    }
    const key = `part:${part.type}:${size ?? "-"}:${Object.entries(props).map(([k, v]) => `${k}=${v}`).join(",")}`;
    const had = lines.get(key);
    if (had) { had.orderQuantity += 1; continue; }
    const words = [size, ...Object.entries(props).map(([k, v]) => propWords[k]?.(v) ?? `${k} ${v}`)].filter(Boolean).join(", ");
    lines.set(key, { kind: "part", key, description: `${partRegistry[part.type]?.label ?? part.type}${words ? `, ${words}` : ""}`, type: part.type,
      ...(size ? { size } : {}), props, orderQuantity: 1, unit: "each" });
  }
  return [...lines.values()];
}

/** Every line of the list, pipes then fittings then parts, each in a stable order. */
export function materialLines(doc: Schematic, allowancePct = DEFAULT_ALLOWANCE_PCT): MaterialLine[] {
  const sizesAt = pipeSizesAt(doc);
  const byMaterialSize = (a: MaterialLine, b: MaterialLine) =>
    (a.material ?? "").localeCompare(b.material ?? "") || (a.type ?? "").localeCompare(b.type ?? "") || compareSize(a.size ?? "", b.size ?? "");
  const parts = partLines(doc, sizesAt).sort((a, b) => (a.type ?? "").localeCompare(b.type ?? "") || a.key.localeCompare(b.key));
  return [...pipeLines(doc, allowancePct).sort(byMaterialSize), ...fittingLines(doc, sizesAt).sort(byMaterialSize), ...parts];
}
