/**
 * Where each circuit's balancing Kv is set on site, and to what. The Kv to burn
 * comes from the kept results (circuits[].balancingKv, lib/hydraulics/sizing/circuits.ts);
 * nothing is sized again here.
 *
 * The valve to set: a balancing valve that lies on that circuit alone; otherwise the
 * load's own valve (a radiator's lockshield, a fan coil's or load's valve). That valve
 * is already in the sized path with its drawn Kv, so the extra resistance goes in
 * series with it: Kv_set = 1/√(1/Kv_drawn² + 1/Kv_balancing²) (kvInSeries, IEC 60534-1
 * definition applied to each device). A valve drawn without a Kv passed the flow freely
 * in the sizing, so it is set to the balancing Kv itself.
 */
import { kvInSeries } from "@/lib/hydraulics/losses/kv";
import type { Part, Results, Schematic } from "@/lib/schematic";
import { turnsForKv, valveModel } from "@/lib/schematic/valve-models";
import type { SiteSetting } from "./types";

export interface BalancingTarget {
  circuitLoad: string;
  index: boolean;
  balancingKv: number | null;
  excessKpa: number | null;
}

/** Part id → the balancing duty it carries (its circuit's), from the heating mode first. */
export function balancingTargets(doc: Schematic, results: Results): Map<string, BalancingTarget> {
  const byId = new Map(doc.parts.map((p) => [p.id, p]));
  const count = new Map<string, number>();
  const circuits = results.modes.flatMap((m) => m.circuits);
  for (const c of circuits) for (const id of new Set(c.path)) count.set(id, (count.get(id) ?? 0) + 1);
  const out = new Map<string, BalancingTarget>();
  const seen = new Set<string>();
  for (const c of circuits) {
    if (seen.has(c.load)) continue;
    seen.add(c.load);
    const own = c.path.find((id) => byId.get(id)?.type === "balancing-valve" && count.get(id) === 1);
    const at = own ?? c.load;
    out.set(at, { circuitLoad: c.load, index: c.index, balancingKv: c.balancingKv, excessKpa: c.excessKpa });
  }
  return out;
}

/** The Kv already in the sized path for a valve part (null: none drawn, it passed freely). */
function drawnKv(part: Part): number | null {
  const p = part.props as { valveKv?: number | null; kv?: number | null };
  if (part.type === "radiator") return p.valveKv ?? null;
  return p.kv ?? null;
}

const where = (part: Part) =>
  part.type === "radiator" ? "Lockshield preset" : part.type === "ufh-loop" ? "Loop balancing (at the manifold)" : "Balancing preset";

export function balancingSetting(part: Part, t: BalancingTarget): SiteSetting {
  const label = where(part);
  if (t.index) return { key: "balancing", label, value: "Fully open", detail: "index circuit: nothing to burn" };
  if (t.balancingKv === null) return { key: "balancing", label, value: "Fully open", detail: "less than 0.1 kPa to burn" };
  const existing = drawnKv(part);
  const kv = existing === null ? t.balancingKv : kvInSeries(existing, t.balancingKv);
  const burn = t.excessKpa === null ? "" : `burns ${t.excessKpa.toFixed(1)} kPa`;
  const setting: SiteSetting = { key: "balancing", label, value: `Kv ${kv.toFixed(2)}`, detail: burn };
  const model = valveModel((part.props as { valveModel?: string }).valveModel);
  if (!model) return setting;
  const turns = turnsForKv(model, kv);
  if (turns.ok) return { ...setting, detail: `${turns.turns.toFixed(1)} turns open on the ${model.name}; ${burn}` };
  const limit = turns.reason === "below-range" ? "below the smallest" : "above the largest";
  return { ...setting, warn: `Kv ${kv.toFixed(2)} is ${limit} Kv of the ${model.name} (${turns.limitKv}): ask the designer.` };
}
