/**
 * Temperatures in a simulated state, by steady mixing along the solved flows:
 * every heat source delivers the design flow temperature; an emitter's outlet
 * follows from its EN 442 characteristic at its flow (emitters/emitterAtFlow);
 * a cylinder coil gives up at most its rated output; other loads (UFH loops,
 * fan coils, heat loads) ṁ·cp·ΔT at their design ΔT, capped by their heat
 * load and never cooling the water below the room (a fixed load with a fixed
 * ΔT: less flow, proportionally less heat — on the safe side for a starved
 * loop); a junction mixes its inflows by flow (Σq·T/Σq, constant ρ·cp — the
 * first-law balance). Links are visited in topological order of the flow
 * direction (Kahn 1962); loops that bypass the heat source (a buffer's
 * secondary) are closed by repeating that order until temperatures settle.
 */
import { emitterAtFlow } from "@/lib/hydraulics/emitters";
import { NO_FLOW_M3H } from "@/lib/hydraulics/network/behaviour";
import type { EngineContext } from "@/lib/hydraulics/sizing/context";

export interface Thermal {
  nodeC: Float64Array;
  /** per load link: output W and outlet °C */
  loadOutputW: Map<number, number>;
  loadOutletC: Map<number, number>;
  heatSourceReturnC: number | null;
}

export function thermal(ctx: EngineContext, q: Float64Array): Thermal {
  const { model, doc } = ctx;
  const fluid = ctx.fluid!;
  const n = model.nodeCount;
  const flowC = ctx.flowC;
  // Flowing links grouped by downstream node (inflows) and upstream node (outflows), CSR.
  const inStart = new Int32Array(n + 1);
  const outStart = new Int32Array(n + 1);
  const L = model.links.length;
  for (let k = 0; k < L; k++) {
    if (Math.abs(q[k]!) < NO_FLOW_M3H) continue;
    const l = model.links[k]!;
    inStart[(q[k]! > 0 ? l.to : l.from) + 1]!++;
    outStart[(q[k]! > 0 ? l.from : l.to) + 1]!++;
  }
  for (let i = 0; i < n; i++) {
    inStart[i + 1]! += inStart[i]!;
    outStart[i + 1]! += outStart[i]!;
  }
  const inList = new Int32Array(inStart[n]!);
  const outList = new Int32Array(outStart[n]!);
  const inFill = inStart.slice(0, n);
  const outFill = outStart.slice(0, n);
  for (let k = 0; k < L; k++) {
    if (Math.abs(q[k]!) < NO_FLOW_M3H) continue;
    const l = model.links[k]!;
    inList[inFill[q[k]! > 0 ? l.to : l.from]!++] = k;
    outList[outFill[q[k]! > 0 ? l.from : l.to]!++] = k;
  }
  const up = (k: number) => (q[k]! > 0 ? model.links[k]!.from : model.links[k]!.to);
  const down = (k: number) => (q[k]! > 0 ? model.links[k]!.to : model.links[k]!.from);
  // Kahn order; heat-source links do not create a dependency (fixed outlet).
  const indeg = new Int32Array(n);
  for (let j = 0; j < inList.length; j++) if (model.links[inList[j]!]!.role !== "heat-source") indeg[down(inList[j]!)]!++;
  const order: number[] = [];
  const done = new Uint8Array(n);
  const queue: number[] = [];
  for (let i = 0; i < n; i++) if (indeg[i] === 0) queue.push(i);
  let scan = 0;
  let qi = 0;
  while (order.length < n) {
    if (qi >= queue.length) {
      while (done[scan]) scan++;
      queue.push(scan); // a loop without the heat source: break it here
    }
    const v = queue[qi++]!;
    if (done[v]) continue;
    done[v] = 1;
    order.push(v);
    for (let j = outStart[v]!; j < outStart[v + 1]!; j++) {
      const k = outList[j]!;
      if (model.links[k]!.role === "heat-source") continue;
      const d = down(k);
      if (--indeg[d]! === 0 && !done[d]) queue.push(d);
    }
  }
  const nodeC = new Float64Array(n).fill(flowC);
  const outletC = new Float64Array(model.links.length).fill(flowC);
  const lastIn = new Float64Array(model.links.length).fill(NaN);
  const loadOutputW = new Map<number, number>();
  const loadOutletC = new Map<number, number>();
  const outlet = (k: number, tin: number): number => {
    const l = model.links[k]!;
    if (l.role === "heat-source") return flowC;
    if (l.role !== "load") return tin;
    if (lastIn[k] === tin) return outletC[k]!;
    lastIn[k] = tin;
    const part = doc.parts[l.index]!;
    const mdot = (Math.abs(q[k]!) / 3600) * fluid.densityKgM3;
    const cap = mdot * fluid.specificHeatJkgK;
    let w: number;
    let tout: number;
    if (part.type === "radiator") {
      const r = emitterAtFlow({
        outputAtDt50W: part.props.outputAtDt50W,
        exponentN: part.props.exponentN,
        flowC: tin,
        roomC: part.props.roomTemperatureC,
        massFlowKgs: mdot,
        specificHeatJkgK: fluid.specificHeatJkgK,
      });
      w = r.outputW;
      tout = r.returnC;
    } else if (part.type === "cylinder") {
      w = Math.max(0, Math.min(part.props.coilOutputKw * 1000, cap * (tin - part.props.coldWaterC)));
      tout = tin - w / cap;
    } else {
      // Fixed loads (ufh-loop, fan-coil, heat-load): ṁ·cp·ΔT at their design ΔT,
      // capped by the heat load, and never cooling the water below the room.
      const p = part.props as { heatLoadW: number; deltaTK?: number | null; roomTemperatureC?: number };
      const dT = p.deltaTK ?? ctx.deltaTK ?? 0;
      const roomC = Math.min(tin, p.roomTemperatureC ?? 20);
      w = Math.max(0, Math.min(p.heatLoadW, cap * dT, cap * (tin - roomC)));
      tout = tin - w / cap;
    }
    loadOutputW.set(k, w);
    loadOutletC.set(k, tout);
    outletC[k] = tout;
    return tout;
  };
  for (let pass = 0; pass < 60; pass++) {
    let change = 0;
    for (const v of order) {
      if (inStart[v] === inStart[v + 1]) continue;
      let sw = 0;
      let st = 0;
      for (let j = inStart[v]!; j < inStart[v + 1]!; j++) {
        const k = inList[j]!;
        const w = Math.abs(q[k]!);
        sw += w;
        st += w * outlet(k, nodeC[up(k)]!);
      }
      const t = st / sw;
      change = Math.max(change, Math.abs(t - nodeC[v]!));
      nodeC[v] = t;
    }
    if (change < 1e-6) break;
  }
  let ret: number | null = null;
  let sw = 0;
  let st = 0;
  model.links.forEach((l, k) => {
    if (l.role !== "heat-source" || Math.abs(q[k]!) < NO_FLOW_M3H) return;
    sw += Math.abs(q[k]!);
    st += Math.abs(q[k]!) * nodeC[up(k)]!;
  });
  if (sw > 0) ret = st / sw;
  return { nodeC, loadOutputW, loadOutletC, heatSourceReturnC: ret };
}
