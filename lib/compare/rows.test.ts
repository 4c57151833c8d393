import { describe, expect, it } from "vitest";
import type { Metrics } from "./metrics";
import { metricRows, type MetricRow } from "./rows";
import { parseRef, refSchema } from "./refs";

// The verdicts of the metrics table, on hand-made metrics: "better" only where one side
// passes a check the other fails, or has fewer faults; never on flows, head or sizes.
const base: Metrics = {
  heatSourceFlowM3h: 1.2, pumpRequiredHeadKpa: 26, pumpAvailableHeadKpa: 40, indexCircuit: "rad1", bypassOpeningKpa: 21,
  heatSourceFlowAllZonesClosedM3h: 0.7, systemVolumeL: 95, minimumVolumeL: 100, bufferRecommended: true, vesselRequiredL: 9,
  maxVelocityMps: 0.8, maxVelocityPipe: "p1", velocityLimitMps: 1, emitterOutputW: 6000, emitterShortfalls: [],
  pipeLengthM: { copper: { "22": 50, "15": 40 } }, fluidDensityKgM3: 992,
  findings: { error: { count: 0, codes: [] }, warning: { count: 1, codes: ["system.volume-low"] }, info: { count: 2, codes: ["pump.oversized"] } },
};
const row = (rows: MetricRow[], key: string) => rows.find((r) => r.key === key)!;

describe("metricRows", () => {
  it("differences are b − a; equal sides get no verdict", () => {
    const rows = metricRows(base, base);
    expect(rows.every((r) => r.better === null)).toBe(true);
    const b = metricRows(base, { ...base, heatSourceFlowM3h: 1.5 });
    expect(row(b, "heatSourceFlowM3h")).toMatchObject({ a: 1.2, b: 1.5, better: null });
    expect((row(b, "heatSourceFlowM3h") as { diff: number }).diff).toBeCloseTo(0.3, 12);
  });
  it("a lower pump head alone is no verdict (a buffer may split it over two pumps)", () => {
    expect(row(metricRows(base, { ...base, pumpRequiredHeadKpa: 15 }), "pumpRequiredHeadKpa").better).toBeNull();
  });
  it("the pump that meets its head beats the one that does not", () => {
    const r = row(metricRows(base, { ...base, pumpAvailableHeadKpa: 20 }), "pumpAvailableHeadKpa");
    expect([r.better, r.why]).toEqual(["a", expect.stringMatching(/head/)]);
  });
  it("volume at or above the minimum, and no buffer needed, are better", () => {
    const rows = metricRows(base, { ...base, systemVolumeL: 137, bufferRecommended: false });
    expect(row(rows, "systemVolumeL").better).toBe("b");
    expect(row(rows, "bufferRecommended")).toMatchObject({ a: "yes", b: "no", better: "b", same: false });
    // both above the minimum: more water is no verdict
    expect(row(metricRows({ ...base, systemVolumeL: 120 }, { ...base, systemVolumeL: 137 }), "systemVolumeL").better).toBeNull();
  });
  it("velocity: lower is better only when the other side goes above its limit", () => {
    expect(row(metricRows(base, { ...base, maxVelocityMps: 0.6 }), "maxVelocityMps").better).toBeNull();
    const over = row(metricRows({ ...base, maxVelocityMps: 1.3 }, base), "maxVelocityMps");
    expect(over.better).toBe("b");
    expect(over.kind === "number" && over.note).toEqual({ a: "in p1", b: "in p1" });
  });
  it("fewer errors, warnings and emitter shortfalls are better; notes are no verdict", () => {
    const worse: Metrics = { ...base, emitterShortfalls: ["rad2"], findings: { ...base.findings, error: { count: 1, codes: ["pump.too-weak"] }, info: { count: 5, codes: ["x.y"] } } };
    const rows = metricRows(base, worse);
    expect(row(rows, "findings.error").better).toBe("a");
    expect(row(rows, "findings.warning").better).toBeNull();
    expect(row(rows, "findings.info").better).toBeNull();
    expect(row(rows, "emitterShortfalls")).toMatchObject({ a: 0, b: 1, better: "a" });
    expect(row(rows, "findings.codes")).toMatchObject({ a: "pump.oversized", b: "pump.too-weak, x.y" });
  });
  it("pipe lengths by material and size over both sides, missing ones as 0, and the total", () => {
    const rows = metricRows(base, { ...base, pipeLengthM: { copper: { "22": 55 }, pex: { "16x2": 80 } } });
    expect(row(rows, "pipeLengthM")).toMatchObject({ a: 90, b: 135 });
    expect(row(rows, "pipeLengthM.copper.15")).toMatchObject({ a: 40, b: 0, diff: -40 });
    expect(row(rows, "pipeLengthM.pex.16x2")).toMatchObject({ a: 0, b: 80 });
  });
  it("unknown numbers give no difference and no verdict", () => {
    const r = row(metricRows(base, { ...base, systemVolumeL: null }), "systemVolumeL");
    expect([r.kind === "number" && r.diff, r.better]).toEqual([null, null]);
  });
});

describe("refs", () => {
  it("reads schematic:{uuid} and revision:{uuid}, nothing else", () => {
    const id = "0b7a3c1e-0000-4000-8000-000000000102";
    expect(parseRef(`schematic:${id}`)).toEqual({ kind: "schematic", id });
    expect(parseRef(`revision:${id.toUpperCase()}`)).toEqual({ kind: "revision", id });
    for (const bad of [id, `project:${id}`, "schematic:", "schematic:12", `schematic:${id}x`]) expect(parseRef(bad), bad).toBeNull();
    expect(refSchema.safeParse("draft:1").error?.issues[0]?.message).toMatch(/schematic:\{id\}/);
  });
});
