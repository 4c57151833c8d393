/**
 * From the engine's design modes to the fixed-flow problem (problem.ts).
 *
 * Which pipes may change: a pipe with a design flow in some mode, not locked by
 * the user and without an inner-diameter/roughness override (that pipe is not
 * a catalogue row). Pipes that carry no design flow — legs to the expansion
 * vessel, safety valve, gauges; the dp-bypass; circuits no mode serves — keep
 * their drawn size: their bore follows other rules (vessel connection, safety
 * valve inlet, the bypass's own duty), not velocity or pump head.
 *
 * Allowed sizes: the rows of the pipe's own material that the price list
 * offers, with velocity |q|/A ≤ design.maxVelocityMps at the design flow of
 * every mode (the same arithmetic as the engine's pipe results).
 *
 * Circuits: each circuit's path is the engine's own (the breadth-first trees
 * sizing/circuits.ts grows from each pump), walked link by link so the sign of
 * every pipe is known; its Δp splits into the free pipes' Darcy–Weisbach drops
 * and a fixed rest = engine Δp − those drops at the drawn sizes.
 */
import type { Finding } from "@/lib/hydraulics/findings/finding";
import { finding } from "@/lib/hydraulics/findings/finding";
import { sumFittingsK } from "@/lib/hydraulics/losses";
import { adjacency, type ModelLink } from "@/lib/hydraulics/network/model";
import type { PipeGeometry } from "@/lib/hydraulics/network/behaviour";
import { PIPE_DROP_SLOTS, pipeDropInto } from "@/lib/hydraulics/pipes/pressure-drop";
import { SIDE_EXCLUDED, tree } from "@/lib/hydraulics/sizing/circuits";
import { isCut } from "@/lib/hydraulics/sizing/laws";
import type { EngineView } from "./engine-view";
import { energyCostPerKpa } from "./life-cost";
import type { OptimiseOptions } from "./options";
import { offeredRows, type PriceList } from "./prices";
import type { Circuit, FreePipe, HeadGroup, Problem } from "./problem";

export type PipeStatus = "free" | "locked" | "override" | "no-flow";

export interface Extraction {
  problem: Problem;
  /** doc pipe index of each free pipe */
  freeIndex: number[];
  status: PipeStatus[];
  /** findings that make the request infeasible (nothing is proposed) */
  blockers: Finding[];
}

const scratch = new Float64Array(PIPE_DROP_SLOTS);

/**
 * |Δp| of a pipe at |q|, kPa: the engine's pipe law (network/behaviour.ts, Darcy–Weisbach via
 * pipeDropInto) with its linear branch below 1e-6 m³/h — the same arithmetic, so the same bits.
 */
export function pipeLossKpa(g: PipeGeometry, qAbsM3h: number, rho: number, nu: number): number {
  const qTiny = 1e-6;
  const a = Math.max(qAbsM3h, qTiny);
  const area = (Math.PI * g.innerDiameterM * g.innerDiameterM) / 4;
  pipeDropInto(a / 3600, g.innerDiameterM, area, g.lengthM, g.roughnessM / g.innerDiameterM, rho, nu, g.sumK, scratch);
  const h = scratch[0]! / 1000 + scratch[1]! / 1000;
  return qAbsM3h < qTiny ? (h / qTiny) * qAbsM3h : h;
}

