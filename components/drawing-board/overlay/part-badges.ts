/**
 * The one number a part shows on the drawing in the view chosen: an emitter's
 * output, a heat source's or cylinder coil's flow, the flow a bypass passes.
 * Pure; memoised on its inputs so every part node of a large board reads one map.
 */
import type { Part, Results } from "@/lib/schematic";
import { showFlow, type UnitPrefs } from "@/lib/units/display";
import { emittersInView, partsInView } from "./results-view";

export interface PartBadge { text: string; warn: boolean }

const EMITTERS = new Set(["radiator", "ufh-loop", "fan-coil", "heat-load"]);
const FLOWS = new Set(["heat-pump", "boiler", "cylinder", "dp-bypass-valve"]);

const watts = (w: number) => (Math.abs(w) >= 1000 ? `${(w / 1000).toFixed(2)} kW` : `${w.toFixed(0)} W`);

export function partBadges(results: Results | null, parts: readonly Part[], view: string, prefs: UnitPrefs): Map<string, PartBadge> {
  const out = new Map<string, PartBadge>();
  if (!results) return out;
  const output = new Map(emittersInView(results, view).map((e) => [e.id, e]));
  const flow = new Map(partsInView(results, view).map((p) => [p.id, p.flowM3h]));
  for (const part of parts) {
    if (EMITTERS.has(part.type)) {
      const e = output.get(part.id);
      if (e?.outputW === null || e?.outputW === undefined) continue;
      out.set(part.id, { text: watts(e.outputW), warn: e.heatLoadW !== null && e.outputW < e.heatLoadW * 0.995 });
    } else if (FLOWS.has(part.type)) {
      const q = flow.get(part.id);
      if (q === null || q === undefined) continue;
      const min = (part.props as { minFlowM3h?: number }).minFlowM3h;
      const below = min !== undefined && Math.abs(q) < min;
      out.set(part.id, { text: `${showFlow(Math.abs(q), prefs).text}${below ? " < min" : ""}`, warn: below });
    }
  }
  return out;
}

let last: { args: unknown[]; value: Map<string, PartBadge> } | null = null;

/** partBadges, computed once per change of its inputs (all nodes ask with the same ones). */
export function partBadgesMemo(results: Results | null, parts: readonly Part[], view: string, prefs: UnitPrefs): Map<string, PartBadge> {
  const args = [results, parts, view, prefs];
  if (last && last.args.every((a, i) => a === args[i])) return last.value;
  last = { args, value: partBadges(results, parts, view, prefs) };
  return last.value;
}
