/**
 * Differential bypass verdicts, worked out by hand:
 * - recommended opening = the larger of the zones' Δp between the bypass ends at
 *   design flow and the Δp the pump on its curve puts there with every zone open
 *   (bypass shut), plus a margin of the larger of 10 % and 2 kPa (common
 *   practice, sizing/bypass.ts). Two systems: one where 10 % is the larger margin
 *   (need ≈ 55 kPa), one where 2 kPa is (need ≈ 7 kPa);
 * - `bypass.opening-low` when a drawn opening is below that need;
 * - minFlowMet: the heat source's flow with every zone shut (all of it through the
 *   bypass, opening + (q/Kvs)²) against its minFlowM3h, with `heat-source.min-flow`.
 * Pump curves are read by straight lines; water at the 40 °C mean (IAPWS, references §1.1).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { bisect, copperDpKpa, curveHeadKpa, flowM3h, kvDpKpa } from "@/lib/hydraulics/testing/hand-calc";
import { designDp, mains, STRONG, twoZoneBypass, W, WEAK, withMargin, zoneDp, type Curve, type Opts } from "@/lib/hydraulics/testing/two-zone-bypass";

function run(o: Opts) {
  const out = calculate(twoZoneBypass(o));
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}

/** Every zone open, bypass shut: the identical zones share Q equally; pump curve = mains + zone. */
function openDp(curve: Curve, valveKv: number) {
  const q = bisect((x) => curveHeadKpa(curve, x) - mains(x) - zoneDp(x / 2, valveKv), 0.01, 1.99);
  return zoneDp(q / 2, valveKv);
}

describe("recommended bypass opening: need + max(10 %, 2 kPa)", () => {
  it("strong pump, stiff radiator valves (Kv 0.3): all-zones-open Δp ≈ 55 kPa governs, the 10 % margin is the larger", () => {
    const need = Math.max(designDp(0.3), openDp(STRONG, 0.3));
    expect(openDp(STRONG, 0.3)).toBeGreaterThan(designDp(0.3));
    expect(need).toBeGreaterThan(50);
    expect(need).toBeLessThan(60);
    const r = run({ curve: STRONG, valveKv: 0.3 });
    // ±0.5 %: the simulated operating point against the hand bisection (Δp ∝ Q², Q to 0.2 %)
    expect(Math.abs(r.bypass!.recommendedOpeningKpa! / withMargin(need) - 1)).toBeLessThan(5e-3);
    expect(r.bypass!.recommendedOpeningKpa! / need).toBeGreaterThan(1.095); // a 5 % margin would be 1.05
  });

  it("weak pump, easy valves (Kv 1): need ≈ 7 kPa, so the 2 kPa margin is the larger", () => {
    const need = Math.max(designDp(1), openDp(WEAK, 1));
    expect(need).toBeGreaterThan(5);
    expect(need).toBeLessThan(10);
    const r = run({ curve: WEAK, valveKv: 1 });
    expect(Math.abs(r.bypass!.recommendedOpeningKpa! - withMargin(need))).toBeLessThan(0.05); // kPa: 0.5 % of need
  });

  it("the zones' design Δp governs when the pump on its curve puts less across the ends: weak pump, Kv 0.3", () => {
    // zone 1 at its design 0.13022 m³/h: ≈ 19.6 kPa; the weak pump (9 kPa shut-off) cannot put that much across
    const need = Math.max(designDp(0.3), openDp(WEAK, 0.3));
    expect(designDp(0.3)).toBeGreaterThan(openDp(WEAK, 0.3));
    const r = run({ curve: WEAK, valveKv: 0.3 });
    expect(Math.abs(r.bypass!.recommendedOpeningKpa! / withMargin(need) - 1)).toBeLessThan(5e-3);
  });
});

describe("drawn opening against the need: bypass.opening-low", () => {
  const need = Math.max(designDp(0.3), openDp(STRONG, 0.3));
  const low = (r: ReturnType<typeof run>) => r.findings.filter((f) => f.code === "bypass.opening-low");

  it("3 % above the need: no finding, the bypass passes nothing with every zone open", () => {
    const r = run({ curve: STRONG, valveKv: 0.3, opening: 1.03 * need });
    expect(low(r)).toEqual([]);
    expect(r.scenarios.find((s) => s.name === "all zones open")!.parts.find((p) => p.id === "bp")!.flowM3h).toBe(0);
  });

  it("3 % below the need: bypass.opening-low naming the bypass, and it leaks with every zone open", () => {
    const r = run({ curve: STRONG, valveKv: 0.3, opening: 0.97 * need });
    expect(low(r).map((f) => [f.severity, f.refs])).toEqual([["warning", ["bp"]]]);
    expect(r.scenarios.find((s) => s.name === "all zones open")!.parts.find((p) => p.id === "bp")!.flowM3h!).toBeGreaterThan(0);
  });
});

describe("heat source minimum flow with every zone shut", () => {
  // all zones shut: the pump drives the bypass loop, H(Q) = mains(Q) + 1 m Cu 15 + opening 5 kPa + (Q/Kvs 2)²
  const shutQ = bisect((x) => curveHeadKpa(WEAK, x) - mains(x) - copperDpKpa(x, "15", 1, W) - 7.5 - kvDpKpa(x, 2, W.rho), 0.01, 1.99);
  const designQ = flowM3h(2500, 10, W); // both zones at design: 0.21707 m³/h
  const minFlowFindings = (r: ReturnType<typeof run>) => r.findings.filter((f) => f.code === "heat-source.min-flow");

  it("hand: the bypass loop meets the weak curve at ≈ 0.20 m³/h, below the design flow (so only the shut check can trip)", () => {
    expect(shutQ).toBeGreaterThan(0.15);
    expect(shutQ).toBeLessThan(0.95 * designQ);
    const r = run({ curve: WEAK, valveKv: 1, opening: 7.5 });
    // ±0.5 %: simulation against the hand bisection (both solve the same loop laws)
    expect(Math.abs(r.bypass!.heatSourceFlowAllZonesClosedM3h! / shutQ - 1)).toBeLessThan(5e-3);
  });

  it("minimum 3 % below that flow: met, no min-flow finding", () => {
    const r = run({ curve: WEAK, valveKv: 1, opening: 7.5, minFlow: 0.97 * shutQ });
    expect(r.bypass!.minFlowMet).toBe(true);
    expect(minFlowFindings(r)).toEqual([]);
  });

  it("minimum 3 % above it: not met, heat-source.min-flow naming the heat source", () => {
    const r = run({ curve: WEAK, valveKv: 1, opening: 7.5, minFlow: 1.03 * shutQ });
    expect(r.bypass!.minFlowMet).toBe(false);
    expect(minFlowFindings(r).map((f) => f.refs)).toEqual([["hp"]]);
  });

  it("the design flow (0.217 m³/h at 2.5 kW) is checked too: a bypass opening at 2 kPa keeps the shut flow high, so only it trips", () => {
    const r = run({ curve: WEAK, valveKv: 1, opening: 2, minFlow: 1.03 * designQ });
    expect(Math.abs(r.modes[0]!.heatSourceFlowM3h! / designQ - 1)).toBeLessThan(1e-3);
    expect(r.bypass!.minFlowMet).toBe(true);
    expect(minFlowFindings(r).map((f) => f.refs)).toEqual([["hp"]]);
    expect(minFlowFindings(r)[0]!.message).toMatch(/design flow/);
    expect(minFlowFindings(run({ curve: WEAK, valveKv: 1, opening: 2, minFlow: 0.97 * designQ }))).toEqual([]);
  });
});
