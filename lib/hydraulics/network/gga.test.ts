import { describe, expect, it } from "vitest";
import { lawsOf, prepare, solveNetwork, type Evaluate } from "./gga";
import { kvCoefficient, LAW, LinkTable } from "./behaviour";

const topo = (n: number, links: [number, number][], fixed: number[]) => ({
  nodeCount: n,
  from: Int32Array.from(links.map((l) => l[0])),
  to: Int32Array.from(links.map((l) => l[1])),
  fixed: Uint8Array.from({ length: n }, (_, i) => (fixed.includes(i) ? 1 : 0)),
});

/** Pump H = h0 − a·Q², system H = b·Q², as gradient-method laws (any consistent units). */
const quadraticLoop = (h0: number, a: number, b: number) =>
  lawsOf([
    ((q, out) => {
      out[0] = -(h0 - a * q * Math.abs(q));
      out[1] = 2 * a * Math.abs(q);
    }) as Evaluate,
    ((q, out) => {
      out[0] = b * q * Math.abs(q);
      out[1] = 2 * b * Math.abs(q);
    }) as Evaluate,
  ]);

describe("gradient method (Todini & Pilati 1988)", () => {
  it("closed loop: pump H = 6 − 4Q², system H = 3Q² meet at Q = √(6/7) = 0.9258, H = 2.571 (references.md §11)", () => {
    const r = solveNetwork(prepare(topo(2, [[0, 1], [1, 0]], [0])), quadraticLoop(6, 4, 3), new Float64Array(2), Float64Array.from([0.5, 0.5]));
    expect(r.converged).toBe(true);
    expect(r.q[0]).toBeCloseTo(Math.sqrt(6 / 7), 6);
    expect(r.head[1]! - r.head[0]!).toBeCloseTo(6 - 4 * (6 / 7), 6);
  });

  it("stops once the error left is estimated below a tenth of the accuracy: Newton (Heron's steps from Q 0.5) is done after 4 solves at accuracy 1e-4", () => {
    // Steps |ΔQ|/Q by hand: 0.548, 0.177, 0.0159, 1.27e-4, 8e-9. The fourth is above 1e-4, but it shrank by
    // ρ = 0.008, so the error left is ≈ ρ/(1 − ρ)·1.27e-4 = 1.0e-6 < 1e-5: converged without a fifth solve.
    const r = solveNetwork(prepare(topo(2, [[0, 1], [1, 0]], [0])), quadraticLoop(6, 4, 3), new Float64Array(2), Float64Array.from([0.5, 0.5]), { accuracy: 1e-4 });
    expect(r.converged).toBe(true);
    expect(r.iterations).toBe(4);
    expect(r.q[0]).toBeCloseTo(Math.sqrt(6 / 7), 7);
  });

  it("the same loop at 80 % speed (H0 × 0.64) moves along the affinity parabola: Q × 0.8 exactly", () => {
    const r = solveNetwork(prepare(topo(2, [[0, 1], [1, 0]], [0])), quadraticLoop(3.84, 4, 3), new Float64Array(2), Float64Array.from([0.5, 0.5]));
    expect(r.converged).toBe(true);
    expect(r.q[0]).toBeCloseTo(0.8 * Math.sqrt(6 / 7), 6);
  });

  it("Kv series loop, hand-computed: pump [0,20],[1,10],[2,0] kPa and two Kv 2.5 valves at ρ 1000", () => {
    // Δp of each valve = 100·(Q/2.5)² = 16·Q² kPa; pump H = 20 − 10·Q on its middle segments.
    // 20 − 10Q = 32Q²  →  Q = (−10 + √(100 + 2560))/64 = 0.64966 m³/h.
    const t = new LinkTable(3, 1000, 1e-6);
    t.setPump(0, [[0, 20], [1, 10], [2, 0]], 0);
    for (const k of [1, 2]) {
      t.c[k] = kvCoefficient(2.5, 1000);
      t.set(k, LAW.kv);
    }
    const r = solveNetwork(prepare(topo(3, [[0, 1], [1, 2], [2, 0]], [0])), t, new Float64Array(3), Float64Array.from([0.1, 0.1, 0.1]));
    const q = (-10 + Math.sqrt(100 + 4 * 32 * 20)) / 64;
    expect(r.converged).toBe(true);
    expect(r.q[0]).toBeCloseTo(q, 5);
    expect(r.q[1]).toBeCloseTo(q, 5);
    expect(r.head[1]! - r.head[2]!).toBeCloseTo(16 * q * q, 4);
  });

  it("fixed demands on a tree: flows by continuity in the first step", () => {
    const t = new LinkTable(3, 1000, 1e-6);
    for (const k of [0, 1, 2]) {
      t.c[k] = kvCoefficient(1, 1000);
      t.set(k, LAW.kv);
    }
    const demand = Float64Array.from([0, 0, 0.3, 0.5]);
    const r = solveNetwork(prepare(topo(4, [[0, 1], [1, 2], [1, 3]], [0])), t, demand, new Float64Array(3));
    expect(r.q[0]).toBeCloseTo(0.8, 9);
    expect(r.q[1]).toBeCloseTo(0.3, 9);
    expect(r.q[2]).toBeCloseTo(0.5, 9);
    expect(r.iterations).toBeLessThanOrEqual(3);
  });

  it("two parallel Kv paths share 1 m³/h in the ratio of their Kv (equal Δp: q ∝ Kv)", () => {
    const t = new LinkTable(2, 1000, 1e-6);
    t.c[0] = kvCoefficient(1, 1000);
    t.c[1] = kvCoefficient(2, 1000);
    t.set(0, LAW.kv);
    t.set(1, LAW.kv);
    const r = solveNetwork(prepare(topo(2, [[0, 1], [0, 1]], [0])), t, Float64Array.from([0, 1]), Float64Array.from([0.5, 0.5]));
    expect(r.converged).toBe(true);
    expect(r.q[0]).toBeCloseTo(1 / 3, 6);
    expect(r.q[1]).toBeCloseTo(2 / 3, 6);
  });

  it("dp-bypass: shut below its opening, passes flow above it holding Δp ≈ opening + Kvs loss", () => {
    // Pump [0,40],[2,20],[4,0] (H = 40 − 10Q) feeding a bypass (opening 25 kPa, Kvs 2) alone:
    // 40 − 10Q = 25 + 25Q²  →  Q = (−10 + √(100 + 1500))/50 = 0.6 m³/h, Δp = 34 kPa.
    const t = new LinkTable(2, 1000, 1e-6);
    t.setPump(0, [[0, 40], [2, 20], [4, 0]], 0);
    t.c[1] = kvCoefficient(2, 1000);
    t.opening[1] = 25;
    t.set(1, LAW.bypass);
    const r = solveNetwork(prepare(topo(2, [[0, 1], [1, 0]], [0])), t, new Float64Array(2), Float64Array.from([1, 1]));
    expect(r.converged).toBe(true);
    expect(r.q[1]).toBeCloseTo(0.6, 5);
    expect(r.head[1]! - r.head[0]!).toBeCloseTo(34, 3);
    // A weaker pump (shut-off 20 kPa < opening) gets no flow through.
    const weak = new LinkTable(2, 1000, 1e-6);
    weak.setPump(0, [[0, 20], [2, 10], [4, 0]], 0);
    weak.c[1] = kvCoefficient(2, 1000);
    weak.opening[1] = 25;
    weak.set(1, LAW.bypass);
    const w = solveNetwork(prepare(topo(2, [[0, 1], [1, 0]], [0])), weak, new Float64Array(2), Float64Array.from([1, 1]));
    expect(Math.abs(w.q[1]!)).toBeLessThan(1e-5);
  });

  it("check valve: no reverse flow", () => {
    // Pump pushes 0→1; a check valve 1→0 drawn against it passes nothing.
    const t = new LinkTable(2, 1000, 1e-6);
    t.setPump(0, [[0, 20], [1, 10], [2, 0]], 0);
    t.c[1] = kvCoefficient(2, 1000);
    t.set(1, LAW.check);
    const prep = prepare(topo(2, [[0, 1], [0, 1]], [0]));
    const r = solveNetwork(prep, t, new Float64Array(2), Float64Array.from([0.1, 0.1]));
    expect(Math.abs(r.q[0]!)).toBeLessThan(1e-5);
  });

  it("start flow: a pump on its curve starts mid-range (last point 2 m³/h → 1), in design (loss-free) and any other link 0", () => {
    const t = new LinkTable(3, 1000, 1e-6);
    t.setPump(0, [[0, 20], [1, 10], [2, 0]], 0);
    t.setPump(1, [[0, 20], [1, 10], [2, 0]], 0, LAW.zero);
    t.c[2] = kvCoefficient(2, 1000);
    t.set(2, LAW.kv);
    expect([t.startFlow(0), t.startFlow(1), t.startFlow(2)]).toEqual([1, 0, 0]);
  });
});
