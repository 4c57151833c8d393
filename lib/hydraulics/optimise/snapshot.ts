/**
 * Before/after figures of a document: pipe cost Σ price × length, every
 * pump's duty in every mode, the largest required head, and (life-cost) the
 * pumps' energy over the life. From the engine's own design modes.
 */
import type { PipeMaterial } from "@/lib/hydraulics/pipes/catalogue";
import type { Schematic } from "@/lib/schematic/schema";
import { largestRequiredHead, type EngineView, type PumpDutyView } from "./engine-view";
import { energyCostPerKpa } from "./life-cost";
import type { OptimiseOptions } from "./options";
import type { PriceList } from "./prices";

export interface Snapshot {
  /** Σ price × length of every pipe, in the price list's currency */
  cost: number;
  /** the largest required head over every pump and mode (the index circuit), kPa */
  requiredHeadKpa: number | null;
  pumps: (PumpDutyView & { limitKpa: number | null })[];
  /** life-cost objective only: energy cost of pumping over the life, and cost + energy */
  energyCost?: number;
  lifeCost?: number;
}

/** Σ price × length; pipes with no price anywhere are listed (and count 0). */
export function pipeCost(doc: Schematic, prices: PriceList): { cost: number; unpriced: string[] } {
  let cost = 0;
  const unpriced: string[] = [];
  for (const p of doc.pipes) {
    const price = prices.costing(p.material as PipeMaterial, p.size);
    if (price === null) unpriced.push(p.id);
    else cost += price * p.lengthM;
  }
  return { cost, unpriced };
}

/** The duty a pump's energy is counted at: heating mode when it runs in it, else its other mode. */
export function energyDuties(pumps: readonly PumpDutyView[]): PumpDutyView[] {
  const out = new Map<string, PumpDutyView>();
  for (const d of pumps) if (!out.has(d.id) || d.mode === "heating") out.set(d.id, d);
  return [...out.values()];
}

export function snapshot(doc: Schematic, view: EngineView, options: OptimiseOptions, prices: PriceList): Snapshot {
  const { cost } = pipeCost(doc, prices);
  const pumps = view.pumps.map((d) => ({ ...d, limitKpa: d.availableHeadKpa === null ? null : d.availableHeadKpa - options.headMarginKpa }));
  const out: Snapshot = { cost, requiredHeadKpa: largestRequiredHead(view), pumps };
  if (options.objective === "life-cost") {
    let energy = 0;
    for (const d of energyDuties(view.pumps)) {
      if (d.designFlowM3h && d.requiredHeadKpa !== null) energy += energyCostPerKpa(d.designFlowM3h, options.lifeCost) * d.requiredHeadKpa;
    }
    out.energyCost = energy;
    out.lifeCost = cost + energy;
  }
  return out;
}

/** Why a document breaks a limit (velocity in a mode, a pump's head), or null when it meets them all. */
export function violations(doc: Schematic, view: EngineView, options: OptimiseOptions): { message: string; refs: string[] }[] {
  const out: { message: string; refs: string[] }[] = [];
  const maxV = doc.design.maxVelocityMps;
  for (const run of view.runs) {
    for (const r of run.result.pipes) {
      if (r.velocityMps !== null && Math.abs(r.velocityMps) > maxV) out.push({ message: `pipe ${r.id}: ${Math.abs(r.velocityMps).toFixed(3)} m/s in ${run.result.mode} mode`, refs: [r.id] });
    }
  }
  for (const d of view.pumps) {
    if (d.requiredHeadKpa === null) continue;
    if (d.availableHeadKpa === null || d.requiredHeadKpa > d.availableHeadKpa - options.headMarginKpa + 1e-6) {
      out.push({ message: `${d.id}: needs ${d.requiredHeadKpa.toFixed(2)} kPa in ${d.mode} mode, ${d.availableHeadKpa === null ? "head unknown" : `${(d.availableHeadKpa - options.headMarginKpa).toFixed(2)} kPa allowed`}`, refs: [d.id] });
    }
  }
  return out;
}
