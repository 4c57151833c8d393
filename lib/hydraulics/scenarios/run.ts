/**
 * Runs the scenarios: simulate the valve state, then temperatures, and report
 * flows, drops, heat-source flow and return temperature, and each emitter's
 * (radiator, UFH loop, fan coil, heat load) flow, output and return temperature.
 */
import { NO_FLOW_M3H } from "@/lib/hydraulics/network/behaviour";
import type { EngineContext } from "@/lib/hydraulics/sizing/context";
import { partResults } from "@/lib/hydraulics/sizing/part-results";
import { baseState } from "@/lib/hydraulics/sizing/state";
import type { ScenarioResult } from "@/lib/schematic/results";
import type { ScenarioSpec } from "./list";
import { simulate, type Simulation } from "./simulate";
import { thermal } from "./thermal";
import { resistanceRefs } from "@/lib/hydraulics/typical/resolve";

const fin = (x: number | null | undefined): number | null => (x !== null && x !== undefined && Number.isFinite(x) ? x : null);

export function scenarioState(ctx: EngineContext, spec: ScenarioSpec, openings: ReadonlyMap<string, number | null>) {
  const state = baseState(ctx, "simulate", spec.mode, openings);
  const valveOpen = new Map<string, boolean>();
  const diverter = new Map(state.diverter);
  for (const [id, v] of Object.entries(spec.valves)) {
    const part = ctx.model.partById.get(id);
    const ok =
      part &&
      ((typeof v === "boolean" && (part.type === "zone-valve" || part.type === "isolation-valve")) ||
        (typeof v === "string" && part.type === "diverter-valve"));
    if (!ok) {
      ctx.findings.warning(
        "scenario.unknown-valve",
        `scenario "${spec.name}": ${id} is not a ${typeof v === "boolean" ? "zone or isolation valve" : "diverter valve"}, ignored`,
        part ? [id] : [],
      );
      continue;
    }
    if (typeof v === "boolean") valveOpen.set(id, v);
    else diverter.set(id, v);
  }
  return { ...state, valveOpen, diverter };
}

export function scenarioResult(ctx: EngineContext, spec: ScenarioSpec, sim: Simulation): ScenarioResult {
  const { model, doc } = ctx;
  const t = thermal(ctx, sim.q);
  let sourceFlow: number | null = null;
  model.links.forEach((l, k) => {
    if (l.role === "heat-source") sourceFlow = (sourceFlow ?? 0) + Math.abs(sim.q[k]!);
  });
  const pipes = doc.pipes.map((p, i) => {
    const k = model.pipeLink[i]!;
    const l = model.links[k]!;
    const d = ctx.pipeGeom[i]?.innerDiameterM;
    // mean velocity v = Q/A, A = πD²/4 (continuity; White, Fluid Mechanics, eq. 3.7), m/s from m³/h
    const v = d ? sim.q[k]! / 3600 / ((Math.PI * d * d) / 4) : null;
    return { id: p.id, flowM3h: fin(sim.q[k]), velocityMps: fin(v), pressureDropKpa: fin(sim.head[l.from]! - sim.head[l.to]!) };
  });
  const emitters: ScenarioResult["emitters"] = [];
  model.links.forEach((l, k) => {
    // Every emitter and load (radiator, UFH loop, fan coil, heat load); the cylinder coil is reported in hotWater.
    if (l.role !== "load" || doc.parts[l.index]!.type === "cylinder") return;
    const flowing = Math.abs(sim.q[k]!) >= NO_FLOW_M3H;
    emitters.push({
      id: l.id,
      flowM3h: fin(sim.q[k]),
      outputW: flowing ? fin(t.loadOutputW.get(k)) : 0,
      returnTemperatureC: flowing ? fin(t.loadOutletC.get(k)) : null,
    });
  });
  if (!sim.converged) {
    ctx.findings.warning(
      "scenario.not-converged",
      `scenario "${spec.name}" did not converge in ${sim.iterations} iterations; its flows are the last iterate`,
    );
  }
  return {
    name: spec.name,
    mode: spec.mode,
    converged: sim.converged,
    iterations: sim.iterations,
    heatSourceFlowM3h: fin(sourceFlow),
    heatSourceReturnC: fin(t.heatSourceReturnC),
    pipes,
    parts: partResults(ctx, sim.state, sim.laws, sim.q, sim.head),
    emitters,
    // what really flows depends on every resistance in the network
    restsOn: resistanceRefs(ctx.inputs),
  };
}

export function runScenarios(
  ctx: EngineContext,
  specs: readonly ScenarioSpec[],
  openings: ReadonlyMap<string, number | null>,
  warm: Float64Array | null,
): { results: ScenarioResult[]; sims: Map<string, Simulation> } {
  const results: ScenarioResult[] = [];
  const sims = new Map<string, Simulation>();
  for (const spec of specs) {
    ctx.findings.within({ mode: spec.mode, scenario: spec.name }, () => {
      const sim = simulate(ctx, scenarioState(ctx, spec, openings), warm);
      sims.set(spec.name, sim);
      results.push(scenarioResult(ctx, spec, sim));
    });
  }
  return { results, sims };
}
