/**
 * Design mode: loads at their design flows, flows everywhere else by
 * continuity. The loads (and a header's primary pass) are cut from the network
 * and enter as fixed demands — withdrawn at their inlet, returned at their
 * outlet — and the gradient method solves the rest with pumps as loss-free
 * links. On a tree this is plain continuity (one linear step); where loops
 * exist (reverse return, parallel paths) the split follows the resistances.
 * Heads of the solution give every circuit's pressure drop (circuits.ts).
 */
import { components, type ModelLink } from "@/lib/hydraulics/network/model";
import { solveNetwork } from "@/lib/hydraulics/network/gga";
import type { EngineContext } from "./context";
import { isPumpLink, requiredHeads, traceCircuits } from "./circuits";
import { buildLaws, isCut, type NetworkState } from "./laws";
import { designLoads, type DesignLoad } from "./loads";
import { settleBySecant } from "./secant-settle";
import { baseState } from "./state";
import type { DesignSolution } from "./design-solution";

export type { DesignSolution };

const NO_WATCH: ReadonlySet<number> = new Set();
/**
 * How long a design solve may take: gradient-method iterations (a tree takes one or two, loops a
 * handful) and secant rounds for the heads of pumps beside passive paths. Tests cut them to reach
 * what no drawing found so far does.
 */
export interface DesignLimits {
  maxIterations: number;
  headRounds: number;
}
const DESIGN_LIMITS: DesignLimits = { maxIterations: 40, headRounds: 30 };
/** A pump head counts as settled when its index circuit's drop is within this of it (kPa). */
const HEAD_TOLERANCE_KPA = 1e-7;

/**
 * Pump links (pumps, heat sources with a curve) that lie on a loop of links open
 * in this state: only their head can move flow. A pump on no loop (the usual
 * case: every loop through it passes a load, which design cuts) is a bridge.
 * One union-find over the open links without the pumps, then the pumps as edges
 * between those pieces: a pump is on a loop when the other pumps alone already
 * join its two ends' pieces (O(links + pumps²)).
 */
function pumpsOnLoops(ctx: EngineContext, state: NetworkState): number[] {
  const { links, nodeCount } = ctx.model;
  const pumps: number[] = [];
  const rest: ModelLink[] = [];
  links.forEach((l, k) => {
    if (isCut(ctx, l, state)) return;
    if (isPumpLink(ctx, l)) pumps.push(k);
    else rest.push(l);
  });
  if (pumps.length === 0) return [];
  const piece = components(nodeCount, rest);
  return pumps.filter((k) => {
    const others = pumps.filter((j) => j !== k).map((j) => ({ from: piece[links[j]!.from]!, to: piece[links[j]!.to]! }));
    const joined = components(nodeCount, others);
    return joined[piece[links[k]!.from]!] === joined[piece[links[k]!.to]!];
  });
}

/**
 * Whether the links open in this state (loads cut) close a loop: the cyclomatic number
 * links − nodes + components of the graph they span (Harary, Graph Theory, 1969, Thm 4.5).
 * Without one the design flows follow the loads by continuity alone; with one the split
 * follows the resistances, so every flow rests on the resistances assumed.
 */
export function designHasLoops(ctx: EngineContext, state: NetworkState): boolean {
  const open = ctx.model.links.filter((l) => !isCut(ctx, l, state));
  const comp = components(ctx.model.nodeCount, open);
  const nodes = new Set<number>();
  for (const l of open) nodes.add(l.from).add(l.to);
  const pieces = new Set([...nodes].map((n) => comp[n]));
  return open.length - nodes.size + pieces.size > 0;
}

export function solveDesign(ctx: EngineContext, mode: NetworkState["mode"], limits: DesignLimits = DESIGN_LIMITS): DesignSolution {
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
  let r = solveNetwork(ctx.prep, laws, demand, q0, { maxIterations: limits.maxIterations });
  // The load links were cut (near-zero conductance): put their design flow back.
  for (const load of served) r.q[load.link] = load.flowM3h;
  const looped = pumpsOnLoops(ctx, state);
  // A passive path beside a pump (a fixed bypass, a short circuit, a check
  // valve between flow and return) carries what the pump's head drives
  // through it, from the pump's outlet side to its inlet side; with the pumps
  // loss-free it would share the return flow backwards instead. So each such
  // pump gives its required head (its index circuit's pressure drop, which
  // depends on that flow in turn): a fixed point g = H(g). Plain substitution
  // diverges where the pump's own drop grows faster with the bypass flow than
  // the bypass flow grows with the head (a small heat-source Kv beside a fixed
  // bypass), so it is solved by secant steps on f(g) = H(g) − g.
  const headError = (): number[] => {
    const heads = requiredHeads(traceCircuits(ctx, { mode, state, loads, served, laws, q: r.q, head: r.head }, NO_WATCH));
    // A pump the loads' design flow passes backwards (drawn the wrong way round: pump.reversed or
    // heat-source.reversed, direction.ts) gets its head the other way, so the flows settle as if it
    // were turned round; without the sign its head and its bypass flow chase each other and never settle.
    return looped.map((k) => (heads.get(k) ?? 0) * (r.q[k]! < 0 ? -1 : 1) - laws.gain[k]!);
  };
  const resolve = (gains: readonly number[]): number[] => {
    looped.forEach((k, i) => (laws.gain[k] = gains[i]!));
    r = solveNetwork(ctx.prep, laws, demand, r.q, { maxIterations: limits.maxIterations });
    for (const load of served) r.q[load.link] = load.flowM3h;
    return headError();
  };
  const heads = looped.length > 0 ? settleBySecant(looped.map((k) => laws.gain[k]!), headError(), resolve, limits.headRounds, HEAD_TOLERANCE_KPA) : null;
  if (heads && !heads.settled) {
    ctx.findings.warning(
      "design.not-converged",
      `${mode} design flows did not settle: the head of a pump beside a bypass or other passive path changed by ${heads.residual.toPrecision(2)} kPa after ${heads.rounds} rounds, so its required head and the flows it drives are not reliable`,
      looped.map((k) => ctx.doc.parts[ctx.model.links[k]!.index]!.id),
    );
  } else if (!r.converged) {
    ctx.findings.warning(
      "design.not-converged",
      `${mode} design flows did not converge in ${r.iterations} iterations; loops in the network may be badly conditioned`,
    );
  }
  return { mode, state, loads, served, laws, q: r.q, head: r.head };
}
