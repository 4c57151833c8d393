/**
 * Expansion-vessel verdict on each side of its limit: ok when the vessels drawn hold
 * at least the EN 12828 Annex D nominal volume, not ok (with `vessel.too-small`)
 * below it. V_n is worked out here: V_s from the pipes' inner volume (EN 1057
 * Table X bores) and the parts' stated water contents, e(10 → 55 °C) = 1.421 %
 * (IAPWS-95, references §1.4), V_WR = 3 L, p_0 = 5 m/10 + 0.2 = 0.7 bar,
 * p_e = 3 − 0.5 = 2.5 bar (testing/hand-calc.ts en12828NominalL).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { COPPER_ID_MM, en12828NominalL, litresPerM, WATER_EXPANSION_FROM_10C } from "@/lib/hydraulics/testing/hand-calc";

function doc(vesselsL: number[], coldFillPressureBar = 1.2) {
  const cu = (id: string, from: string, to: string, size: string, lengthM: number) => ({ id, from, to, material: "copper", size, lengthM });
  return {
    format: "loopwright/schematic", version: 1, name: "vessel verdict", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, maxFlowTemperatureC: 55, fillTemperatureC: 10, coldFillPressureBar, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1, targetGradientPaPerM: 300 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, kv: 2, waterVolumeL: 40, pumpCurve: [[0, 40], [1, 30], [2, 0]] } },
      { id: "hl", type: "heat-load", props: { heatLoadW: 3000, kv: 1, waterVolumeL: 100 } },
      { id: "t", type: "tee" },
      ...(vesselsL.length > 1 ? [{ id: "t2", type: "tee" }] : []),
      ...vesselsL.map((v, i) => ({ id: `ev${i + 1}`, type: "expansion-vessel", props: { volumeL: v, prechargeBar: 0.7 } })),
    ],
    pipes: [
      cu("f", "hp.flow", "hl.flow", "22", 2),
      cu("r1", "hl.return", "t.a", "22", 1),
      cu("r2", "t.b", "hp.return", "22", 1),
      ...(vesselsL.length === 1 ? [cu("e1", "t.c", "ev1.connection", "15", 1)] : []),
      ...(vesselsL.length > 1 ? [cu("e0", "t.c", "t2.a", "15", 0.5), cu("e1", "t2.b", "ev1.connection", "15", 0.25), cu("e2", "t2.c", "ev2.connection", "15", 0.25)] : []),
    ],
  };
}
// V_s = 4 m Cu 22 (0.32047 L/m) + 1 m Cu 15 (0.14527 L/m) + 40 + 100 = 141.427 L → V_n = (0.01421·141.427 + 3)·3.5/1.8 = 9.741 L
const systemL = 4 * litresPerM(COPPER_ID_MM["22"]) + 1 * litresPerM(COPPER_ID_MM["15"]) + 140;
const hand = en12828NominalL(systemL, WATER_EXPANSION_FROM_10C[55], 5, 3);

function vessel(d: unknown) {
  const out = calculate(d);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return { ev: out.results.expansionVessel!, tooSmall: out.results.findings.filter((f) => f.code === "vessel.too-small") };
}

describe("expansion vessel verdict (EN 12828 Annex D)", () => {
  it("hand numbers: V_s 141.43 L, V_e 2.010 L, p_0 0.7 bar, p_e 2.5 bar, V_n 9.741 L", () => {
    expect(systemL).toBeCloseTo(141.427, 3);
    expect(hand.expansionL).toBeCloseTo(2.0097, 4);
    expect(hand.nominalL).toBeCloseTo(9.741, 3);
  });

  // V_s: same bores and π → 1e-9; V_e and V_n: e from the engine's water vs the IAPWS-95 table,
  // ±0.01 percentage points (references §1.4) → ±0.7 % on V_e, ±0.3 % on V_n.
  it("results carry the hand numbers", () => {
    const { ev } = vessel(doc([10]));
    expect(Math.abs(ev.systemVolumeL! / systemL - 1)).toBeLessThan(1e-9);
    expect(Math.abs(ev.expansionVolumeL! / hand.expansionL - 1)).toBeLessThan(7e-3);
    expect(ev.recommendedPrechargeBar).toBeCloseTo(0.7, 9);
    expect(Math.abs(ev.requiredVolumeL! / hand.nominalL - 1)).toBeLessThan(3e-3);
  });

  it("a vessel 2 % above V_n: ok, no vessel.too-small", () => {
    const { ev, tooSmall } = vessel(doc([1.02 * hand.nominalL]));
    expect(ev.providedVolumeL).toBeCloseTo(1.02 * hand.nominalL, 9);
    expect(ev.ok).toBe(true);
    expect(tooSmall).toEqual([]);
  });

  it("a vessel 2 % below V_n: not ok, vessel.too-small (error) naming it", () => {
    const { ev, tooSmall } = vessel(doc([0.98 * hand.nominalL]));
    expect(ev.ok).toBe(false);
    expect(tooSmall.map((f) => [f.severity, f.refs])).toEqual([["error", ["ev1"]]]);
  });

  it("two vessels count together: 2 × 0.51·V_n ok, 2 × 0.49·V_n not ok (naming both)", () => {
    const two = doc([0.51 * hand.nominalL, 0.51 * hand.nominalL]);
    const { ev } = vessel(two);
    // the 2 × 0.25 m of Cu 15 to the second vessel replace 0.5 m of the single leg: same V_s
    expect(Math.abs(ev.systemVolumeL! / systemL - 1)).toBeLessThan(1e-9);
    expect(ev.providedVolumeL).toBeCloseTo(1.02 * hand.nominalL, 9);
    expect(ev.ok).toBe(true);
    const low = vessel(doc([0.49 * hand.nominalL, 0.49 * hand.nominalL]));
    expect(low.ev.ok).toBe(false);
    expect(low.tooSmall[0]!.refs).toEqual(["ev1", "ev2"]);
  });

  it("no vessel drawn: nothing to judge (ok null), the required volume is still given", () => {
    const { ev } = vessel(doc([]));
    expect(ev.providedVolumeL).toBeNull();
    expect(ev.ok).toBeNull();
    // without the 1 m vessel leg: V_s 141.28 L
    expect(Math.abs(ev.requiredVolumeL! / en12828NominalL(systemL - litresPerM(COPPER_ID_MM["15"]), 0.01421, 5, 3).nominalL - 1)).toBeLessThan(3e-3);
  });
});

describe("cold fill pressure (EN 12828 Annex D, Boyle): within [p_fill,min, p_e)", () => {
  // p_fill,min = (p_0 + 1)·V/(V − V_WR) − 1 for the vessel drawn (V > V_WR), else for V_n; p_e = 3 − 0.5 = 2.5 bar.
  // 12 L drawn: 1.7·12/(12 − 3) − 1 = 1.2667 bar (hand). Same closed form both sides → ±0.005 bar margins suffice.
  const fillFindings = (fill: number, vesselsL: number[]) => {
    const out = calculate(doc(vesselsL, fill));
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    return out.results.findings.filter((f) => f.code === "vessel.fill-pressure");
  };
  it("12 L drawn: 1.27 bar fills enough, 1.26 bar does not (naming the vessel and the field, with the range)", () => {
    expect(fillFindings(1.27, [12])).toEqual([]);
    const low = fillFindings(1.26, [12]);
    expect(low.map((f) => [f.severity, f.refs, f.fields])).toEqual([["warning", ["ev1"], ["design.coldFillPressureBar"]]]);
    expect(low[0]!.message).toBe("design: cold fill 1.26 bar is outside 1.27–2.50 bar for a 12.0 L vessel pre-charged to 0.70 bar (EN 12828 Annex D)");
  });
  it("12 L drawn: 2.49 bar is below p_e = 2.5 bar, 2.5 bar is not", () => {
    expect(fillFindings(2.49, [12])).toEqual([]);
    expect(fillFindings(2.5, [12]).map((f) => f.refs)).toEqual([["ev1"]]);
  });
  it("no vessel drawn: judged against V_n = 9.741 L: 1.7·9.741/6.741 − 1 = 1.4566 bar (hand; ±0.003 bar for V_n's ±0.3 %)", () => {
    expect(1.7 * hand.nominalL / (hand.nominalL - 3) - 1).toBeCloseTo(1.4566, 3);
    expect(fillFindings(1.47, [])).toEqual([]);
    expect(fillFindings(1.44, []).map((f) => f.refs)).toEqual([[]]);
  });
  it("a 2 L vessel drawn, smaller than the 3 L reserve: judged against V_n too, and too small", () => {
    expect(fillFindings(1.47, [2])).toEqual([]);
    expect(fillFindings(1.44, [2]).map((f) => f.refs)).toEqual([["ev1"]]);
  });
});
