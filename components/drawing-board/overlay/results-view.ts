/**
 * Which results the drawing, report and findings show: the design modes the
 * engine sized (heating, hot water) and each simulated scenario (all zones
 * open, all zones shut, each zone alone, …). A view is a string key — the mode
 * name, or "scenario:<name>" — so the store holds one plain value. Pure.
 */
import type { Finding, PartResult, Results, Schematic } from "@/lib/schematic";

export const DEFAULT_VIEW = "heating";
const SCENARIO = "scenario:";

export interface ResultsViewOption {
  key: string;
  label: string;
  kind: "design" | "scenario";
  mode: "heating" | "hot-water";
}

const modeWords = { heating: "heating", "hot-water": "hot water" } as const;

/** The views these results offer, design modes first, in the engine's order. */
export function viewsOf(results: Results | null | undefined): ResultsViewOption[] {
  if (!results) return [];
  const design = (results.modes ?? []).map((m) => ({ key: m.mode, label: `Design · ${modeWords[m.mode]}`, kind: "design" as const, mode: m.mode }));
  const sims = (results.scenarios ?? []).map((s) => ({ key: `${SCENARIO}${s.name}`, label: `Simulated · ${s.name}`, kind: "scenario" as const, mode: s.mode }));
  return [...design, ...sims];
}

export const scenarioKey = (name: string) => `${SCENARIO}${name}`;

/** The view a finding belongs to (null: it holds in every view). */
export function viewOfFinding(f: Finding): string | null {
  if (f.scenario !== undefined) return scenarioKey(f.scenario);
  return f.mode ?? null;
}

/** Findings of a view: its own and those that hold whatever the mode. */
export function findingInView(f: Finding, view: string): boolean {
  const own = viewOfFinding(f);
  return own === null || own === view;
}

/** Words for a finding's view, for its tag in the list. */
export function viewLabel(results: Results | null, view: string | null): string {
  if (view === null) return "all modes";
  return viewsOf(results).find((v) => v.key === view)?.label ?? (view.startsWith(SCENARIO) ? view.slice(SCENARIO.length) : view);
}

export interface ViewPipe {
  id: string;
  flowM3h: number | null;
  velocityMps: number | null;
  pressureDropKpa: number | null;
  gradientPaPerM: number | null;
  /** Design modes only: the size the engine would choose. */
  suggestedSize: string | null;
}

function scenarioOf(results: Results | null, view: string) {
  return view.startsWith(SCENARIO) ? (results?.scenarios ?? []).find((s) => scenarioKey(s.name) === view) ?? null : null;
}
function designOf(results: Results | null, view: string) {
  return (results?.modes ?? []).find((m) => m.mode === view) ?? null;
}

/** Per-pipe numbers of a view; a view these results do not have falls back to the first design mode. */
export function pipesInView(results: Results | null, view: string): ViewPipe[] {
  const s = scenarioOf(results, view);
  if (s) return s.pipes.map((p) => ({ id: p.id, flowM3h: p.flowM3h, velocityMps: p.velocityMps ?? null, pressureDropKpa: p.pressureDropKpa, gradientPaPerM: null, suggestedSize: null }));
  const m = designOf(results, view) ?? results?.modes?.[0] ?? null;
  return m ? m.pipes.map((p) => ({ ...p })) : [];
}

export function partsInView(results: Results | null, view: string): PartResult[] {
  return (scenarioOf(results, view) ?? designOf(results, view) ?? results?.modes?.[0])?.parts ?? [];
}

export interface ViewEmitter {
  id: string; flowM3h: number | null; outputW: number | null; heatLoadW: number | null; returnTemperatureC: number | null;
  /** The engine's verdict at design (null in a scenario: it is what happens, not a check). */
  ok: boolean | null;
}

/** Emitter outputs: at design flow in the heating design mode, as simulated in a scenario. */
export function emittersInView(results: Results | null, view: string): ViewEmitter[] {
  const s = scenarioOf(results, view);
  const loads = new Map((results?.emitters ?? []).map((e) => [e.id, e.heatLoadW]));
  if (s) return s.emitters.map((e) => ({ ...e, heatLoadW: loads.get(e.id) ?? null, ok: null }));
  if (view !== "heating" || !results) return [];
  const parts = new Map(partsInView(results, view).map((p) => [p.id, p.flowM3h]));
  return results.emitters.map((e) => ({ id: e.id, flowM3h: parts.get(e.id) ?? null, outputW: e.outputAtDesignW, heatLoadW: e.heatLoadW,
    returnTemperatureC: null, ok: e.ok }));
}

export interface ViewSummary {
  heatSourceFlowM3h: number | null;
  /** The largest minimum flow of the heat sources drawn. */
  heatSourceMinM3h: number | null;
  belowMinimum: boolean;
  heatSourceReturnC: number | null;
  /** Sum of emitter outputs (null: the view has none, e.g. hot water). */
  heatToEmittersW: number | null;
  bypass: { id: string; flowM3h: number | null } | null;
  /** Scenario only: whether the simulation converged. */
  converged: boolean | null;
}

export function viewSummary(results: Results | null, doc: Pick<Schematic, "parts">, view: string): ViewSummary | null {
  if (!results) return null;
  const s = scenarioOf(results, view);
  const m = designOf(results, view);
  const flow = s ? s.heatSourceFlowM3h : m?.heatSourceFlowM3h ?? null;
  const mins = doc.parts.filter((p) => p.type === "heat-pump" || p.type === "boiler").map((p) => (p.props as { minFlowM3h?: number }).minFlowM3h ?? 0);
  const min = mins.length > 0 ? Math.max(...mins) : null;
  const emitters = emittersInView(results, view);
  const bypassId = results.bypass?.id ?? doc.parts.find((p) => p.type === "dp-bypass-valve")?.id ?? null;
  const parts = partsInView(results, view);
  return {
    heatSourceFlowM3h: flow,
    heatSourceMinM3h: min,
    belowMinimum: flow !== null && min !== null && flow < min,
    heatSourceReturnC: s?.heatSourceReturnC ?? null,
    heatToEmittersW: emitters.length > 0 ? emitters.reduce((sum, e) => sum + (e.outputW ?? 0), 0) : null,
    bypass: bypassId ? { id: bypassId, flowM3h: parts.find((p) => p.id === bypassId)?.flowM3h ?? null } : null,
    converged: s ? s.converged : null,
  };
}
