import { describe, expect, it } from "vitest";
import { barToPa, headMToPa, kpaToPa, lToM3, m3hToM3s, m3sToM3h, paToBar, paToHeadM, paToKpa } from "./units";

describe("units (definitions)", () => {
  it("1 m³/h = 1/3600 m³/s; round trip", () => {
    expect(m3hToM3s(3.6)).toBeCloseTo(0.001, 15);
    expect(m3sToM3h(m3hToM3s(1.2345))).toBeCloseTo(1.2345, 12);
  });
  it("bar, kPa, Pa, L", () => {
    expect(barToPa(1)).toBe(1e5);
    expect(paToBar(2.5e5)).toBe(2.5);
    expect(kpaToPa(1.8)).toBe(1800);
    expect(paToKpa(24_100)).toBe(24.1);
    expect(lToM3(95)).toBeCloseTo(0.095, 15);
  });
  it("10 m of water at 1000 kg/m³ = 0.980665 bar (gn = 9.80665 m/s², CGPM)", () => {
    expect(headMToPa(10, 1000)).toBeCloseTo(98_066.5, 6);
    expect(paToHeadM(98_066.5, 1000)).toBeCloseTo(10, 12);
  });
});
