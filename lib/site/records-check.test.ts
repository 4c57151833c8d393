import { describe, expect, it } from "vitest";
import { checkFill, checkReading, type CommissioningDesign } from "./commissioning";
import { pressureTestData, readingSchema, siteEventSchema } from "./events";
import { DEFAULT_PRESSURE_TEST_RULE, evaluatePressureTest, isolateBeforeTest } from "./pressure-test";

// Hand arithmetic on made-up readings: every expected number below is worked out by hand
// from the readings and the stated rule or tolerance, not taken from the code under test.
const test = {
  medium: "water" as const, testPressureBar: 4, startPressureBar: 4, endPressureBar: 3.9,
  startedAt: "2026-05-04T09:00:00Z", endedAt: "2026-05-04T10:05:00Z", ambientStartC: 14, ambientEndC: 15, witness: "Site lead",
};
const rule = { maxDropBar: 0.2, holdMinutes: 60, basis: "Firm rule 3.2 (invented)" };

describe("pressure test verdict", () => {
  it("0.1 bar drop over 65 min passes a 0.2 bar / 60 min rule, and carries the rule's basis", () => {
    const v = evaluatePressureTest(test, rule);
    expect(v).toMatchObject({ pass: true, heldMinutes: 65, reasons: [] });
    expect(v.dropBar).toBeCloseTo(0.1, 12);
    expect(v.rule.basis).toBe("Firm rule 3.2 (invented)");
  });
  it("fails on a drop past the allowance, a short hold, or a start below the test pressure — saying which", () => {
    const v = evaluatePressureTest({ ...test, startPressureBar: 3.8, endPressureBar: 3.5, endedAt: "2026-05-04T09:30:00Z" }, rule);
    expect(v.pass).toBe(false);
    expect(v.reasons.join(" | ")).toMatch(/below the test pressure 4 bar.*held 30 min; the rule asks for 60 min.*fell 0\.30 bar; the rule allows 0\.2 bar/);
  });
  it("notes an ambient swing past 5 K and a gas test; the default rule says it is common practice", () => {
    const v = evaluatePressureTest({ ...test, ambientEndC: 21, medium: "air" }, DEFAULT_PRESSURE_TEST_RULE);
    expect(v.notes).toHaveLength(2);
    expect(DEFAULT_PRESSURE_TEST_RULE.basis).toMatch(/^common practice/);
  });
  it("a safety valve set at or below the test pressure must come out; vessels and heat sources are named", () => {
    const parts = [{ id: "sv", type: "safety-valve", label: "Safety valve", setBar: 3 }, { id: "ev", type: "expansion-vessel", label: "Vessel" }, { id: "t1", type: "tee", label: "Tee" }];
    const list = isolateBeforeTest(parts, 4);
    expect(list).toHaveLength(2);
    expect(list[0]).toMatch(/would lift/);
    expect(isolateBeforeTest(parts, 2)[0]).toMatch(/isolate unless/);
  });
  it("refuses an end before the start, naming endedAt", () => {
    const r = pressureTestData.safeParse({ ...test, endedAt: "2026-05-04T08:00:00Z" });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(["endedAt"]);
  });
});

const design: CommissioningDesign = {
  heatSourceFlowM3h: 2.4, flowTemperatureC: 45, returnTemperatureC: 40, bypass: { id: "bp", openingKpa: 30 },
  pumps: [{ id: "ps", label: "Secondary pump", headKpa: 25 }], vesselPrechargeBar: 0.7, safetyValveBar: 3,
  coldFillPressureBar: 1.2, glycolPercent: null, densityKgM3: 1000,
};

describe("commissioning readings against design", () => {
  it("0.7 l/s = 2.52 m³/h is +5 % on 2.4 m³/h: inside ±10 %", () => {
    const c = checkReading({ kind: "heat-source-flow", value: 0.7, unit: "l/s" }, design);
    expect(c).toMatchObject({ ok: true, deviation: "+0.12 m³/h (+5.0 %)" });
  });
  it("a flow temperature 3 K low is flagged past ±2 K", () => {
    expect(checkReading({ kind: "flow-temperature", value: 42, unit: "°C" }, design)).toMatchObject({ ok: false, deviation: "−3.0 K" });
  });
  it("pump head read in metres: 2.8 m × 1000 kg/m³ × 9.80665 m/s² = 27.46 kPa, +9.8 % on 25 kPa: inside ±10 %", () => {
    const c = checkReading({ kind: "pump-head", value: 2.8, unit: "m", target: "ps", setting: "III" }, design);
    expect(c.ok).toBe(true);
    expect(c.deviation).toBe("+2.5 kPa (+9.8 %)");
    expect(c.measured).toMatch(/setting III/);
  });
  it("vessel pre-charge 55 kPa = 0.55 bar is 0.15 bar under 0.7: flagged past ±0.1 bar", () => {
    expect(checkReading({ kind: "vessel-precharge", value: 55, unit: "kPa" }, design)).toMatchObject({ ok: false, deviation: "−0.15 bar" });
  });
  it("a reading of the wrong unit or an unknown kind is refused, naming the field", () => {
    const unit = readingSchema.safeParse({ kind: "heat-source-flow", value: 2, unit: "bar" });
    expect(unit.success).toBe(false);
    expect(unit.error!.issues[0]!.path).toEqual(["unit"]);
    const kind = siteEventSchema.safeParse({ id: crypto.randomUUID(), madeAt: "2026-05-04T09:00:00Z", kind: "commissioning", data: { readings: [{ kind: "colour", value: 1 }] } });
    expect(kind.success).toBe(false);
    expect(kind.error!.issues[0]!.path.join(".")).toBe("data.readings.0.kind");
  });
  it("glycol measured against the design; a plain-water design flags any glycol; inhibitor against the maker's dose", () => {
    const glycol = { ...design, glycolPercent: 30 };
    expect(checkFill({ stage: "glycol", measuredPercent: 27 }, glycol)[0]).toMatchObject({ ok: false, deviation: "−3.0 %" });
    expect(checkFill({ stage: "glycol", measuredPercent: 29 }, glycol)[0]!.ok).toBe(true);
    expect(checkFill({ stage: "glycol", measuredPercent: 20 }, design)[0]!.ok).toBe(false);
    expect(checkFill({ stage: "inhibitor", measuredPercent: 0.95, dosePercent: 1 }, design)[0]).toMatchObject({ ok: true, deviation: "−0.1 % (−5.0 %)" });
    expect(checkFill({ stage: "fill", fillPressureBar: 1.5 }, design)[0]).toMatchObject({ ok: false, deviation: "+0.30 bar" });
  });
});
