/**
 * Differential-pressure bypass: the opening it should be set to and what the
 * heat source still gets when every zone valve is shut.
 *
 * Recommended opening = the larger of
 *  - the largest zone-side Δp between the bypass ends at design flow (over the
 *    circuits whose flow leg passes one end and return leg the other), and
 *  - the Δp the pumps really put across the bypass ends with every zone open
 *    and the bypass shut (simulated: pumps on their curves, no flow forced) —
 *    a pump on its curve usually delivers more than the design flow, and a
 *    valve set to the design Δp alone would then pass flow all the time,
 * plus a margin of max(10 %, 2 kPa), so the bypass stays shut while zones are
 * open. The margin is common practice, not a standard value.
 */
import { scenarioState } from "@/lib/hydraulics/scenarios/run";
import { simulate } from "@/lib/hydraulics/scenarios/simulate";
import type { EngineContext } from "./context";
import { bypassBranchPoints, type ModeRun } from "./mode";

export { BYPASS_MARGIN_FRACTION, BYPASS_MARGIN_MIN_KPA, BYPASS_RULE } from "./bypass-margin";
import { BYPASS_MARGIN_FRACTION, BYPASS_MARGIN_MIN_KPA } from "./bypass-margin";

export interface BypassSizing {
  id: string;
  /** largest zone-side Δp across the bypass ends at design flow, kPa */
  zonesDpKpa: number | null;
  /** Δp across the bypass ends with every zone open and the bypass shut (simulated), kPa */
  openZonesDpKpa: number | null;
  recommendedOpeningKpa: number | null;
  /** opening used when simulating: the drawn one, else the recommended one */
  openingKpa: number | null;
}

/** Heads with every zone valve open and every dp-bypass shut, pumps on their curves; null if it did not converge. */
function allZonesOpenHeads(ctx: EngineContext, heating: ModeRun, maxIterations?: number): Float64Array | null {
  const zones = ctx.doc.parts.filter((p) => p.type === "zone-valve").map((p) => p.id);
  const spec = { name: "all zones open", mode: "heating" as const, valves: Object.fromEntries(zones.map((z) => [z, true])) };
  // No opening given to any bypass: simulated as shut (laws.ts), so the heads are the Δp it must hold.
  const sim = simulate(ctx, scenarioState(ctx, spec, new Map()), heating.solution.q, maxIterations);
  return sim.converged ? sim.head : null;
}

/** `openIterations`: the all-zones-open simulation's iteration limit (simulate.ts's own unless given). */
export function sizeBypasses(ctx: EngineContext, heating: ModeRun | null, openIterations?: number): BypassSizing[] {
  const out: BypassSizing[] = [];
  const branch = bypassBranchPoints(ctx);
  let open: Float64Array | null | undefined;
  for (const [k, link] of ctx.model.links.entries()) {
    if (link.role !== "bypass") continue;
    const [endA, endB] = branch.get(k)!;
    const part = ctx.doc.parts[link.index]!;
    const drawn = (part.props as { openingKpa: number | null }).openingKpa;
    let zones: number | null = null;
    if (heating) {
      const h = heating.solution.head;
      for (const c of heating.circuits.circuits) {
        if (c.rootLink === null || c.pressureDropKpa === null) continue;
        const r = ctx.model.links[c.rootLink]!;
        const pairs: [number, number][] = [
          [endA, endB],
          [endB, endA],
        ];
        for (const [f, b] of pairs) {
          if (!c.passedFlow.includes(f) || !c.passedReturn.includes(b)) continue;
          // the circuit less what lies outside the bypass ends: the legs to and from them and the heat source's own loss
          const dp = c.pressureDropKpa - (h[r.to]! - h[f]!) - (h[b]! - h[r.from]!) - c.rootDpKpa;
          if (Number.isFinite(dp)) zones = Math.max(zones ?? -Infinity, dp);
        }
      }
    }
    if (zones === null) {
      ctx.findings.warning(
        "bypass.not-across-zones",
        `${part.id}: no heating circuit passes between its two ends, so no opening pressure can be recommended`,
        [part.id],
      );
    }
    let openDp: number | null = null;
    if (zones !== null && heating) {
      if (open === undefined) open = allZonesOpenHeads(ctx, heating, openIterations);
      const dp = open === null ? NaN : Math.abs(open[endA]! - open[endB]!);
      if (Number.isFinite(dp)) openDp = dp;
      else {
        ctx.findings.info(
          "bypass.open-dp-unknown",
          `${part.id}: the all-zones-open simulation did not converge, so the opening is recommended from the design Δp alone`,
          [part.id],
        );
      }
    }
    const need = zones === null ? null : Math.max(zones, openDp ?? -Infinity);
    const recommended = need === null ? null : Math.max(need * (1 + BYPASS_MARGIN_FRACTION), need + BYPASS_MARGIN_MIN_KPA);
    if (drawn !== null && need !== null && drawn < need) {
      const why =
        openDp !== null && openDp > zones!
          ? `the ${openDp.toFixed(1)} kPa the pump puts across its ends with every zone open`
          : `the zones' ${zones!.toFixed(1)} kPa at design flow`;
      ctx.findings.warning(
        "bypass.opening-low",
        `${part.id}: opens at ${drawn} kPa, below ${why}, so it passes flow with every zone open`,
        [part.id],
      );
    }
    out.push({ id: part.id, zonesDpKpa: zones, openZonesDpKpa: openDp, recommendedOpeningKpa: recommended, openingKpa: drawn ?? recommended });
  }
  return out;
}
