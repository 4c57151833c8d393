/**
 * Circuits of a design solution: for every served load, the path pump →
 * load → back to the same pump, its pressure drop, the index circuit (largest
 * drop) of each pump, the pump's required vs available head, and for the other
 * circuits the excess pressure and the balancing-valve Kv that burns it
 * (Kv = q·√(ρ/1000 / (Δp/1 bar)), IEC 60534-1 definition, via losses/kv.ts).
 *
 * A side is a connected part of the network with the loads, the dp-bypass and
 * a header's primary pass and hot-end link removed: primary and secondary of a
 * buffer are separate sides, each with its own pump; a secondary circuit closes
 * through the header's secondary pass. Paths come from two breadth-first trees
 * grown from the pump's outlet and inlet; pressure drops come from the solved
 * heads, Δp = (H_out,pump − H_in,load) + Δp_load + (H_out,load − H_in,pump),
 * which is path-independent once the heads balance.
 */
import { kvForPressureDrop } from "@/lib/hydraulics/losses";
import { adjacency, components, type Adjacency, type ModelLink } from "@/lib/hydraulics/network/model";
import type { Circuit } from "@/lib/schematic/results";
import type { EngineContext } from "./context";
import type { DesignSolution } from "./design-solution";
import { isCut } from "./laws";
import type { DesignLoad } from "./loads";

export interface TracedCircuit extends Omit<Circuit, "restsOn"> {
  side: number;
  rootLink: number | null;
  flowM3h: number;
  /** the root heat source's own exchanger loss inside pressureDropKpa (0 for a pump part), kPa */
  rootDpKpa: number;
  /** watched nodes (dp-bypass ends) on the flow and return legs */
  passedFlow: number[];
  passedReturn: number[];
}

export interface CircuitAnalysis {
  circuits: TracedCircuit[];
  /** side → root pump link */
  rootOfSide: Map<number, number>;
  /** side → pump/heat-source-with-curve links */
  pumpsOfSide: Map<number, number[]>;
  sideOf: Int32Array;
}

/** Roles that are not part of a side: cut in design, or the load that closes each circuit. */
export const SIDE_EXCLUDED: ReadonlySet<string> = new Set(["load", "header-primary", "header-top", "header-bottom", "bypass"]);

export function isPumpLink(ctx: EngineContext, l: ModelLink): boolean {
  if (l.role === "pump") return true;
  if (l.role !== "heat-source") return false;
  return (ctx.doc.parts[l.index]!.props as { pumpCurve: unknown }).pumpCurve != null;
}

/** BFS tree from `start` not using `skip`; parent link per node (−1 root, −2 unvisited). */
export function tree(start: number, skip: number, adj: Adjacency, links: readonly ModelLink[], parent: Int32Array) {
  parent[start] = -1;
  const queue = [start];
  for (let i = 0; i < queue.length; i++) {
    const n = queue[i]!;
    for (let j = adj.start[n]!; j < adj.start[n + 1]!; j++) {
      const k = adj.list[j]!;
      if (k === skip) continue;
      const l = links[k]!;
      const m = l.from === n ? l.to : l.from;
      if (parent[m] === -2) {
        parent[m] = k;
        queue.push(m);
      }
    }
  }
}

export function traceCircuits(ctx: EngineContext, sol: DesignSolution, watch: ReadonlySet<number>): CircuitAnalysis {
  const { model } = ctx;
  const links = model.links;
  const inSide = links.map((l) => !SIDE_EXCLUDED.has(l.role) && !isCut(ctx, l, sol.state));
  const sideOf = components(model.nodeCount, links.filter((_, k) => inSide[k]));
  const adj = adjacency(model.nodeCount, links, (k) => inSide[k]!);
  const pumpsOfSide = new Map<number, number[]>();
  links.forEach((l, k) => {
    if (!isPumpLink(ctx, l)) return;
    const s = sideOf[l.from]!;
    pumpsOfSide.set(s, [...(pumpsOfSide.get(s) ?? []), k]);
  });
  const rootOfSide = new Map<number, number>();
  for (const [s, ks] of pumpsOfSide) rootOfSide.set(s, ks.find((k) => links[k]!.role === "pump") ?? ks[0]!);
  const pf = new Int32Array(model.nodeCount).fill(-2);
  const pr = new Int32Array(model.nodeCount).fill(-2);
  for (const root of rootOfSide.values()) {
    tree(links[root]!.to, root, adj, links, pf);
    tree(links[root]!.from, root, adj, links, pr);
  }
  const walk = (node: number, parent: Int32Array, passed: number[]): string[] | null => {
    const ids: string[] = [];
    let n = node;
    for (let guard = 0; parent[n] !== -1; guard++) {
      if (parent[n] === -2 || guard > model.nodeCount) return null;
      if (watch.has(n)) passed.push(n);
      const l = links[parent[n]!]!;
      ids.push(l.id);
      n = l.from === n ? l.to : l.from;
    }
    if (watch.has(n)) passed.push(n);
    return ids;
  };
  const circuits = sol.served.map((load) => circuitOf(ctx, sol, load, sideOf, rootOfSide, pf, pr, walk));
  markIndex(ctx, circuits);
  return { circuits, rootOfSide, pumpsOfSide, sideOf };
}

