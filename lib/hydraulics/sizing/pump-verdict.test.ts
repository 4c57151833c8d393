/**
 * Pump verdict on each side of its limit: ok when the head the curve gives at the
 * design flow covers the index circuit's pressure drop, not ok (with
 * `pump.head-low`) when it falls short. The required head is worked out here by
 * hand (q = P/(ρ·cp·ΔT), Kv law, Darcy–Weisbach + Colebrook with IAPWS water at
 * the 40 °C mean, testing/hand-calc.ts); the curves are flat over the design flow,
 * so the head available is exactly the number written on the curve.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { copperDpKpa, flowM3h, kvDpKpa, WATER } from "@/lib/hydraulics/testing/hand-calc";

const W = WATER[40]; // mean of 45/35 °C
type Curve = [number, number][];

/** Heat pump (Kv 2) → 2 m Cu 22 → heat load 3 kW (Kv 1) → 2 m Cu 22 → back; pumps as given. */
function loop(opts: { hpCurve?: Curve | null; pumps?: Curve[] }) {
  const pumps = opts.pumps ?? [];
  const parts: unknown[] = [
    { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, minFlowM3h: 0, kv: 2, waterVolumeL: 2, pumpCurve: opts.hpCurve ?? null } },
    { id: "hl", type: "heat-load", props: { heatLoadW: 3000, kv: 1, waterVolumeL: 1 } },
    ...pumps.map((curve, i) => ({ id: `pu${i + 1}`, type: "pump", props: { curve } })),
  ];
  // the pumps sit in series on the return, joined by 0.5 m Cu 22 each (counted below)
  const chain = ["hl.return", ...pumps.flatMap((_, i) => [`pu${i + 1}.in`, `pu${i + 1}.out`]), "hp.return"];
  const pipes = [{ id: "f", from: "hp.flow", to: "hl.flow", material: "copper", size: "22", lengthM: 2 }];
  for (let i = 0; i < chain.length; i += 2) {
    pipes.push({ id: `r${i / 2}`, from: chain[i]!, to: chain[i + 1]!, material: "copper", size: "22", lengthM: i === 0 ? 2 : 0.5 });
  }
  return {
    format: "loopwright/schematic", version: 1, name: "pump verdict", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1, targetGradientPaPerM: 300 },
    parts, pipes,
  };
}
// Hand: q = 3000/(992.216·4179.4·10)·3600 = 0.26044 m³/h; hp Kv 2 → 1.6825 kPa, load Kv 1 → 6.7299 kPa,
// Cu 22 at Re 6932 → 43.3 Pa/m over 4 m (+ 0.5 m per series pump) → ≈ 8.584 kPa with no pump part.
const q = flowM3h(3000, 10, W);
const required = (pumpParts: number) => kvDpKpa(q, 2, W.rho) + kvDpKpa(q, 1, W.rho) + copperDpKpa(q, "22", 4 + 0.5 * pumpParts, W);
const flat = (headKpa: number): Curve => [[0, headKpa], [1, headKpa], [2, 0]];

function heating(doc: unknown) {
  const out = calculate(doc);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  const r = out.results;
  return { r, mode: r.modes.find((m) => m.mode === "heating")!, headLow: r.findings.filter((f) => f.code === "pump.head-low") };
}

describe("pump verdict: head available at the design flow against the index circuit", () => {
  it("hand numbers: q 0.26044 m³/h, required ≈ 8.584 kPa", () => {
    expect(q).toBeCloseTo(0.26044, 5);
    expect(required(0)).toBeCloseTo(8.584, 3);
  });

  // Tolerance 0.2 %: ρ and cp of the engine's water vs the IAPWS table (≤ 0.05 %) enter q² → 0.1 %; Colebrook is exact.
  it("the heat pump's own curve 3 % above the need: ok, required = hand Δp, available = the curve's 1.03 × need", () => {
    const need = required(0);
    const { mode, headLow } = heating(loop({ hpCurve: flat(1.03 * need) }));
    const duty = mode.pump!;
    expect(duty.id).toBe("hp");
    expect(Math.abs(duty.designFlowM3h! / q - 1)).toBeLessThan(2e-3);
    expect(Math.abs(duty.requiredHeadKpa! / need - 1)).toBeLessThan(2e-3);
    expect(duty.availableHeadKpa).toBeCloseTo(1.03 * need, 9);
    expect(duty.ok).toBe(true);
    expect(headLow).toEqual([]);
  });

  it("3 % below the need: not ok, and pump.head-low names the heat pump and the index load", () => {
    const need = required(0);
    const { mode, headLow } = heating(loop({ hpCurve: flat(0.97 * need) }));
    expect(mode.pump!.availableHeadKpa).toBeCloseTo(0.97 * need, 9);
    expect(mode.pump!.ok).toBe(false);
    expect(headLow).toHaveLength(1);
    expect(headLow[0]!.severity).toBe("error");
    expect(headLow[0]!.refs).toEqual(["hp", "hl"]);
  });

  it("a pump part on the return, 2 % either side of the need (its 0.5 m of pipe counted)", () => {
    const need = required(1);
    const above = heating(loop({ pumps: [flat(1.02 * need)] })).mode.pump!;
    const below = heating(loop({ pumps: [flat(0.98 * need)] })).mode.pump!;
    expect(above.id).toBe("pu1");
    expect(Math.abs(above.requiredHeadKpa! / need - 1)).toBeLessThan(2e-3);
    expect([above.ok, below.ok]).toEqual([true, false]);
  });

  it("two pumps in series add their heads: 0.51 + 0.51 of the need is ok, 0.49 + 0.49 is not", () => {
    const need = required(2);
    const ok = heating(loop({ pumps: [flat(0.51 * need), flat(0.51 * need)] })).mode.pump!;
    const low = heating(loop({ pumps: [flat(0.49 * need), flat(0.49 * need)] })).mode.pump!;
    expect(ok.availableHeadKpa).toBeCloseTo(1.02 * need, 9);
    expect(low.availableHeadKpa).toBeCloseTo(0.98 * need, 9);
    expect([ok.ok, low.ok]).toEqual([true, false]);
  });

  it("a curve that ends before the design flow: head unknown (null), not ok, pump.curve-short naming it", () => {
    const { r, mode } = heating(loop({ hpCurve: [[0, 50], [0.1, 40], [0.2, 30]] }));
    expect(mode.pump!.availableHeadKpa).toBeNull();
    expect(mode.pump!.ok).toBe(false);
    expect(r.findings.filter((f) => f.code === "pump.curve-short").map((f) => f.refs)).toEqual([["hp"]]);
  });

  it("a sloping curve is read by straight lines between its points: 40 − 20·q at q = 0.26043 → 34.79 kPa", () => {
    const mode = heating(loop({ hpCurve: [[0, 40], [0.5, 30], [1, 10]] })).mode;
    expect(Math.abs(mode.pump!.availableHeadKpa! / (40 - 20 * q) - 1)).toBeLessThan(2e-3);
  });
});
