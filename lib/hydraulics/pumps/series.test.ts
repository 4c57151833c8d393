/**
 * Pumps in series: one flow, heads added (Karassik et al., Pump Handbook, 4th ed., series
 * operation). The combined curve is checked point by point against a hand sum, and the engine's
 * speed for two pumps on one side against one pump drawn with that summed curve.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { bisect } from "@/lib/hydraulics/testing/hand-calc";
import { SERIES_PUMP_CURVE, withPumpInSeries } from "@/lib/hydraulics/testing/small-system";
import { seriesCurve } from "./curve";

describe("seriesCurve", () => {
  it("adds heads at every flow either curve has a point at, up to the smaller last flow", () => {
    // by hand: A(1) = 20, B(1) = 30 − 15·(1/1.5) = 20 → 40; A(1.5) = 10, B(1.5) = 15 → 25; A(2) = 0, B(2) = 15 − 15·(0.5/1.5) = 10 → 10
    const c = seriesCurve([[[0, 40], [1, 20], [2, 0]], [[0, 30], [1.5, 15], [3, 0]]]);
    expect(c.map(([q]) => q)).toEqual([0, 1, 1.5, 2]);
    [70, 40, 25, 10].forEach((h, i) => expect(c[i]![1]).toBeCloseTo(h, 12));
  });
  it("one curve is itself; none is refused by name", () => {
    expect(seriesCurve([[[0, 40], [1, 20], [2, 0]]])).toEqual([[0, 40], [1, 20], [2, 0]]);
    expect(() => seriesCurve([])).toThrow(/curves/);
  });
});

describe("two pumps in series on one side", () => {
  const curve = SERIES_PUMP_CURVE;
  const heating = (doc: unknown) => {
    const out = calculate(doc);
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    return { results: out.results, mode: out.results.modes.find((m) => m.mode === "heating")! };
  };

  it("get one speed for both, the one a single pump with the summed curve would get, and it meets the duty by hand", () => {
    const { mode } = heating(withPumpInSeries());
    const duty = mode.pumps.find((p) => p.pumpIds.length === 2)!;
    expect(duty.pumpIds.sort()).toEqual(["pump", "pump2"]);
    expect(duty.speedFraction).not.toBeNull();
    // by hand: the summed curve is 2·H(q); n solves n²·2·H(q/n) = H_required (bisection on the curve's own points)
    const H = (q: number) => { // piecewise linear on `curve`, as drawn
      for (let i = 1; i < curve.length; i++) if (q <= curve[i]![0]) {
        const [q0, h0] = curve[i - 1]!, [q1, h1] = curve[i]!;
        return h0 + ((q - q0) / (q1 - q0)) * (h1 - h0);
      }
      return NaN;
    };
    const q = duty.designFlowM3h!, need = duty.requiredHeadKpa!;
    const n = bisect((x) => x * x * 2 * H(q / x) - need, q / 1.5, 1);
    expect(duty.speedFraction!).toBeCloseTo(n, 6);
  });
});
