import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { en442Output } from "./en442";
import { en442FlowTemperatureForOutput, en442RatingForOutput } from "./en442-inverse";

/** Plain bisection on the EN 442 characteristic, independent of the closed form: lowest t1 with Φ(t1, t1 − Δt) ≥ Φ. */
function bisectFlowC(outputW: number, outputAtDt50W: number, exponentN: number, deltaTK: number, roomC: number): number {
  const phi = (t1: number) => en442Output({ outputAtDt50W, exponentN, flowC: t1, returnC: t1 - deltaTK, roomC });
  let lo = roomC + deltaTK + 1e-9; // return just above the room: output → 0
  let hi = roomC + deltaTK + 500;
  while (hi - lo > 1e-6) {
    const mid = (lo + hi) / 2;
    if (phi(mid) >= outputW) hi = mid;
    else lo = mid;
  }
  return hi;
}

describe("EN 442-2 characteristic on a published worked example", () => {
  // The Engineering ToolBox, "Heat Emission from Radiators and Heating Panels" (engineeringtoolbox.com,
  // heat-emission-radiators-d_272): a radiator of 1000 W at 80/60/20 °C, n = 1.33, gives
  // 1000·[(70 − 50)/ln((70 − 20)/(50 − 20))/49.32]^1.33 = 736 W at 70/50/20 °C (logarithmic method).
  // The page rounds ΔT_n to 49.32 K (49.326 exactly; 0.12 W here) and the answer to the watt → ±1 W.
  it("1000 W at 80/60/20, n 1.33 → 736 W at 70/50/20", () => {
    const phi50 = en442RatingForOutput({ outputW: 1000, exponentN: 1.33, flowC: 80, returnC: 60, roomC: 20 });
    const at7050 = en442Output({ outputAtDt50W: phi50, exponentN: 1.33, flowC: 70, returnC: 50, roomC: 20 });
    expect(Math.abs(at7050 - 736)).toBeLessThan(1);
  });
  it("and back: the flow temperature that gives 736 W from that radiator at Δt 20 K is 70 °C", () => {
    const phi50 = en442RatingForOutput({ outputW: 1000, exponentN: 1.33, flowC: 80, returnC: 60, roomC: 20 });
    // 736 W is rounded (±1 W as above), and dΦ/dt1 ≈ 25 W/K here: 70 °C to ±0.05 K.
    expect(Math.abs(en442FlowTemperatureForOutput({ outputW: 736, outputAtDt50W: phi50, exponentN: 1.33, deltaTK: 20, roomC: 20 }) - 70)).toBeLessThan(0.05);
  });
});

describe("en442RatingForOutput", () => {
  // references.md §7 (computed, n 1.3): 45/40/20 → Φ/Φ50 = 0.3538, so 1000 W there needs 1000/0.3538 W at ΔT 50.
  it("45/40/20, n 1.3: 1000 W needs 2826 W at ΔT 50 (±1 W for the 4-decimal ratio)", () => {
    expect(Math.abs(en442RatingForOutput({ outputW: 1000, exponentN: 1.3, flowC: 45, returnC: 40, roomC: 20 }) - 1000 / 0.3538)).toBeLessThan(1);
  });
  it("refuses a return at or below the room, naming it", () => {
    expect(() => en442RatingForOutput({ outputW: 500, exponentN: 1.3, flowC: 40, returnC: 20, roomC: 20 })).toThrow(/returnC/);
  });
});

describe("en442FlowTemperatureForOutput (closed form)", () => {
  it("references.md §7: 0.3538·Φ50 at Δt 5 K in a 20 °C room is a 45 °C flow (±0.02 K for the 4-decimal ratio)", () => {
    expect(Math.abs(en442FlowTemperatureForOutput({ outputW: 353.8, outputAtDt50W: 1000, exponentN: 1.3, deltaTK: 5, roomC: 20 }) - 45)).toBeLessThan(0.02);
  });
  it("agrees with a bisection on the characteristic to 0.1 K over many emitters, rooms and Δt", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 5000, noNaN: true }), fc.double({ min: 0.1, max: 1.5, noNaN: true }),
        fc.double({ min: 1, max: 2, noNaN: true }), fc.double({ min: 1, max: 30, noNaN: true }), fc.double({ min: 5, max: 35, noNaN: true }),
        (phi50, share, n, dt, room) => {
          const load = phi50 * share;
          const solved = en442FlowTemperatureForOutput({ outputW: load, outputAtDt50W: phi50, exponentN: n, deltaTK: dt, roomC: room });
          expect(Math.abs(solved - bisectFlowC(load, phi50, n, dt, room))).toBeLessThan(0.1);
        },
      ),
      { numRuns: 300 },
    );
  });
  it("at the solved temperature the emitter gives exactly the load", () => {
    const t1 = en442FlowTemperatureForOutput({ outputW: 1450, outputAtDt50W: 2100, exponentN: 1.3, deltaTK: 5, roomC: 21 });
    expect(en442Output({ outputAtDt50W: 2100, exponentN: 1.3, flowC: t1, returnC: t1 - 5, roomC: 21 })).toBeCloseTo(1450, 6);
  });
  it("refuses a zero load or Δt, naming the argument", () => {
    expect(() => en442FlowTemperatureForOutput({ outputW: 0, outputAtDt50W: 1000, exponentN: 1.3, deltaTK: 5, roomC: 20 })).toThrow(/outputW/);
    expect(() => en442FlowTemperatureForOutput({ outputW: 10, outputAtDt50W: 1000, exponentN: 1.3, deltaTK: 0, roomC: 20 })).toThrow(/deltaTK/);
  });
});

