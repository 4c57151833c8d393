/**
 * pumpHeadAt: a pump's head at a flow on its curve (linear between the catalogue points,
 * hand-interpolated here), or null where the curve cannot give one — no usable curve, a reverse or
 * unknown flow, a flow beyond the last point.
 */
import { describe, expect, it } from "vitest";
import { SERIES_PUMP_CURVE } from "@/lib/hydraulics/testing/small-system";
import { pumpHeadAt } from "./part-results";

describe("pumpHeadAt", () => {
  it("reads the curve: shut-off head at 0, interpolated between points", () => {
    // curve (0, 40) (0.5, 35) (1, 25) (1.5, 10) kPa
    expect(pumpHeadAt(SERIES_PUMP_CURVE, 0)).toBe(40);
    expect(pumpHeadAt(SERIES_PUMP_CURVE, 0.75)).toBeCloseTo(30, 12); // 35 + (0.25/0.5)·(25 − 35)
    expect(pumpHeadAt(SERIES_PUMP_CURVE, 1.5)).toBe(10);
  });

  it("null for a reverse or unknown flow, and past the curve's end", () => {
    expect(pumpHeadAt(SERIES_PUMP_CURVE, -0.1)).toBeNull();
    expect(pumpHeadAt(SERIES_PUMP_CURVE, Number.NaN)).toBeNull();
    expect(pumpHeadAt(SERIES_PUMP_CURVE, 1.6)).toBeNull();
  });

  it("null without a usable curve (none, or too few points), whatever the flow", () => {
    expect(pumpHeadAt(null, 0.5)).toBeNull();
    expect(pumpHeadAt([[0, 40], [1, 20]], 0.5)).toBeNull(); // fewer than 3 points
    expect(pumpHeadAt([[0, 40], [1, 20]], -1)).toBeNull();
  });
});
