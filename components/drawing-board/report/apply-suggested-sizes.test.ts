import { describe, expect, it } from "vitest";
import { fixtureDoc, fixtureResults } from "@/tests/fixtures/results-fixture";
import { applySuggestedSizes } from "./apply-suggested-sizes";

describe("apply suggested sizes", () => {
  it("changes every pipe whose suggestion differs, taking the larger of the modes' suggestions", () => {
    const { doc, changes } = applySuggestedSizes(fixtureDoc(), fixtureResults());
    // p1: heating says 22, hot water says 28 → 28. p2 already 22. p3: 28 → 22 (heating).
    expect(changes).toEqual([{ id: "p1", from: "15", to: "28" }, { id: "p3", from: "28", to: "22" }]);
    expect(doc.pipes.map((p) => p.size)).toEqual(["28", "22", "22"]);
  });
  it("drops the old size's diameter override and keeps everything else", () => {
    const { doc } = applySuggestedSizes(fixtureDoc(), fixtureResults());
    expect(doc.pipes[0]).not.toHaveProperty("innerDiameterMm");
    expect(doc.pipes[0]?.lengthM).toBe(6);
    expect(doc.pipes[0]?.fittings.elbow).toBe(2);
  });
  it("does not touch the input document and returns it unchanged when nothing differs", () => {
    const input = fixtureDoc();
    applySuggestedSizes(input, fixtureResults());
    expect(input.pipes[0]?.size).toBe("15");
    expect(applySuggestedSizes(input, null).doc).toBe(input);
  });
  it("ignores a suggestion that is not a size of the pipe's material", () => {
    const results = fixtureResults();
    results.modes = [{ ...results.modes[0]!, pipes: [{ ...results.modes[0]!.pipes[0]!, suggestedSize: "DN20" }] }];
    expect(applySuggestedSizes(fixtureDoc(), results).changes).toEqual([]);
  });
});

describe("pipes without flow", () => {
  it("are not resized from a mode in which they carry nothing", () => {
    const results = fixtureResults();
    // hot-water mode: p2 carries no flow but (as the engine does) names the smallest size
    results.modes[1]!.pipes[1] = { ...results.modes[1]!.pipes[1]!, flowM3h: 0, suggestedSize: "10" };
    results.modes[0]!.pipes[1] = { ...results.modes[0]!.pipes[1]!, flowM3h: 0, suggestedSize: "10" };
    expect(applySuggestedSizes(fixtureDoc(), results).changes.map((c) => c.id)).not.toContain("p2");
  });
});
