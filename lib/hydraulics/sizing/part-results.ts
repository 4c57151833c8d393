/**
 * Per-part flow and pressure drop. In design, a part's drop is its own law at
 * the design flow (Kv devices Δp = (q/Kv)² bar, loads their valve or loop, a
 * pump its head as a negative drop); a valve shut in that mode has no flow and
 * no stated drop. In a simulation the drop is simply the solved head
 * difference across the part, so a shut bypass shows the Δp it holds.
 */
import { NO_FLOW_M3H, type LinkTable } from "@/lib/hydraulics/network/behaviour";
import { pumpHeadKpa } from "@/lib/hydraulics/pumps/curve";
import type { PartResult } from "@/lib/schematic/results";
import type { EngineContext } from "./context";
import { isCut, usableCurve, type NetworkState } from "./laws";

const fin = (x: number): number | null => (Number.isFinite(x) ? x : null);
const clean = (q: number) => (Math.abs(q) < NO_FLOW_M3H ? 0 : q);

/** The link that carries the part's flow for reporting (selected diverter side, header primary pass). */
function mainLink(ctx: EngineContext, ks: number[], state: NetworkState): number {
  if (ks.length === 1) return ks[0]!;
  const sim: NetworkState = { ...state, purpose: "simulate" };
  const open = ks.find((k) => !isCut(ctx, ctx.model.links[k]!, sim));
  return open ?? ks[0]!;
}

export function pumpHeadAt(curve: Parameters<typeof pumpHeadKpa>[0] | null, q: number): number | null {
  const c = usableCurve(curve);
  if (!c || !(q >= 0)) return null;
  return pumpHeadKpa(c, q);
}

export function partResults(
  ctx: EngineContext,
  state: NetworkState,
  laws: LinkTable,
  q: Float64Array,
  head: Float64Array,
  /** assumed values every flow rests on (design.ts: where loops split it) */
  shared: readonly string[] = [],
): PartResult[] {
  const out: PartResult[] = [];
  const tmp = new Float64Array(2);
  for (const part of ctx.doc.parts) {
    const ks = ctx.model.linksOfPart.get(part.id);
    if (!ks) continue;
    const k = mainLink(ctx, ks, state);
    const link = ctx.model.links[k]!;
    const flow = clean(q[k]!);
    let dp: number | null;
    if (state.purpose === "simulate") dp = head[link.from]! - head[link.to]!;
    else if (link.role === "pump") {
      const h = pumpHeadAt((part.props as { curve: [number, number][] }).curve, flow);
      dp = h === null ? null : -h;
    } else if (link.role === "load") {
      laws.evaluateOwn(k, flow, tmp);
      dp = tmp[0]!;
    } else if (link.role.startsWith("header")) dp = 0;
    else if (link.role === "bypass") {
      // Shut at design: the Δp it sees there is the head difference across it.
      dp = head[link.from]! - head[link.to]!;
    } else if (isCut(ctx, link, state)) {
      dp = null;
      ctx.findings.info("valve.shut", `${part.id} is drawn shut: no flow and no pressure drop through it at design`, [part.id]);
    } else {
      laws.evaluate(k, flow, tmp);
      dp = tmp[0]!;
    }
    const ref = ctx.inputs.kvRefOfPart.get(part.id);
    const restsOn = [...new Set([...(ref ? [ref] : []), ...shared])];
    out.push({ id: part.id, flowM3h: fin(flow), pressureDropKpa: dp === null ? null : fin(dp), restsOn });
  }
  return out;
}
