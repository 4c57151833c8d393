/**
 * The one number a part shows on the drawing in the view chosen: an emitter's
 * output, a heat source's or cylinder coil's flow, the flow a bypass passes.
 * Pure. The per-view lookups are built once per results and view (every part
 * node of a large board asks with the same ones), then each part reads its own.
 */
import type { Part, Results } from "@/lib/schematic";
import { showFlow, type UnitPrefs } from "@/lib/units/display";
import { emittersInView, partsInView, type ViewEmitter } from "./results-view";

export interface PartBadge { text: string; warn: boolean }

const EMITTERS = new Set(["radiator", "ufh-loop", "fan-coil", "heat-load"]);
const FLOWS = new Set(["heat-pump", "boiler", "cylinder", "dp-bypass-valve"]);

const watts = (w: number) => (Math.abs(w) >= 1000 ? `${(w / 1000).toFixed(2)} kW` : `${w.toFixed(0)} W`);

interface ViewLookups { output: Map<string, ViewEmitter>; flow: Map<string, number | null> }

let last: { results: Results; view: string; value: ViewLookups } | null = null;

function lookups(results: Results, view: string): ViewLookups {
  if (last && last.results === results && last.view === view) return last.value;
  const value = {
    output: new Map(emittersInView(results, view).map((e) => [e.id, e])),
    flow: new Map(partsInView(results, view).map((p) => [p.id, p.flowM3h])),
  };
  last = { results, view, value };
  return value;
}

export function partBadge(results: Results | null, part: Pick<Part, "id" | "type" | "props">, view: string, prefs: UnitPrefs): PartBadge | null {
  if (!results || !(EMITTERS.has(part.type) || FLOWS.has(part.type))) return null;
  const { output, flow } = lookups(results, view);
  if (EMITTERS.has(part.type)) {
    const e = output.get(part.id);
    if (e?.outputW === null || e?.outputW === undefined) return null;
    return { text: watts(e.outputW), warn: e.heatLoadW !== null && e.outputW < e.heatLoadW * 0.995 };
  }
  const q = flow.get(part.id);
  if (q === null || q === undefined) return null;
  const min = (part.props as { minFlowM3h?: number }).minFlowM3h;
  const below = min !== undefined && Math.abs(q) < min;
  return { text: `${showFlow(Math.abs(q), prefs).text}${below ? " < min" : ""}`, warn: below };
}
