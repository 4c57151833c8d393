/**
 * Simulation of one valve state: the gradient method with pumps on their
 * curves, loads and valves as resistances, the dp-bypass at its opening, no
 * flow forced anywhere. Warm-started from the design flows (cut links from
 * zero), which is what keeps the many "only X open" scenarios cheap.
 */
import { solveNetwork } from "@/lib/hydraulics/network/gga";
import { NO_FLOW_M3H, type LinkTable } from "@/lib/hydraulics/network/behaviour";
import type { EngineContext } from "@/lib/hydraulics/sizing/context";
import { buildLaws, isCut, type NetworkState } from "@/lib/hydraulics/sizing/laws";

export interface Simulation {
  state: NetworkState;
  laws: LinkTable;
  q: Float64Array;
  head: Float64Array;
  converged: boolean;
  iterations: number;
}

export function simulate(ctx: EngineContext, state: NetworkState, warm: Float64Array | null, maxIterations = 50): Simulation {
  const { model } = ctx;
  const laws = buildLaws(ctx, state);
  const q0 = new Float64Array(model.links.length);
  model.links.forEach((l, k) => {
    if (isCut(ctx, l, state)) return;
    // Where the design gave nothing: a pump at the middle of its curve
    // (LinkTable.startFlow), anything else 0.01 m³/h — any positive start works
    // for the pump and Kv laws; a start on the curve saves iterations.
    const w = warm ? warm[k]! : 0;
    q0[k] = Math.abs(w) > NO_FLOW_M3H ? w : laws.startFlow(k) || 0.01;
  });
  const r = solveNetwork(ctx.prep, laws, new Float64Array(model.nodeCount), q0, { maxIterations, accuracy: 1e-5 });
  for (let k = 0; k < r.q.length; k++) if (Math.abs(r.q[k]!) < NO_FLOW_M3H) r.q[k] = 0;
  return { state, laws, q: r.q, head: r.head, converged: r.converged, iterations: r.iterations };
}
