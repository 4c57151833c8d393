/**
 * Pump setting: the small system's pump (curve 40/35/25/10 kPa at 0/0.5/1/1.5 m³/h) is far
 * bigger than its ~5 kPa duty. The duty says by how much, the speed at which the curve drawn
 * passes through the duty (affinity laws, Q ∝ n, H ∝ n²: n²·H(Q/n) = H_req, checked here
 * with the curve interpolated by hand), the head to set in constant-pressure mode, and a
 * `pump.oversized` finding beyond the stated 25 % margin.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { resultsSchema } from "@/lib/schematic/results";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";
import { perTest } from "@/lib/hydraulics/testing/per-test";

const curve: [number, number][] = [[0, 40], [0.5, 35], [1, 25], [1.5, 10]];
const drawn = (q: number) => {
  for (let i = 1; i < curve.length; i++) {
    const [q0, h0] = curve[i - 1]!;
    const [q1, h1] = curve[i]!;
    if (q <= q1) return h0 + ((q - q0) / (q1 - q0)) * (h1 - h0);
  }
  return NaN;
};

describe("pump setting of an oversized pump", () => {
  const sized = perTest(() => {
    const r = calculate(smallSystem());
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    const results = resultsSchema.parse(r.results);
    return { results, duty: results.modes.find((m) => m.mode === "heating")!.pump! };
  });

  it("states the surplus: available − required at the design flow", () => {
    const { duty } = sized();
    expect(duty.id).toBe("pump");
    expect(duty.availableHeadKpa!).toBeCloseTo(drawn(duty.designFlowM3h!), 9);
    expect(duty.surplusKpa!).toBeCloseTo(duty.availableHeadKpa! - duty.requiredHeadKpa!, 9);
  });

  it("gives the speed at which the curve drawn meets the duty: n²·H(Q/n) = H_req", () => {
    const { duty } = sized();
    const n = duty.speedFraction!;
    expect(n).toBeGreaterThan(0);
    expect(n).toBeLessThan(1);
    expect(n * n * drawn(duty.designFlowM3h! / n)).toBeCloseTo(duty.requiredHeadKpa!, 6);
    expect(duty.constantPressureHeadKpa).toBeCloseTo(duty.requiredHeadKpa!, 12);
  });

  it("raises pump.oversized naming the pump, with the margin and the settings", () => {
    const { results, duty } = sized();
    const f = results.findings.find((x) => x.code === "pump.oversized")!;
    expect(f.refs).toEqual(["pump"]);
    expect(f.message).toMatch(/25 % margin/);
    expect(f.message).toContain(`${(duty.speedFraction! * 100).toFixed(0)} % speed`);
    expect(f.message).toContain(`set ${duty.requiredHeadKpa!.toFixed(1)} kPa in a constant-pressure mode`);
  });

  it("a pump within the margin gets a speed but no finding", () => {
    const { duty } = sized();
    // Scale the curve so it gives only ~10 % more than needed at the design flow.
    const d = smallSystem();
    const need = duty.requiredHeadKpa!;
    const at = drawn(duty.designFlowM3h!);
    (d.parts.find((p) => p.id === "pump")!.props as { curve: [number, number][] }).curve = curve.map(([q, h]) => [q, (h * need * 1.1) / at]);
    const r2 = calculate(d);
    if (!r2.ok) throw new Error("calculates");
    expect(r2.results.findings.map((f) => f.code)).not.toContain("pump.oversized");
    const d2 = r2.results.modes[0]!.pump!;
    expect(d2.surplusKpa!).toBeCloseTo(0.1 * need, 6);
    expect(d2.speedFraction!).toBeLessThan(1);
  });
});
