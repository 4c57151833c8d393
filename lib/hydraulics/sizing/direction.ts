/**
 * Parts piped the wrong way round: a heat source whose flow leaves by its
 * return port, a pump whose flow runs from its outlet to its inlet (against
 * its head), a load whose flow port is on the return side. The engine sizes
 * the drawing as drawn, so after such a mistake its numbers are not a design:
 * each is an error naming the part, once, whatever the mode.
 *
 * Heat sources and loads are judged by the sides their ports sit on
 * (findings/flow-sides.ts). Where that says nothing (a fixed bypass joins flow and
 * return, or a heat source with one load is a tie) a heat source is judged by
 * its design flow, and pumps always are: design mode drives the loads' design
 * flows, flow port to return port, through the rest of the network
 * (sizing/design.ts), so a negative flow through a pump or heat source runs
 * against it. A load or buffer drawn backwards would reverse those flows too,
 * so design flows judge nothing while one is (the load's own error comes
 * first); and where a heat source and one load tie, a pump in series that
 * the design flow also passes backwards sides with the heat source, naming
 * the load (or, behind a bypass, only the heat source). Parts with no flow direction — valves, check valves, bypasses,
 * buffers and headers (whose ports vote but are never named) — are not judged.
 */
import { flowSides } from "@/lib/hydraulics/findings/flow-sides";
import { isPumpLink } from "./circuits";
import type { EngineContext } from "./context";
import type { ModeRun } from "./mode";

/** A design flow that runs backwards through a part: how much, and in which mode. */
type Backward = { q: number; mode: string };

/** Below this a design flow has no direction worth naming (m³/h): round-off of the solver. */
const NO_FLOW_M3H = 1e-6;

const CHECK =
  "check the connections against the manufacturer's instructions; until it is fixed the flows, pump duty and balancing worked out here are not a design";

/** What running a part backwards does, by type: common practice, recalled, not from one published source. */
const LOAD_NOTE: Partial<Record<string, string>> = {
  radiator: " Thermostatic radiator valves are made for one flow direction and can hammer when the water runs through them backwards.",
  cylinder: " A coil run backwards loses its counterflow, so the store reheats more slowly and may not reach its temperature.",
  "ufh-loop": " Each loop belongs between the manifold's flow bar and its return bar.",
};

function sourceMessage(id: string, ownPump: boolean, byFlow: Backward | null): string {
  const what = byFlow
    ? `its design flow (${byFlow.q.toFixed(3)} m³/h in ${byFlow.mode} mode) enters by its flow port and leaves by its return port — flow and return are swapped (if the heat source is piped right, a load on its circuit, or the primary connections of a buffer or low-loss header, are drawn the wrong way round)`
    : "piped the wrong way round — its flow port is joined to the return side of the circuit and its return port to the flow side";
  return `${id}: ${what}. Swap the pipes at its flow and return connections. Run backwards a heat pump or boiler reads its flow and return temperatures the wrong way round and can overheat, short-cycle or trip${ownPump ? ", and its own pump pushes against the circuit" : ""}: ${CHECK}`;
}

function pumpMessage(id: string, q: number, mode: string): string {
  return `${id}: drawn backwards — its design flow (${q.toFixed(3)} m³/h in ${mode} mode) runs from its outlet to its inlet, against its head. Turn it round (or swap the pipes at its in and out ports); its duty here is worked as if it were turned round. Fitted backwards a pump gives little or no flow, so the heat source can overheat or trip on low flow: check the arrow on the pump body against the manufacturer's instructions`;
}

function loadMessage(id: string, type: string): string {
  return `${id}: piped the wrong way round — its flow port is on the return side of the circuit and its return port on the flow side, so water from the heat source reaches its return port first. Swap the pipes at its flow and return connections: the sizing sends its design flow in at its flow port, against the rest of the circuit, so the heat source's flow, the pump duty and this circuit's pressure drop and balancing are not a design until it is fixed.${LOAD_NOTE[type] ?? ""}`;
}

export function directionFindings(ctx: EngineContext, runs: readonly ModeRun[]): void {
  const { model, doc, findings } = ctx;
  const { links } = model;
  const { score, piece } = flowSides(model);
  const loads = new Set(links.flatMap((l, k) => (l.role === "load" && score[k]! < 0 ? [k] : [])));
  // a load or header pass on the wrong side reverses design flows: they judge nothing then
  const flowsJudge = loads.size === 0 && !links.some((l, k) => l.role.startsWith("header-") && score[k]! < 0);
  const back = new Map<number, Backward>();
  links.forEach((l, k) => {
    if (!flowsJudge || !(l.role === "pump" || (l.role === "heat-source" && score[k] === 0))) return;
    const b = backwardFlow(ctx, runs, k);
    if (b) back.set(k, b);
  });
  // Where the sides tie (one heat source, one load) a pump in series that the design flow also
  // passes backwards agrees with the heat source: the load joining their sides the other way is the
  // one reversed (two parts against one). Where a bypass joins the sides no load can be told: the
  // heat source alone is named, its message saying a load may be the one.
  for (const k of [...back.keys()]) {
    const l = links[k]!;
    if (l.role !== "heat-source") continue;
    const ends = [piece[l.from]!, piece[l.to]!];
    const pumps = [...back.keys()].filter((j) => links[j]!.role === "pump" && ends.includes(piece[links[j]!.from]!));
    if (pumps.length === 0) continue;
    for (const j of pumps) back.delete(j);
    const odd = ends[0] === ends[1] ? [] : links.flatMap((m, j) => (m.role === "load" && piece[m.from] === ends[0] && piece[m.to] === ends[1] ? [j] : []));
    if (odd.length > 0) back.delete(k);
    for (const j of odd) loads.add(j);
  }
  links.forEach((l, k) => {
    const b = back.get(k);
    if (loads.has(k)) findings.error("load.reversed", loadMessage(l.id, doc.parts[l.index]!.type), [l.id]);
    else if (l.role === "pump" && b) findings.error("pump.reversed", pumpMessage(l.id, b.q, b.mode), [l.id]);
    else if (l.role === "heat-source" && (score[k]! < 0 || b)) {
      findings.error("heat-source.reversed", sourceMessage(l.id, isPumpLink(ctx, l), b ?? null), [l.id]);
    }
  });
}

/**
 * The first mode whose design flow runs backwards through link k, or undefined. A pump (or a heat
 * source with its own pump) counts only where it drives its side or lies on a circuit's path: one
 * drawn beside another pump gets an arbitrary share of the flow in design (pump.not-in-series).
 */
function backwardFlow(ctx: EngineContext, runs: readonly ModeRun[], k: number): Backward | undefined {
  const l = ctx.model.links[k]!;
  for (const { solution, circuits } of runs) {
    const q = solution.q[k]!;
    if (!(q < -NO_FLOW_M3H)) continue;
    const driven = !isPumpLink(ctx, l) || [...circuits.rootOfSide.values()].includes(k) || circuits.circuits.some((c) => c.path.includes(l.id));
    if (driven) return { q: -q, mode: solution.mode };
  }
  return undefined;
}
