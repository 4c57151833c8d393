/**
 * Design mode: loads at their design flows, flows everywhere else by
 * continuity. The loads (and a header's primary pass) are cut from the network
 * and enter as fixed demands — withdrawn at their inlet, returned at their
 * outlet — and the gradient method solves the rest with pumps as loss-free
 * links. On a tree this is plain continuity (one linear step); where loops
 * exist (reverse return, parallel paths) the split follows the resistances.
 * Heads of the solution give every circuit's pressure drop (circuits.ts).
 */
import { components } from "@/lib/hydraulics/network/model";
import type { LinkTable } from "@/lib/hydraulics/network/behaviour";
import { solveNetwork } from "@/lib/hydraulics/network/gga";
import type { EngineContext } from "./context";
import { buildLaws, isCut, type NetworkState } from "./laws";
import { designLoads, type DesignLoad } from "./loads";
import { baseState } from "./state";

export interface DesignSolution {
  mode: NetworkState["mode"];
  state: NetworkState;
  loads: DesignLoad[];
  /** loads with a path from inlet back to outlet (the others get no flow) */
  served: DesignLoad[];
  laws: LinkTable;
  q: Float64Array;
  head: Float64Array;
  converged: boolean;
  iterations: number;
}

export function solveDesign(ctx: EngineContext, mode: NetworkState["mode"]): DesignSolution {
  const { model } = ctx;
  const state = baseState(ctx, "design", mode);
  const laws = buildLaws(ctx, state);
  const open = model.links.filter((l) => !isCut(ctx, l, state));
  const comp = components(model.nodeCount, open);
  const loads = designLoads(ctx, mode);
  const served: DesignLoad[] = [];
  const demand = new Float64Array(model.nodeCount);
  const q0 = new Float64Array(model.links.length);
  for (const load of loads) {
    if (comp[load.inNode] !== comp[load.outNode]) {
      if (load.header) {
        ctx.findings.warning(
          "header.primary-unconnected",
          `${load.id}: ports p1 and p2 are not joined through the heat source, so no primary flow is sized (${mode} mode)`,
          [load.id],
        );
      } else {
        ctx.findings.error(
          "load.no-return-path",
          `${load.id}: no path from its outlet back to its inlet in ${mode} mode (unconnected port or shut valve), so it gets no flow`,
          [load.id],
        );
      }
      continue;
    }
    served.push(load);
    demand[load.inNode] = demand[load.inNode]! + load.flowM3h;
    demand[load.outNode] = demand[load.outNode]! - load.flowM3h;
    q0[load.link] = load.flowM3h;
  }
  const r = solveNetwork(ctx.prep, laws, demand, q0, { maxIterations: 40 });
  // The load links were cut (near-zero conductance): put their design flow back.
  for (const load of served) r.q[load.link] = load.flowM3h;
  if (!r.converged) {
    ctx.findings.warning(
      "design.not-converged",
      `${mode} design flows did not converge in ${r.iterations} iterations; loops in the network may be badly conditioned`,
    );
  }
  return { mode, state, loads, served, laws, q: r.q, head: r.head, converged: r.converged, iterations: r.iterations };
}
