/**
 * One design mode (heating or hot-water) end to end: design flows, pipe and
 * part results, circuits with index and balancing, pump duties.
 */
import { walkChain } from "@/lib/hydraulics/network/chains";
import { circulatingAdjacency } from "@/lib/hydraulics/network/circulating";
import type { Circuit, ModeResult } from "@/lib/schematic/results";
import { traceCircuits, type CircuitAnalysis } from "./circuits";
import type { EngineContext } from "./context";
import { designHasLoops, solveDesign, type DesignSolution } from "./design";
import type { NetworkState } from "./laws";
import { partResults } from "./part-results";
import { pipeResults } from "./pipe-results";
import { pumpDuties } from "./pumps";
import { resistanceRefs } from "@/lib/hydraulics/typical/resolve";

export interface ModeRun {
  result: ModeResult;
  /** pipes without flow in this mode (one pipe.no-flow finding covers every mode) */
  noFlow: string[];
  solution: DesignSolution;
  circuits: CircuitAnalysis;
}

/** Where each dp-bypass branch leaves the main circuit: its ends walked back to the first branch. */
export function bypassBranchPoints(ctx: EngineContext): Map<number, [number, number]> {
  const out = new Map<number, [number, number]>();
  if (!ctx.model.links.some((l) => l.role === "bypass")) return out;
  // Dead-end sub-trees (vessels, accessories) are not branches (network/circulating.ts).
  const adj = circulatingAdjacency(ctx.model);
  ctx.model.links.forEach((l, k) => {
    if (l.role === "bypass") out.set(k, [walkChain(ctx.model, adj, l.from, k).end, walkChain(ctx.model, adj, l.to, k).end]);
  });
  return out;
}

/**
 * A header or buffer whose secondary side draws more than the primary brings
 * mixes secondary return water into the secondary flow, which then leaves
 * cooler than designed: T = (Qp·T_flow + (Qs − Qp)·T_return)/Qs (mixing by
 * flow, first-law balance). Usual design keeps Qp ≥ Qs (common practice, no
 * single published source).
 */
function headerFlowCheck(ctx: EngineContext, sol: DesignSolution): void {
  for (const load of sol.served) {
    if (!load.header) continue;
    const secondary = (ctx.model.linksOfPart.get(load.id) ?? []).find((k) => ctx.model.links[k]!.role === "header-secondary");
    if (secondary === undefined) continue;
    const qs = Math.abs(sol.q[secondary]!);
    const qp = load.flowM3h;
    if (!(qs > qp * 1.001) || !Number.isFinite(qs)) continue;
    const mixedC = (qp * ctx.flowC + (qs - qp) * ctx.returnC) / qs;
    const sources = ctx.model.links.filter((l) => l.role === "heat-source").map((l) => l.id);
    ctx.findings.warning(
      "header.primary-low",
      `${load.id}: the secondary side draws ${qs.toFixed(3)} m³/h but the primary brings ${qp.toFixed(3)} m³/h in ${sol.mode} mode, so secondary return mixes into the flow: about ${mixedC.toFixed(1)} °C instead of ${ctx.flowC} °C (raise the primary flow or lower the secondary)`,
      [load.id, ...sources],
    );
  }
}

export function runMode(ctx: EngineContext, mode: NetworkState["mode"]): ModeRun {
  const sol = solveDesign(ctx, mode);
  headerFlowCheck(ctx, sol);
  const ca = traceCircuits(ctx, sol, new Set([...bypassBranchPoints(ctx).values()].flat()));
  const unpumped = ca.circuits.filter((c) => c.rootLink === null).map((c) => c.load);
  if (unpumped.length > 0) {
    ctx.findings.warning(
      "circuit.no-pump",
      `no pump drives the circuit of ${unpumped.join(", ")} in ${mode} mode, so its pressure drop is not computed`,
      unpumped,
    );
  }
  // A circuit's drop rests on the assumed Kv of every part on its path (and of the pump's heat source).
  const restsOn = ca.circuits.map((c) => resistanceRefs(ctx.inputs, c.pump ? [...c.path, c.pump] : c.path));
  const pumps = pumpDuties(ctx, sol, ca, restsOn);
  // where loops split the design flows, every flow rests on every resistance assumed
  const loopRefs = designHasLoops(ctx, sol.state) ? resistanceRefs(ctx.inputs) : [];
  let sourceFlow: number | null = null;
  ctx.model.links.forEach((l, k) => {
    if (l.role === "heat-source") sourceFlow = (sourceFlow ?? 0) + Math.abs(sol.q[k]!);
  });
  const circuits: Circuit[] = ca.circuits.map((c, i) => ({
    load: c.load,
    pump: c.pump,
    path: c.path,
    pressureDropKpa: c.pressureDropKpa,
    index: c.index,
    excessKpa: c.excessKpa,
    balancingKv: c.balancingKv,
    restsOn: restsOn[i]!,
  }));
  const pump = pumps.reduce<(typeof pumps)[number] | null>(
    (best, p) => (best === null || (p.requiredHeadKpa ?? -1) > (best.requiredHeadKpa ?? -1) ? p : best),
    null,
  );
  const noFlow: string[] = [];
  const result: ModeResult = {
    mode,
    heatSourceFlowM3h: sourceFlow !== null && Number.isFinite(sourceFlow) ? sourceFlow : null,
    pipes: pipeResults(ctx, sol.q, mode, noFlow, loopRefs),
    parts: partResults(ctx, sol.state, sol.laws, sol.q, sol.head, loopRefs),
    circuits,
    pump,
    pumps,
  };
  return { result, noFlow, solution: sol, circuits: ca };
}
