import { describe, expect, it } from "vitest";
import { prepare, solveNetwork, type Evaluate } from "./gga";
import { kvLaw, pumpLaw } from "./behaviour";

const topo = (n: number, links: [number, number][], fixed: number[]) => ({
  nodeCount: n,
  from: Int32Array.from(links.map((l) => l[0])),
  to: Int32Array.from(links.map((l) => l[1])),
  fixed: Uint8Array.from({ length: n }, (_, i) => (fixed.includes(i) ? 1 : 0)),
});

describe("gradient method", () => {
  it("closed loop pump H = 6 − 4Q², system 3Q² meets at Q = √(6/7) (references.md §11)", () => {
    const pump: Evaluate = (q, out) => {
      out[0] = -(6 - 4 * q * Math.abs(q));
      out[1] = 8 * Math.abs(q);
    };
    const system: Evaluate = (q, out) => {
      out[0] = 3 * q * Math.abs(q);
      out[1] = 6 * Math.abs(q);
    };
    const prep = prepare(topo(2, [[0, 1], [1, 0]], [0]));
    const r = solveNetwork(prep, [pump, system], new Float64Array(2), Float64Array.from([0.5, 0.5]));
    expect(r.converged).toBe(true);
    expect(r.q[0]).toBeCloseTo(Math.sqrt(6 / 7), 6);
    expect(r.head[1]! - r.head[0]!).toBeCloseTo(6 - 4 * (6 / 7), 6); // 2.571 m
  });

  it("the same loop at 80 % speed moves along the affinity parabola (Q × 0.8 exactly)", () => {
    const pump: Evaluate = (q, out) => {
      out[0] = -(3.84 - 4 * q * Math.abs(q));
      out[1] = 8 * Math.abs(q);
    };
    const system: Evaluate = (q, out) => {
      out[0] = 3 * q * Math.abs(q);
      out[1] = 6 * Math.abs(q);
    };
    const r = solveNetwork(prepare(topo(2, [[0, 1], [1, 0]], [0])), [pump, system], new Float64Array(2), Float64Array.from([0.5, 0.5]));
    expect(r.converged).toBe(true);
    expect(r.q[0]).toBeCloseTo(0.8 * Math.sqrt(6 / 7), 6);
  });

  it("Kv series loop, hand-computed: two Kv 2.5 valves and a linear-curve pump", () => {
    // Pump 0→1 with curve [0,20],[1,10],[2,0] kPa (H = 20 − 10Q); valves 1→2 and 2→0, Kv 2.5 each at ρ 1000:
    // Δp = 2·100·(Q/2.5)² = 32·Q² kPa. 20 − 10Q = 32Q² → Q = (−10 + √(100 + 2560))/64 = 0.6496 m³/h.
    const pump = pumpLaw([[0, 20], [1, 10], [2, 0]]);
    const v = kvLaw(2.5, 1000);
    const r = solveNetwork(prepare(topo(3, [[0, 1], [1, 2], [2, 0]], [0])), [pump, v, v], new Float64Array(3), new Float64Array(3));
    const q = (-10 + Math.sqrt(100 + 4 * 32 * 20)) / 64;
    expect(r.converged).toBe(true);
    expect(r.q[0]).toBeCloseTo(q, 5);
    expect(r.q[1]).toBeCloseTo(q, 5);
    expect(r.head[1]! - r.head[2]!).toBeCloseTo(16 * q * q, 4);
  });

  it("fixed demands on a tree: flows by continuity in one step", () => {
    // 0 (fixed) → 1 → {2, 3}; demands 0.3 and 0.5 at 2 and 3.
    const v = kvLaw(1, 1000);
    const demand = Float64Array.from([0, 0, 0.3, 0.5]);
    const r = solveNetwork(prepare(topo(4, [[0, 1], [1, 2], [1, 3]], [0])), [v, v, v], demand, new Float64Array(3));
    expect(r.q[0]).toBeCloseTo(0.8, 9);
    expect(r.q[1]).toBeCloseTo(0.3, 9);
    expect(r.q[2]).toBeCloseTo(0.5, 9);
    expect(r.iterations).toBeLessThanOrEqual(3);
  });

  it("two parallel Kv paths split by √ of Kv ratio", () => {
    // 0 → 1 via Kv 1 and Kv 2 in parallel, 1 → 0 ... use demand 1 m³/h at node 1 from fixed node 0.
    const r = solveNetwork(
      prepare(topo(2, [[0, 1], [0, 1]], [0])),
      [kvLaw(1, 1000), kvLaw(2, 1000)],
      Float64Array.from([0, 1]),
      new Float64Array(2),
    );
    expect(r.converged).toBe(true);
    expect(r.q[0]).toBeCloseTo(1 / 3, 6);
    expect(r.q[1]).toBeCloseTo(2 / 3, 6);
  });
});
