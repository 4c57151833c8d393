/**
 * The engine's entry point: schematic JSON in, Results out (contract v1).
 * parse → model → topology and plant findings → design modes (heating,
 * hot-water) → bypass → scenarios → vessel, volume, emitters, hot water.
 * Plain data in and out; no module state; never a NaN or Infinity in the
 * answer (a number that cannot be computed is null with a finding).
 */
import { parseSchematic, type Issue } from "@/lib/schematic/parse";
import type { Results } from "@/lib/schematic/results";
import type { Schematic } from "@/lib/schematic/schema";
import { Findings } from "./findings/finding";
import { plantFindings } from "./findings/plant";
import { topologyFindings, unheatedLoads } from "./findings/topology";
import { runScenarios } from "./scenarios/run";
import { scenarioList } from "./scenarios/list";
import { simulate, type Simulation } from "./scenarios/simulate";
import { scenarioState } from "./scenarios/run";
import { sizeBypasses } from "./sizing/bypass";
import { createContext, type EngineContext } from "./sizing/context";
import { directionFindings } from "./sizing/direction";
import { emitterResults, hotWaterResult } from "./sizing/emitters";
import { runMode, type ModeRun } from "./sizing/mode";
import { noFlowFinding } from "./sizing/pipe-results";
import { systemVolume, vesselResult, volumeResult } from "./sizing/vessel";
import { resistanceRefs } from "./typical/resolve";

// 1.1.0: findings name the mode or scenario they were found in; scenario pipes carry their velocity.
// 1.2.0: typical values for what the designer left empty (assumptions, restsOn), pump settings, magnetic filter.
// 1.3.0: one finding per code and refs; pipe (and part) flows rest on the assumed resistances where loops split them.
// 1.4.0: heat sources, pumps and loads piped the wrong way round are errors (heat-source/pump/load.reversed).
export const ENGINE_VERSION = "1.4.0";

export type CalculateResult = { ok: true; results: Results } | { ok: false; issues: Issue[] };

export function calculate(input: unknown): CalculateResult {
  const parsed = parseSchematic(input);
  if (!parsed.ok) return parsed;
  try {
    return { ok: true, results: calculateSchematic(parsed.doc) };
  } catch (e) {
    // A safety net for the route and the CLI: an engine fault is reported, not
    // thrown. The property test fails on any answer that reaches this line.
    return { ok: false, issues: [{ path: "", message: `internal engine error: ${(e as Error).message}` }] };
  }
}

function minFlowCheck(ctx: EngineContext, flowM3h: number | null, when: string): boolean | null {
  const sources = ctx.doc.parts.filter((p) => p.type === "heat-pump" || p.type === "boiler");
  const min = Math.max(0, ...sources.map((p) => (p.props as { minFlowM3h: number }).minFlowM3h));
  if (flowM3h === null || sources.length === 0) return null;
  const ok = flowM3h >= min;
  if (!ok) {
    ctx.findings.warning(
      "heat-source.min-flow",
      `heat source gets ${flowM3h.toFixed(3)} m³/h ${when}, below its minimum ${min} m³/h`,
      sources.map((s) => s.id),
    );
  }
  return ok;
}

function bypassSection(
  ctx: EngineContext,
  heating: ModeRun | null,
  warm: Float64Array | null,
  openings: Map<string, number | null>,
  sizings: ReturnType<typeof sizeBypasses>,
  shut: Simulation | undefined,
): Results["bypass"] {
  const first = sizings[0];
  if (!first) return null;
  const zones = ctx.doc.parts.filter((p) => p.type === "zone-valve");
  let flow: number | null = null;
  if (heating && zones.length > 0) {
    const spec = { name: "all zones shut", mode: "heating" as const, valves: Object.fromEntries(zones.map((z) => [z.id, false])) };
    // The default scenario list already simulated this state: reuse it.
    const sim = shut ?? simulate(ctx, scenarioState(ctx, spec, openings), warm);
    flow = 0;
    ctx.model.links.forEach((l, k) => {
      if (l.role === "heat-source") flow! += Math.abs(sim.q[k]!);
    });
    if (!Number.isFinite(flow)) flow = null;
  }
  const minFlowMet = ctx.findings.within({ mode: "heating", scenario: "all zones shut" }, () => minFlowCheck(ctx, flow, "with every zone valve shut"));
  return {
    id: first.id,
    recommendedOpeningKpa: first.recommendedOpeningKpa,
    heatSourceFlowAllZonesClosedM3h: flow,
    minFlowMet,
    zonesDpKpa: first.zonesDpKpa,
    openZonesDpKpa: first.openZonesDpKpa,
    // the opening comes from circuit drops and a simulation: every resistance in the network
    restsOn: resistanceRefs(ctx.inputs),
  };
}

export function calculateSchematic(doc: Schematic): Results {
  const findings = new Findings();
  const ctx = createContext(doc, findings);
  topologyFindings(doc, ctx.model, findings);
  plantFindings(doc, ctx.model, findings);
  const unheated = unheatedLoads(ctx.model, findings);
  const hydraulic = ctx.fluid !== null && ctx.deltaTK !== null;
  // Findings of a mode or scenario say so (Findings.within), so the board can show that state.
  const inHeating = <T>(fn: () => T) => findings.within({ mode: "heating" }, fn);
  const inHotWater = <T>(fn: () => T) => findings.within({ mode: "hot-water" }, fn);
  const heating = hydraulic ? inHeating(() => runMode(ctx, "heating")) : null;
  const hasCylinder = doc.parts.some((p) => p.type === "cylinder");
  const hotWater = hydraulic && hasCylinder ? inHotWater(() => runMode(ctx, "hot-water")) : null;
  // parts piped the wrong way round: a fact of the drawing, said once whatever the mode
  directionFindings(ctx, [heating, hotWater].flatMap((m) => (m ? [m] : [])));
  if (heating) inHeating(() => minFlowCheck(ctx, heating.result.heatSourceFlowM3h, "at design flow in heating mode"));
  noFlowFinding(ctx, [...new Set([...(heating?.noFlow ?? []), ...(hotWater?.noFlow ?? [])])]);
  const sizings = hydraulic ? sizeBypasses(ctx, heating) : [];
  const openings = new Map(sizings.map((s) => [s.id, s.openingKpa]));
  const warm = heating ? heating.solution.q : null;
  const specs = hydraulic ? scenarioList(ctx) : [];
  const run = hydraulic ? runScenarios(ctx, specs, openings, warm) : null;
  const ownShut = doc.scenarios && doc.scenarios.length > 0 ? undefined : run?.sims.get("all zones shut");
  const bypass = hydraulic ? bypassSection(ctx, heating, warm, openings, sizings, ownShut) : null;
  const volume = systemVolume(ctx);
  const fluid = ctx.fluid;
  return {
    engine: ENGINE_VERSION,
    ok: true,
    findings: findings.list,
    fluid: {
      temperatureC: (ctx.flowC + ctx.returnC) / 2,
      densityKgM3: fluid?.densityKgM3 ?? null,
      kinematicViscosityM2s: fluid?.kinematicViscosityM2s ?? null,
      specificHeatJkgK: fluid?.specificHeatJkgK ?? null,
    },
    modes: [heating, hotWater].filter((m): m is ModeRun => m !== null).map((m) => m.result),
    bypass,
    expansionVessel: vesselResult(ctx, volume),
    volume: volumeResult(ctx, volume),
    emitters: inHeating(() => emitterResults(ctx, unheated)),
    hotWater: inHotWater(() => hotWaterResult(ctx)),
    scenarios: run?.results ?? [],
    assumptions: ctx.inputs.assumptions,
  };
}
