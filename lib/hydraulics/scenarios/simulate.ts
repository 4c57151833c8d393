/**
 * Simulation of one valve state: the gradient method with pumps on their
 * curves, loads and valves as resistances, the dp-bypass at its opening, no
 * flow forced anywhere. Warm-started from the design flows (cut links from
 * zero), which is what keeps the many "only X open" scenarios cheap, or from
 * an earlier simulation of the same valves in the same calculation.
 */
import { solveNetwork } from "@/lib/hydraulics/network/gga";
import { NO_FLOW_M3H, type LinkTable } from "@/lib/hydraulics/network/behaviour";
import type { EngineContext } from "@/lib/hydraulics/sizing/context";
import { buildLaws, isCut, valveStateKey, type NetworkState } from "@/lib/hydraulics/sizing/laws";

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
  // The same valves simulated before in this calculation (the bypass sizing's all-zones-open run,
  // then the "all zones open" scenario) settled at this solve's answer unless a bypass opens:
  // Newton starts from those flows as they were, tiny ones too. Only the start changes, not
  // what it converges to.
  const key = valveStateKey(ctx, state);
  const settled = ctx.settled.get(key);
  const q0 = new Float64Array(model.links.length);
  model.links.forEach((l, k) => {
    if (isCut(ctx, l, state)) return;
    if (settled) {
      q0[k] = settled[k]!;
      return;
    }
    // Where the design gave nothing: a pump at the middle of its curve
    // (LinkTable.startFlow), anything else 0.01 m³/h — any positive start works
    // for the pump and Kv laws; a start on the curve saves iterations.
    const w = warm ? warm[k]! : 0;
    q0[k] = Math.abs(w) > NO_FLOW_M3H ? w : laws.startFlow(k) || 0.01;
  });
  const r = solveNetwork(ctx.prep, laws, new Float64Array(model.nodeCount), q0, { maxIterations, accuracy: 1e-5 });
  if (r.converged) ctx.settled.set(key, Float64Array.from(r.q));
  for (let k = 0; k < r.q.length; k++) if (Math.abs(r.q[k]!) < NO_FLOW_M3H) r.q[k] = 0;
  return { state, laws, q: r.q, head: r.head, converged: r.converged, iterations: r.iterations };
}
