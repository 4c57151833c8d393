/**
 * Emitter verdicts on each side of their limits, with the output worked out here:
 * - radiator: EN 442-2 with the logarithmic mean excess temperature (references §7),
 *   at 45/35/20 °C where the arithmetic mean would give 2.4 % more (0.3039 vs
 *   0.2968 × Φ50, c = 0.6) — a test at 45/40 (0.1 % apart) could not tell them apart;
 * - a radiator without a heat load takes its EN 442 output as its design load, so
 *   its design flow is that output over ρ·cp·ΔT;
 * - UFH loop: EN 1264-2 basic characteristic q = 8.92·(θ_F,m − θ_i)^1.1 (from memory;
 *   the same form is printed by a trade journal quoting DIN EN 1264, see
 *   emitters/en1264.ts) at the lower of the surface limit and the mean water temperature.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { en442ArithW, en442LogW, flowM3h, WATER } from "@/lib/hydraulics/testing/hand-calc";

type Props = Record<string, unknown>;
function doc(load: { id: string; type: "radiator" | "ufh-loop"; props: Props }, design: Props = {}) {
  const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
  return {
    format: "loopwright/schematic", version: 1, name: "emitter verdict", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1, targetGradientPaPerM: 300, ...design },
    parts: [{ id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, kv: 4, waterVolumeL: 2, pumpCurve: [[0, 60], [1, 50], [2, 0]] } }, load],
    pipes: [cu("f", "hp.flow", `${load.id}.flow`, 3), cu("r", `${load.id}.return`, "hp.return", 3)],
  };
}
function results(d: unknown) {
  const out = calculate(d);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
const radiator = (props: Props) => ({ id: "rad", type: "radiator" as const, props: { exponentN: 1.3, roomTemperatureC: 20, valveKv: 1.5, waterVolumeL: 12, ...props } });

describe("radiator verdict, EN 442 logarithmic mean at 45/35/20 °C", () => {
  // Φ = 2000·(19.576/49.833)^1.3 = 2000 × 0.29678 = 593.6 W (references §7 table: 0.2968)
  const output = en442LogW(2000, 1.3, 45, 35, 20);

  it("hand: 593.6 W by the log mean, 607.8 W (+2.4 %) by the arithmetic mean", () => {
    expect(output / 2000).toBeCloseTo(0.2968, 4);
    expect(en442ArithW(2000, 1.3, 45, 35, 20) / 2000).toBeCloseTo(0.3039, 4);
  });

  // Same closed-form equation both sides: agreement to rounding (1e-9).
  it("a room load 2 % below the output: output = hand value, ok, no emitter.undersized", () => {
    const r = results(doc(radiator({ outputAtDt50W: 2000, heatLoadW: Math.round(0.98 * output) })));
    const e = r.emitters.find((x) => x.id === "rad")!;
    expect(Math.abs(e.outputAtDesignW! / output - 1)).toBeLessThan(1e-9);
    expect(e.ok).toBe(true);
    expect(r.findings.filter((f) => f.code === "emitter.undersized")).toEqual([]);
  });

  it("a room load 2 % above the output: not ok, emitter.undersized naming it", () => {
    const r = results(doc(radiator({ outputAtDt50W: 2000, heatLoadW: Math.round(1.02 * output) })));
    expect(r.emitters.find((x) => x.id === "rad")!.ok).toBe(false);
    expect(r.findings.filter((f) => f.code === "emitter.undersized").map((f) => f.refs)).toEqual([["rad"]]);
  });

  it("the exponent and the room temperature enter: n 1.2 in a 22 °C room → 2000·(ΔT_ln(45,35,22)/49.833)^1.2", () => {
    const r = results(doc(radiator({ outputAtDt50W: 2000, exponentN: 1.2, roomTemperatureC: 22, heatLoadW: 100 })));
    const hand = en442LogW(2000, 1.2, 45, 35, 22); // ΔT_ln = 10/ln(23/13) = 17.528 K → 2000·0.35174^1.2 = 570.8 W
    expect(hand).toBeCloseTo(570.8, 1);
    expect(Math.abs(r.emitters[0]!.outputAtDesignW! / hand - 1)).toBeLessThan(1e-9);
  });

  it("no heat load given: the EN 442 output is the design load, its flow 593.6 W/(ρ·cp·10 K) = 0.05153 m³/h (IAPWS 40 °C)", () => {
    const r = results(doc(radiator({ outputAtDt50W: 2000, heatLoadW: null })));
    const q = flowM3h(output, 10, WATER[40]);
    expect(q).toBeCloseTo(0.05153, 5);
    const part = r.modes.find((m) => m.mode === "heating")!.parts.find((p) => p.id === "rad")!;
    // ±0.1 %: ρ·cp of the engine's water vs the IAPWS table (references §1.1 tolerances 0.05 % + 0.2 %… measured 0.02 %)
    expect(Math.abs(part.flowM3h! / q - 1)).toBeLessThan(1e-3);
    expect(r.emitters[0]!.ok).toBeNull(); // no load to judge against
  });

  it("return not above the room (35 °C return in a 36 °C room): no output (null), emitter.no-output naming it", () => {
    const r = results(doc(radiator({ outputAtDt50W: 2000, roomTemperatureC: 36, heatLoadW: 300 })));
    expect(r.emitters[0]!.outputAtDesignW).toBeNull();
    expect(r.emitters[0]!.ok).toBeNull();
    expect(r.findings.filter((f) => f.code === "emitter.no-output").map((f) => f.refs)).toEqual([["rad"]]);
  });
});

describe("UFH loop verdict, EN 1264-2 basic characteristic", () => {
  const ufh = (props: Props) => ({ id: "ufh", type: "ufh-loop" as const, props: { loopLengthM: 60, innerDiameterMm: 12, roomTemperatureC: 20, maxSurfaceTemperatureC: 29, ...props } });
  const qMax = 8.92 * 9 ** 1.1; // 29 °C surface in a 20 °C room: 100.04 W/m² (≈ 100 W/m² of EN 1264 trade pages)

  it("800 W on an area giving 2 % more than the load: ok, output = the load", () => {
    const area = (1.02 * 800) / qMax;
    const r = results(doc(ufh({ heatLoadW: 800, floorAreaM2: area })));
    expect(r.emitters[0]).toMatchObject({ outputAtDesignW: 800, heatLoadW: 800, ok: true });
  });

  it("800 W on an area giving 2 % less: not ok, output capped at area·100.04 W/m², emitter.undersized", () => {
    const area = (0.98 * 800) / qMax;
    const r = results(doc(ufh({ heatLoadW: 800, floorAreaM2: area })));
    expect(Math.abs(r.emitters[0]!.outputAtDesignW! / (0.98 * 800) - 1)).toBeLessThan(1e-9);
    expect(r.emitters[0]!.ok).toBe(false);
    expect(r.findings.filter((f) => f.code === "emitter.undersized").map((f) => f.refs)).toEqual([["ufh"]]);
  });

  it("30/25 °C water (mean 27.5 °C) limits the surface before the 29 °C limit: 8.92·7.5^1.1 = 81.83 W/m²", () => {
    const q = 8.92 * 7.5 ** 1.1;
    expect(q).toBeCloseTo(81.83, 2);
    const ok = results(doc(ufh({ heatLoadW: 800, floorAreaM2: (1.02 * 800) / q }), { flowTemperatureC: 30, returnTemperatureC: 25 }));
    const low = results(doc(ufh({ heatLoadW: 800, floorAreaM2: (0.98 * 800) / q }), { flowTemperatureC: 30, returnTemperatureC: 25 }));
    expect([ok.emitters[0]!.ok, low.emitters[0]!.ok]).toEqual([true, false]);
    expect(Math.abs(low.emitters[0]!.outputAtDesignW! / (0.98 * 800) - 1)).toBeLessThan(1e-9);
  });
});

describe("the undersized messages carry the numbers worked out here", () => {
  const ufh = (props: Props) => ({ id: "ufh", type: "ufh-loop" as const, props: { loopLengthM: 60, innerDiameterMm: 12, roomTemperatureC: 20, maxSurfaceTemperatureC: 29, ...props } });
  const undersized = (r: ReturnType<typeof results>) => r.findings.filter((f) => f.code === "emitter.undersized").map((f) => f.message);

  it("radiator: 2000 W at ΔT 50 gives 593.6 W at 45/35 °C, below a 605 W room", () => {
    const r = results(doc(radiator({ outputAtDt50W: 2000, heatLoadW: 605 })));
    expect(undersized(r)).toEqual(["rad: gives 594 W at 45/35 °C, below the room's 605 W"]);
  });
  it("UFH on 7.5 m²: 800 W needs 106.7 W/m², a surface of 20 + (106.7/8.92)^(1/1.1) = 29.5 °C, above the 29 °C limit; the floor gives 7.5·100.04 = 750 W", () => {
    const need = 20 + (800 / 7.5 / 8.92) ** (1 / 1.1); // EN 1264-2 basic characteristic, inverted by hand
    expect(need).toBeCloseTo(29.54, 2);
    expect(undersized(results(doc(ufh({ heatLoadW: 800, floorAreaM2: 7.5 }))))).toEqual([
      "ufh: 800 W on 7.5 m² needs 107 W/m², a mean floor surface of 29.5 °C in a 20 °C room (EN 1264-2), above the 29 °C surface limit; the floor gives at most 750 W",
    ]);
  });
  it("UFH at 30/25 °C: the mean water 27.5 °C is the limit; 8.92·7.5^1.1·7.5 m² = 613.75 W", () => {
    const r = results(doc(ufh({ heatLoadW: 800, floorAreaM2: 7.5 }), { flowTemperatureC: 30, returnTemperatureC: 25 }));
    expect(8.92 * 7.5 ** 1.1 * 7.5).toBeCloseTo(613.75, 2);
    expect(undersized(r)).toEqual([
      "ufh: 800 W on 7.5 m² needs 107 W/m², a mean floor surface of 29.5 °C in a 20 °C room (EN 1264-2), above the mean water temperature 27.5 °C; the floor gives at most 614 W",
    ]);
  });
});