describe("inverse arguments: each limit on both sides, the message naming the value", () => {
  const flow = { outputW: 353.8, outputAtDt50W: 1000, exponentN: 1.3, deltaTK: 5, roomC: 20 };
  const rating = { outputW: 1000, exponentN: 1.3, flowC: 45, returnC: 35, roomC: 20 };
  it("1 ≤ n ≤ 2 in both: the ends taken (by hand at 45/35/20: ΔT_ln/ΔT_n = 19.576/49.833 = 0.39283), 0.99 and 2.01 refused", () => {
    const r = 10 / Math.log(25 / 15) / (10 / Math.log(55 / 45)); // EN 442-2 log mean, written out
    expect(en442RatingForOutput({ ...rating, exponentN: 1 })).toBeCloseTo(1000 / r, 9);
    expect(en442RatingForOutput({ ...rating, exponentN: 2 })).toBeCloseTo(1000 / (r * r), 9);
    for (const n of [0.99, 2.01]) {
      expect(() => en442RatingForOutput({ ...rating, exponentN: n })).toThrow(new RegExp(`^exponentN must be in \\[1, 2\\], got ${n}$`));
      expect(() => en442FlowTemperatureForOutput({ ...flow, exponentN: n })).toThrow(new RegExp(`^exponentN must be in \\[1, 2\\], got ${n}$`));
    }
    // n = 1: ΔT* = 49.833·0.3538 = 17.631 K; a = 5/(1 − e^(−5/17.631)) = 20.211 K → t1 = 40.21 °C (hand)
    const star = (10 / Math.log(55 / 45)) * 0.3538;
    expect(en442FlowTemperatureForOutput({ ...flow, exponentN: 1 })).toBeCloseTo(20 + 5 / (1 - Math.exp(-5 / star)), 9);
    // n = 2: ΔT* = 49.833·0.3538^(1/2) = 29.642 K → t1 = 20 + 5/(1 − e^(−5/29.642)) = 52.17 °C (hand)
    const star2 = (10 / Math.log(55 / 45)) * Math.sqrt(0.3538);
    expect(en442FlowTemperatureForOutput({ ...flow, exponentN: 2 })).toBeCloseTo(20 + 5 / (1 - Math.exp(-5 / star2)), 9);
  });
  it("outputW, Φ50 and Δt > 0 and finite, room finite: each refused by name", () => {
    expect(() => en442RatingForOutput({ ...rating, outputW: 0 })).toThrow(/^outputW must be > 0, got 0$/);
    expect(() => en442RatingForOutput({ ...rating, outputW: Number.POSITIVE_INFINITY })).toThrow(/^outputW must be > 0, got Infinity$/);
    expect(() => en442FlowTemperatureForOutput({ ...flow, outputAtDt50W: 0 })).toThrow(/^outputAtDt50W must be > 0, got 0$/);
    expect(() => en442FlowTemperatureForOutput({ ...flow, outputAtDt50W: -5 })).toThrow(/^outputAtDt50W must be > 0, got -5$/);
    expect(() => en442FlowTemperatureForOutput({ ...flow, deltaTK: -1 })).toThrow(/^deltaTK must be > 0, got -1$/);
    expect(() => en442FlowTemperatureForOutput({ ...flow, roomC: Number.NaN })).toThrow(/^roomC must be finite, got NaN$/);
    expect(() => en442FlowTemperatureForOutput({ ...flow, roomC: Number.NEGATIVE_INFINITY })).toThrow(/^roomC must be finite, got -Infinity$/);
  });
});