/** Head each side's root pump must give: its index circuit's pressure drop (0 when none is known). */
export function requiredHeads(ca: CircuitAnalysis): Map<number, number> {
  const out = new Map<number, number>();
  for (const root of ca.rootOfSide.values()) out.set(root, 0);
  for (const c of ca.circuits) {
    if (c.rootLink === null || c.pressureDropKpa === null) continue;
    out.set(c.rootLink, Math.max(out.get(c.rootLink) ?? 0, c.pressureDropKpa));
  }
  return out;
}

function circuitOf(
  ctx: EngineContext,
  sol: DesignSolution,
  load: DesignLoad,
  sideOf: Int32Array,
  rootOfSide: Map<number, number>,
  pf: Int32Array,
  pr: Int32Array,
  walk: (n: number, p: Int32Array, passed: number[]) => string[] | null,
): TracedCircuit {
  const links = ctx.model.links;
  const side = sideOf[load.inNode]!;
  const root = rootOfSide.get(side) ?? null;
  const passedFlow: number[] = [];
  const passedReturn: number[] = [];
  // One object literal with every field, written once: markIndex then sets fields of one
  // shape (object spread per circuit made each a slow, shapeless object).
  const circuit = (rootDpKpa: number, pump: string | null, path: string[], pressureDropKpa: number | null): TracedCircuit => ({
    load: load.id, side, rootLink: root, flowM3h: load.flowM3h, rootDpKpa, passedFlow, passedReturn,
    index: false, excessKpa: null, balancingKv: null, pump, path, pressureDropKpa,
  });
  if (root === null) return circuit(0, null, [], null);
  const flowLeg = walk(load.inNode, pf, passedFlow);
  const returnLeg = walk(load.outNode, pr, passedReturn);
  const out = new Float64Array(2);
  let dpLoad = 0;
  if (!load.header) {
    sol.laws.evaluateOwn(load.link, load.flowM3h, out);
    dpLoad = out[0]!;
  }
  const h = sol.head;
  const r = links[root]!;
  // A heat source that is its own pump: its exchanger's loss is part of every circuit it drives.
  let dpRoot = 0;
  if (r.role === "heat-source") {
    sol.laws.evaluateOwn(root, sol.q[root]!, out);
    dpRoot = out[0]!;
  }
  const dp = h[r.to]! - h[load.inNode]! + dpLoad + (h[load.outNode]! - h[r.from]!) + dpRoot;
  let path: string[] = [];
  if (flowLeg && returnLeg) {
    // A heat source that is its own pump is part of the circuit (its exchanger loss is in dp): list it first.
    const lead = r.role === "heat-source" ? 1 : 0;
    path = new Array<string>(lead + flowLeg.length + 1 + returnLeg.length);
    if (lead) path[0] = r.id;
    for (let i = 0; i < flowLeg.length; i++) path[lead + i] = flowLeg[flowLeg.length - 1 - i]!;
    path[lead + flowLeg.length] = load.id;
    for (let i = 0; i < returnLeg.length; i++) path[lead + flowLeg.length + 1 + i] = returnLeg[i]!;
  }
  return circuit(dpRoot, r.id, path, Number.isFinite(dp) ? dp : null);
}

function markIndex(ctx: EngineContext, circuits: TracedCircuit[]): void {
  const rho = ctx.fluid!.densityKgM3;
  const best = new Map<number, TracedCircuit>();
  for (const c of circuits) {
    if (c.rootLink === null || c.pressureDropKpa === null) continue;
    const b = best.get(c.rootLink);
    if (!b || c.pressureDropKpa > b.pressureDropKpa!) best.set(c.rootLink, c);
  }
  for (const c of circuits) {
    if (c.rootLink === null || c.pressureDropKpa === null) continue;
    const idx = best.get(c.rootLink)!;
    if (idx === c) {
      c.index = true;
      c.excessKpa = 0;
      continue;
    }
    c.excessKpa = idx.pressureDropKpa! - c.pressureDropKpa;
    // Below 0.1 kPa there is nothing to burn: a Kv would be meaninglessly large.
    c.balancingKv = c.excessKpa > 0.1 && c.flowM3h > 0 ? kvForPressureDrop(c.flowM3h, c.excessKpa * 1000, rho) : null;
  }
}
