/**
 * Pump duty per side: design flow through the side's pump, the head required
 * (its index circuit's pressure drop) and the head available — the sum of the
 * heads of the pumps in series on that side at their design flows (a heat
 * source's own pump curve counts), read off the curves (pumps/curve.ts).
 *
 * Pump setting, when the available head exceeds the required: the surplus,
 * the speed as a fraction of the curve drawn at which the pump meets the duty
 * (affinity laws, pumps/affinity.ts; pumps in series on a side on their summed
 * curve, pumps/curve.ts seriesCurve, all at that one speed), and for a
 * constant-pressure mode the head to set (the head required). More than
 * PUMP_OVERSIZE_MARGIN above the head required is a `pump.oversized` finding:
 * the surplus is burnt in valves (noise, TRVs that cannot close, a bypass that
 * lifts) and in electricity. The margin is common practice, not a standard value.
 */
import type { PumpDuty } from "@/lib/schematic/results";
import type { EngineContext } from "./context";
import { requiredHeads, type CircuitAnalysis } from "./circuits";
import type { DesignSolution } from "./design-solution";
import { pumpHeadAt } from "./part-results";
import { affinitySpeedFraction, PUMP_OVERSIZE_MARGIN } from "@/lib/hydraulics/pumps/affinity";
import { seriesCurve, type PumpCurve } from "@/lib/hydraulics/pumps/curve";
import { usableCurve } from "./laws";

const fin = (x: number | null): number | null => (x !== null && Number.isFinite(x) ? x : null);

function curveOf(ctx: EngineContext, linkIndex: number): [number, number][] | null {
  const part = ctx.doc.parts[ctx.model.links[linkIndex]!.index]!;
  if (part.type === "pump") return part.props.curve;
  if (part.type === "heat-pump" || part.type === "boiler") return part.props.pumpCurve;
  return null;
}

export function pumpDuties(ctx: EngineContext, sol: DesignSolution, ca: CircuitAnalysis, restsOn: string[][] = []): PumpDuty[] {
  const duties: PumpDuty[] = [];
  const heads = requiredHeads(ca);
  for (const [side, root] of ca.rootOfSide) {
    const circuits = ca.circuits.filter((c) => c.side === side && c.pressureDropKpa !== null);
    if (circuits.length === 0) continue;
    const required = heads.get(root)!;
    const rootId = ctx.model.links[root]!.id;
    let available: number | null = 0;
    let offCurve = false;
    for (const k of ca.pumpsOfSide.get(side) ?? []) {
      const id = ctx.model.links[k]!.id;
      const q = Math.abs(sol.q[k]!);
      const h = pumpHeadAt(curveOf(ctx, k), q);
      if (h === null) {
        ctx.findings.warning(
          "pump.curve-short",
          `${id}: design flow ${q.toFixed(3)} m³/h in ${sol.mode} mode is beyond the end of its curve (or the curve is unusable), so its head there is unknown`,
          [id],
        );
        available = null;
        offCurve = true;
      } else if (available !== null) available += h;
    }
    // Past the end of its curve a pump cannot deliver the design flow: not ok, head unknown.
    const ok = offCurve ? false : available === null ? null : available >= required;
    if (ok === false && available !== null) {
      ctx.findings.error(
        "pump.head-low",
        `${rootId}: needs ${required.toFixed(1)} kPa at ${Math.abs(sol.q[root]!).toFixed(3)} m³/h in ${sol.mode} mode but the curve gives ${available!.toFixed(1)} kPa`,
        [rootId, ...circuits.filter((c) => c.index).map((c) => c.load)],
      );
    }
    const designFlow = Math.abs(sol.q[root]!);
    const pumps = ca.pumpsOfSide.get(side) ?? [];
    // Heads are added for pumps in series, which every circuit of the side passes; a pump off the index
    // circuit's path sits beside the others (in parallel), which this sizing does not model.
    const indexPath = new Set(circuits.find((c) => c.index)?.path ?? []);
    const beside = pumps.filter((k) => k !== root).map((k) => ctx.model.links[k]!.id).filter((id) => !indexPath.has(id));
    if (beside.length > 0) {
      ctx.findings.warning(
        "pump.not-in-series",
        `${beside.join(", ")}: not on the index circuit's path through ${rootId}, so in parallel with it or beside it; pumps on one side are sized as in series (heads added), so this ${sol.mode} duty and the flows through ${beside.join(", ")} are not reliable. Draw pumps in parallel as one pump with their combined curve`,
        [rootId, ...beside],
      );
    }
    const surplus = available !== null && ok ? available - required : null;
    // several pumps on a side run in series (their heads were added above): one combined curve, one speed for all
    const curves = pumps.map((k) => usableCurve(curveOf(ctx, k)));
    const curve = curves.length > 0 && curves.every((c) => c !== null) ? seriesCurve(curves as PumpCurve[]) : null;
    const speed = surplus !== null && surplus > 0 && curve ? affinitySpeedFraction(curve, designFlow, required) : null;
    if (surplus !== null && required > 0 && surplus > PUMP_OVERSIZE_MARGIN * required) {
      const setting = [
        speed !== null ? `run it at about ${(speed * 100).toFixed(0)} % speed of the curve drawn (affinity laws)` : null,
        `set ${required.toFixed(1)} kPa in a constant-pressure mode`,
      ].filter(Boolean).join(", or ");
      ctx.findings.info(
        "pump.oversized",
        `${rootId}: gives ${available!.toFixed(1)} kPa at ${designFlow.toFixed(3)} m³/h in ${sol.mode} mode, ${surplus.toFixed(1)} kPa (${((surplus / required) * 100).toFixed(0)} %) more than the ${required.toFixed(1)} kPa needed — more than the ${PUMP_OVERSIZE_MARGIN * 100} % margin; ${setting}`,
        [rootId],
      );
    }
    const refs = new Set<string>();
    ca.circuits.forEach((c, i) => {
      if (c.side === side) for (const r of restsOn[i] ?? []) refs.add(r);
    });
    duties.push({
      id: rootId,
      designFlowM3h: fin(designFlow),
      requiredHeadKpa: fin(required),
      availableHeadKpa: fin(available),
      ok,
      surplusKpa: fin(surplus),
      speedFraction: fin(speed),
      constantPressureHeadKpa: fin(required),
      pumpIds: pumps.map((k) => ctx.model.links[k]!.id),
      restsOn: [...refs],
    });
  }
  return duties;
}
