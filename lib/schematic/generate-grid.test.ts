import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { parseSchematic } from "./parse";
import { generateGrid, generateGridWithPipes, gridPipeCount } from "./generate-grid";

describe("generated grids", () => {
  it("are valid schematics of the stated pipe count", () => {
    const doc = generateGrid(4, 3);
    expect(parseSchematic(doc).ok).toBe(true);
    expect(doc.pipes).toHaveLength(gridPipeCount(4, 3));
    expect(generateGridWithPipes(1000).pipes.length).toBeGreaterThanOrEqual(1000);
    expect(generateGridWithPipes(1000).pipes.length).toBeLessThan(1100);
  });
  it("solve: every radiator gets flow and the flows add up at the boiler", () => {
    const r = calculate(generateGrid(4, 3));
    if (!r.ok) throw new Error("not calculated");
    const sc = r.results.scenarios[0]!;
    expect(sc.converged).toBe(true);
    const sum = sc.emitters.reduce((s, e) => s + e.flowM3h!, 0);
    expect(sc.emitters.every((e) => e.flowM3h! > 0)).toBe(true);
    expect(sum).toBeCloseTo(sc.heatSourceFlowM3h!, 6);
  });
});
