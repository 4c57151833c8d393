import { describe, expect, it } from "vitest";
import { affinitySpeedFraction, headAtSpeedKpa } from "./affinity";
import type { PumpCurve } from "./curve";

describe("affinity laws (Q ∝ n, H ∝ n²; Bachus & Custodio p. 114, references.md §11)", () => {
  // A straight curve H = 60 − 20·Q (kPa, m³/h) is interpolated exactly, so the algebra is
  // checked exactly: at n = 0.8, H_n(Q) = n²·(60 − 20·Q/n) = 38.4 − 16·Q → 22.4 kPa at 1 m³/h.
  const straight: PumpCurve = [[0, 60], [1.5, 30], [3, 0]];
  it("a duty on the 80 % curve gives n = 0.8", () => {
    expect(headAtSpeedKpa(straight, 0.8, 1)).toBeCloseTo(22.4, 12);
    expect(affinitySpeedFraction(straight, 1, 22.4)).toBeCloseTo(0.8, 9);
  });
  it("a duty the full-speed curve cannot reach gives null", () => {
    expect(affinitySpeedFraction(straight, 1, 41)).toBeNull();
  });
  it("at zero flow n = √(H_req/H₀)", () => {
    expect(affinitySpeedFraction(straight, 0, 15)).toBeCloseTo(0.5, 12);
  });

  // references.md §11 closed loop (computed there): pump H = 6 − 4Q², system 3Q² (m, m³/h).
  // At 80 % speed the pump meets the system at Q = 0.7407 m³/h, H = 1.646 m, exactly 0.8× and
  // 0.64× the full-speed point. The curve is sampled every 0.01 m³/h; linear interpolation
  // between samples shifts H by at most a·h²/4 = 1e-4 m (0.006 %), so n is good to 1e-4.
  const sampled: PumpCurve = Array.from({ length: 123 }, (_, i) => {
    const q = Math.min(i * 0.01, Math.sqrt(1.5));
    return [q, Math.max(0, 6 - 4 * q * q)] as [number, number];
  }).filter((p, i, a) => i === 0 || p[0] > a[i - 1]![0]);
  it("closed loop: the 80 % point of §11 gives n = 0.8", () => {
    const q = 0.8 * Math.sqrt(6 / 7);
    const h = 3 * q * q; // on the system curve: 1.646 m
    expect(h).toBeCloseTo(1.646, 3);
    expect(affinitySpeedFraction(sampled, q, h)!).toBeCloseTo(0.8, 4);
  });
});
