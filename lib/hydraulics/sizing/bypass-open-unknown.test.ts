/**
 * The differential bypass when the all-zones-open simulation does not converge (sizing/bypass.ts).
 * No valid drawing found so far makes it fail within its 50 iterations, so it is given one here.
 * The opening then rests on the zones' design Δp alone, by the same margin (the larger of +10 %
 * and +2 kPa, common practice), and the designer is told so by `bypass.open-dp-unknown`.
 */
import { describe, expect, it } from "vitest";
import { contextOf } from "@/lib/hydraulics/testing/context-of";
import { designDp, STRONG, twoZoneBypass, withMargin } from "@/lib/hydraulics/testing/two-zone-bypass";
import { sizeBypasses } from "./bypass";
import { runMode } from "./mode";

function sized(opening: number | null, openIterations?: number) {
  const { ctx, findings } = contextOf(twoZoneBypass({ curve: STRONG, valveKv: 0.3, opening }));
  const [bypass] = sizeBypasses(ctx, runMode(ctx, "heating"), openIterations);
  return { bypass: bypass!, of: (code: string) => findings.list.filter((f) => f.code === code) };
}

describe("bypass opening with the all-zones-open Δp unknown", () => {
  it("recommends the zones' design Δp (≈ 19.6 kPa by hand) plus its margin, and says why", () => {
    const { bypass, of } = sized(null, 1);
    const need = designDp(0.3); // the larger zone at design flow: 10 m Cu 15 + Kvs 4 + Kv 0.3
    expect(need).toBeGreaterThan(19);
    expect(need).toBeLessThan(20.5);
    // ±0.3 %: the engine's water and Colebrook against the hand calculation's (references §1.1, §2)
    expect(Math.abs(bypass.zonesDpKpa! / need - 1)).toBeLessThan(3e-3);
    expect(bypass.openZonesDpKpa).toBeNull();
    expect(Math.abs(bypass.recommendedOpeningKpa! / withMargin(need) - 1)).toBeLessThan(3e-3);
    expect(of("bypass.open-dp-unknown").map((x) => [x.severity, x.message, x.refs])).toEqual([
      ["info", "bp: the all-zones-open simulation did not converge, so the opening is recommended from the design Δp alone", ["bp"]],
    ]);
  });

  it("with its own iterations the simulation converges, finds the larger all-zones-open Δp and says nothing", () => {
    const { bypass, of } = sized(null);
    expect(bypass.openZonesDpKpa!).toBeGreaterThan(50); // ≈ 55 kPa by hand (bypass-verdict.test.ts)
    expect(of("bypass.open-dp-unknown")).toEqual([]);
  });

  it("a drawn opening below the zones' design Δp is low, and the message names that Δp", () => {
    const need = designDp(0.3);
    const low = sized(need - 1, 1).of("bypass.opening-low");
    expect(low).toHaveLength(1);
    expect(low[0]!.message).toContain(`below the zones' ${need.toFixed(1)} kPa at design flow`);
    expect(sized(need + 0.5, 1).of("bypass.opening-low")).toEqual([]);
  });
});