export function extract(view: EngineView, options: OptimiseOptions, prices: PriceList): Extraction {
  const { ctx, runs } = view;
  const { doc, model } = ctx;
  const fluid = ctx.fluid!;
  const maxV = doc.design.maxVelocityMps;
  const locked = new Set(options.locked);
  const blockers: Finding[] = [];
  const status: PipeStatus[] = [];
  const pipes: FreePipe[] = [];
  const freeIndex: number[] = [];
  const freeOf = new Int32Array(doc.pipes.length).fill(-1);

  doc.pipes.forEach((pipe, i) => {
    const q = view.flowM3h[i]!;
    const flowing = q.some((x) => x > 0);
    const st: PipeStatus = !flowing ? "no-flow" : locked.has(pipe.id) ? "locked" : pipe.innerDiameterMm !== undefined || pipe.roughnessMm !== undefined ? "override" : "free";
    status.push(st);
    if (st !== "free") {
      const g = ctx.pipeGeom[i]!;
      const fast = runs.findIndex((_, m) => q[m]! / 3600 / ((Math.PI * g.innerDiameterM * g.innerDiameterM) / 4) > maxV);
      if (fast >= 0) {
        blockers.push(finding("error", "optimise.kept-pipe-too-fast", `pipe ${pipe.id} keeps its drawn size (${st === "locked" ? "locked" : "inner diameter given"}) but carries ${q[fast]!.toFixed(3)} m³/h in ${runs[fast]!.result.mode} mode, above ${maxV} m/s: unlock it or change it by hand`, [pipe.id]));
      }
      return;
    }
    const rows = offeredRows(prices, pipe.material).filter((row) => {
      const area = (Math.PI * (row.innerDiameterMm / 1000) * (row.innerDiameterMm / 1000)) / 4;
      return q.every((x) => !(x / 3600 / area > maxV));
    });
    if (rows.length === 0) {
      const m = q.indexOf(Math.max(...q));
      blockers.push(finding("error", "optimise.no-size-fast-enough", `pipe ${pipe.id}: no ${pipe.material} size the price list offers keeps ${q[m]!.toFixed(3)} m³/h (${runs[m]!.result.mode} mode) within ${maxV} m/s`, [pipe.id]));
      return;
    }
    const options = rows.map((row) => {
      const geom = { innerDiameterM: row.innerDiameterMm / 1000, roughnessM: row.roughnessMm / 1000, lengthM: pipe.lengthM, sumK: sumFittingsK(pipe.fittings, row.innerDiameterMm) };
      return {
        size: row.size,
        cost: prices.offered(pipe.material, row.size)! * pipe.lengthM,
        dp: Float64Array.from(q, (x) => (x > 0 ? pipeLossKpa(geom, x, fluid.densityKgM3, fluid.kinematicViscosityM2s) : 0)),
      };
    });
    freeOf[i] = pipes.length;
    freeIndex.push(i);
    pipes.push({ id: pipe.id, options, drawn: options.findIndex((o) => o.size === pipe.size) });
  });

  const groups: HeadGroup[] = [];
  const circuits: Circuit[] = [];
  const groupOf = new Map<string, number>();
  const energyPump = new Map<string, number>(); // pump id → the run whose duty its energy is counted at
  runs.forEach((run, m) => {
    for (const d of run.result.pumps) if (!energyPump.has(d.id) || run.result.mode === "heating") energyPump.set(d.id, m);
  });
  runs.forEach((run, m) => {
    const { links } = model;
    const state = run.solution.state;
    const inSide = links.map((l) => !SIDE_EXCLUDED.has(l.role) && !isCut(ctx, l, state));
    const adj = adjacency(model.nodeCount, links, (k) => inSide[k]!);
    const pf = new Int32Array(model.nodeCount).fill(-2);
    const pr = new Int32Array(model.nodeCount).fill(-2);
    for (const root of run.circuits.rootOfSide.values()) {
      tree(links[root]!.to, root, adj, links, pf);
      tree(links[root]!.from, root, adj, links, pr);
    }
    const served = new Map(run.solution.served.map((l) => [l.id, l]));
    for (const c of run.circuits.circuits) {
      if (c.rootLink === null || c.pressureDropKpa === null) continue;
      const pumpId = links[c.rootLink]!.id;
      const key = `${m}:${c.rootLink}`;
      let g = groupOf.get(key);
      if (g === undefined) {
        const duty = run.result.pumps.find((d) => d.id === pumpId);
        const available = duty?.availableHeadKpa ?? null;
        if (available === null) {
          blockers.push(finding("error", "optimise.head-unknown", `${pumpId}: its head at the design flow in ${run.result.mode} mode is unknown (curve too short or unusable), so no sizes can be checked against it`, [pumpId]));
        }
        const perKpa = options.objective === "life-cost" && energyPump.get(pumpId) === m && duty?.designFlowM3h ? energyCostPerKpa(duty.designFlowM3h, options.lifeCost) : 0;
        g = groups.push({ mode: m, pumpId, limitKpa: (available ?? Number.NaN) - options.headMarginKpa, perKpa }) - 1;
        groupOf.set(key, g);
      }
      const signs = new Map<number, number>();
      let fixed = c.pressureDropKpa;
      const load = served.get(c.load)!;
      const ok = walkCircuit(links, load.inNode, load.outNode, pf, pr, (k, dir) => {
        if (links[k]!.role !== "pipe") return;
        const i = links[k]!.index;
        const f = freeOf[i]!;
        const q = run.solution.q[k]!;
        if (f < 0 || q === 0) return;
        const s = dir * Math.sign(q);
        fixed -= s * pipeLossKpa(ctx.pipeGeom[i]!, Math.abs(q), fluid.densityKgM3, fluid.kinematicViscosityM2s);
        signs.set(f, (signs.get(f) ?? 0) + s);
      });
      if (!ok) {
        blockers.push(finding("error", "optimise.circuit-unmodelled", `the circuit of ${c.load} (${pumpId}, ${run.result.mode} mode) has no path the optimiser can follow`, [c.load, pumpId]));
        continue;
      }
      const entries = [...signs].filter(([, s]) => s !== 0);
      circuits.push({ group: g, load: c.load, fixedKpa: fixed, pipes: Int32Array.from(entries, (e) => e[0]), sign: Int8Array.from(entries, (e) => e[1]) });
    }
  });
  return { problem: { pipes, circuits, groups }, freeIndex, status, blockers };
}

/**
 * Walk a circuit's flow leg (pump outlet → load inlet) and return leg (load outlet → pump inlet)
 * up the breadth-first trees; visit(link, dir) with dir = +1 where the path runs from → to.
 * False when a leg does not reach its pump (the engine then lists no path either).
 */
function walkCircuit(links: readonly ModelLink[], inNode: number, outNode: number, pf: Int32Array, pr: Int32Array, visit: (k: number, dir: number) => void): boolean {
  const leg = (start: number, parent: Int32Array, flowLeg: boolean) => {
    let n = start;
    for (let guard = 0; parent[n] !== -1; guard++) {
      const k = parent[n]!;
      if (k === -2 || guard > parent.length) return false;
      const l = links[k]!;
      const m = l.from === n ? l.to : l.from;
      // flow leg: the path runs from the parent m down to n; return leg: from n up to m
      visit(k, (flowLeg ? l.from === m : l.from === n) ? 1 : -1);
      n = m;
    }
    return true;
  };
  return leg(inNode, pf, true) && leg(outNode, pr, false);
}
