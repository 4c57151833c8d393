import { describe, expect, it } from "vitest";
import { fixtureDoc, fixtureResults } from "@/tests/fixtures/results-fixture";
import { sortedFindings } from "./findings";
import { indexCircuitIds, pipeLabels } from "./pipe-labels";
import { velocityBand } from "./velocity-bands";

const si = { flow: "m3/h", pressure: "kPa" } as const;

describe("velocity bands", () => {
  it("bands by the design's maximum velocity", () => {
    expect([0.1, 0.5, 0.8, 1.2].map((v) => velocityBand(v, 1))).toEqual(["slow", "moderate", "good", "high"]);
    expect(velocityBand(null, 1)).toBe("none");
    expect(velocityBand(0.6, 0.5)).toBe("high");
  });
});

describe("pipe labels", () => {
  it("shows heating-mode numbers in the chosen units, the band, and the size Apply would set (largest over modes)", () => {
    const labels = pipeLabels(fixtureResults(), fixtureDoc(), si);
    expect(labels.get("p1")).toMatchObject({ flow: "1.200 m³/h", velocity: "1.40 m/s", pressureDrop: "1.50 kPa",
      band: "high", suggestedSize: "28", onIndexCircuit: true });
    expect(labels.get("p2")?.suggestedSize).toBeNull(); // already 22
    expect(pipeLabels(fixtureResults(), fixtureDoc(), { flow: "l/s", pressure: "bar" }).get("p1")?.flow).toBe("0.333 l/s");
  });
  it("is empty without results", () => {
    expect(pipeLabels(null, fixtureDoc(), si).size).toBe(0);
  });
  it("traces the index circuit's pipes and parts", () => {
    expect([...indexCircuitIds(fixtureResults())]).toEqual(["p1", "p2", "rad", "p3"]);
  });
});

describe("findings", () => {
  it("lists errors first", () => {
    expect(sortedFindings(fixtureResults()).map((f) => f.severity)).toEqual(["error", "warning", "info"]);
  });
});
