/**
 * Differential-pressure bypass: the opening it should be set to and what the
 * heat source still gets when every zone valve is shut.
 *
 * Recommended opening = the largest zone-side Δp between the bypass ends at
 * design flow (over the circuits whose flow leg passes one end and return leg
 * the other) plus a margin of max(10 %, 2 kPa), so the bypass stays shut while
 * zones are open. The margin is common practice, not a standard value.
 */
import type { EngineContext } from "./context";
import { bypassBranchPoints, type ModeRun } from "./mode";

export const BYPASS_MARGIN_FRACTION = 0.1;
export const BYPASS_MARGIN_MIN_KPA = 2;

export interface BypassSizing {
  id: string;
  zonesDpKpa: number | null;
  recommendedOpeningKpa: number | null;
  /** opening used when simulating: the drawn one, else the recommended one */
  openingKpa: number | null;
}

export function sizeBypasses(ctx: EngineContext, heating: ModeRun | null): BypassSizing[] {
  const out: BypassSizing[] = [];
  const branch = bypassBranchPoints(ctx);
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
          const dp = c.pressureDropKpa - (h[r.to]! - h[f]!) - (h[b]! - h[r.from]!);
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
    const recommended = zones === null ? null : Math.max(zones * (1 + BYPASS_MARGIN_FRACTION), zones + BYPASS_MARGIN_MIN_KPA);
    if (drawn !== null && zones !== null && drawn < zones) {
      ctx.findings.warning(
        "bypass.opening-low",
        `${part.id}: opens at ${drawn} kPa, below the zones' ${zones.toFixed(1)} kPa at design flow, so it passes flow with every zone open`,
        [part.id],
      );
    }
    out.push({ id: part.id, zonesDpKpa: zones, recommendedOpeningKpa: recommended, openingKpa: drawn ?? recommended });
  }
  return out;
}
