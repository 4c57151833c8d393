import { describe, expect, it } from "vitest";
import { convertFlow, convertPressure, showFlow, showPressure, unitPrefsFrom } from "./display";

// Reference values come from the unit definitions themselves (BIPM SI Brochure, 9th ed.):
// 1 bar = 100 kPa; 1 h = 3600 s; 1 L = 1e-3 m³; gn = 9.80665 m/s².
describe("flow display", () => {
  it("converts 1 m³/h to l/s and l/min by definition", () => {
    expect(convertFlow(1, "l/s")).toBeCloseTo(1000 / 3600, 12);
    expect(convertFlow(1, "l/min")).toBeCloseTo(1000 / 60, 12);
    expect(convertFlow(1.2, "m3/h")).toBeCloseTo(1.2, 12);
  });
  it("shows units with fixed decimals and a dash for a missing number", () => {
    expect(showFlow(0.36, { flow: "l/s", pressure: "kPa" }).text).toBe("0.100 l/s");
    expect(showFlow(null, { flow: "l/s", pressure: "kPa" }).text).toBe("—");
  });
});

describe("pressure display", () => {
  it("1 bar = 100 kPa exactly", () => {
    expect(convertPressure(100, "bar")).toBe(1);
    expect(convertPressure(24.1, "kPa")).toBeCloseTo(24.1, 12);
  });
  it("1 m head of water at 4 °C ≈ 9.8064 kPa (ρ = 999.972 kg/m³, gn = 9.80665 m/s²)", () => {
    // 999.972 × 9.80665 = 9806.38 Pa; tolerance covers the 5th significant figure only.
    expect(convertPressure(9.8064, "m", 999.972)).toBeCloseTo(1, 4);
  });
  it("uses the circulating fluid's density: the same kPa is more head in warm water", () => {
    const cold = convertPressure(20, "m", 999.7);
    const warm = convertPressure(20, "m", 990.2); // water at 45 °C (IAPWS-95)
    expect(warm).toBeGreaterThan(cold);
    expect(warm).toBeCloseTo(20_000 / (990.2 * 9.80665), 10);
  });
  it("falls back to the conventional 1000 kg/m³ water column without a density", () => {
    expect(convertPressure(9.80665, "m")).toBeCloseTo(1, 12);
  });
  it("formats with the label", () => {
    expect(showPressure(150, { flow: "m3/h", pressure: "bar" }).text).toBe("1.500 bar");
  });
});

describe("stored preference", () => {
  it("reads a valid preference and ignores garbage", () => {
    expect(unitPrefsFrom({ units: { flow: "l/min", pressure: "m" } })).toEqual({ flow: "l/min", pressure: "m" });
    expect(unitPrefsFrom({ units: { flow: "gallons" } })).toEqual({ flow: "m3/h", pressure: "kPa" });
    expect(unitPrefsFrom(null)).toEqual({ flow: "m3/h", pressure: "kPa" });
  });
});

describe("rounding to zero", () => {
  it("never shows a negative zero", () => {
    expect(showFlow(-0.00001, { flow: "m3/h", pressure: "kPa" }).text).toBe("0.000 m³/h");
    expect(showPressure(-0.0001, { flow: "m3/h", pressure: "kPa" }).value).toBe("0.00");
    expect(showPressure(-1.5, { flow: "m3/h", pressure: "kPa" }).value).toBe("-1.50");
  });
});

describe("readings back to SI (inverse conversions)", () => {
  it("1 l/s = 3.6 m³/h and 10 l/min = 0.6 m³/h (1 L = 1e-3 m³, SI Brochure 9th ed. Table 8)", async () => {
    const { flowToM3h } = await import("./display");
    expect(flowToM3h(1, "l/s")).toBeCloseTo(3.6, 12);
    expect(flowToM3h(10, "l/min")).toBeCloseTo(0.6, 12);
  });
  it("1.5 bar = 150 kPa; 1 m of water at 1000 kg/m³ = 9.80665 kPa (ρ·g·h, gn = 9.80665 m/s²)", async () => {
    const { pressureToKpa, convertPressure } = await import("./display");
    expect(pressureToKpa(1.5, "bar")).toBeCloseTo(150, 12);
    expect(pressureToKpa(1, "m", 1000)).toBeCloseTo(9.80665, 9);
    expect(convertPressure(pressureToKpa(3.2, "m", 990), "m", 990)).toBeCloseTo(3.2, 12);
  });
});
