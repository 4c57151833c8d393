/**
 * The differential bypass when the all-zones-open simulation does not converge (sizing/bypass.ts):
 * no valid drawing found so far makes that simulation fail, so the simulation is made to report
 * non-convergence here (its flows and heads stay the real ones). The opening then rests on the
 * zones' design Δp alone, by the same margin (the larger of +10 % and +2 kPa, common practice), and
 * the designer is told so by `bypass.open-dp-unknown`.
 */
import { describe, expect, it, vi } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { designDp, STRONG, twoZoneBypass, withMargin } from "@/lib/hydraulics/testing/two-zone-bypass";

vi.mock(import("@/lib/hydraulics/scenarios/simulate"), async (importOriginal) => {
  const real = await importOriginal();
  return { ...real, simulate: (...a: Parameters<typeof real.simulate>) => ({ ...real.simulate(...a), converged: false }) };
});

function run(opening: number | null) {
  const out = calculate(twoZoneBypass({ curve: STRONG, valveKv: 0.3, opening }));
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}

describe("bypass opening with the all-zones-open Δp unknown", () => {
  it("recommends the zones' design Δp (≈ 19.6 kPa by hand) plus its margin, and says why", () => {
    const r = run(null);
    const need = designDp(0.3); // the larger zone at design flow: 10 m Cu 15 + Kvs 4 + Kv 0.3
    expect(need).toBeGreaterThan(19);
    expect(need).toBeLessThan(20.5);
    // ±0.3 %: the engine's water and Colebrook against the hand calculation's (references §1.1, §2)
    expect(Math.abs(r.bypass!.zonesDpKpa! / need - 1)).toBeLessThan(3e-3);
    expect(r.bypass!.openZonesDpKpa).toBeNull();
    expect(Math.abs(r.bypass!.recommendedOpeningKpa! / withMargin(need) - 1)).toBeLessThan(3e-3);
    const f = r.findings.filter((x) => x.code === "bypass.open-dp-unknown");
    expect(f.map((x) => [x.severity, x.refs])).toEqual([["info", ["bp"]]]);
    expect(f[0]!.message).toMatch(/^bp: the all-zones-open simulation did not converge, so the opening is recommended from the design Δp alone$/);
  });

  it("a drawn opening below the zones' design Δp is low, and the message names that Δp", () => {
    const need = designDp(0.3);
    const low = run(need - 1).findings.filter((x) => x.code === "bypass.opening-low");
    expect(low).toHaveLength(1);
    expect(low[0]!.message).toContain(`below the zones' ${need.toFixed(1)} kPa at design flow`);
    expect(run(need + 0.5).findings.filter((x) => x.code === "bypass.opening-low")).toEqual([]);
  });
});
