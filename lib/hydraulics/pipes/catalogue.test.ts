import { describe, expect, it } from "vitest";
import { findPipeSize, pipeCatalogue, pipeMaterials, pipeWaterVolumeLPerM } from "./catalogue";

describe("pipe catalogue — names are the contract's (schematic-format.md)", () => {
  it("materials copper, steel, pex, multilayer", () => {
    expect([...pipeMaterials]).toEqual(["copper", "steel", "pex", "multilayer"]);
    expect(Object.keys(pipeCatalogue).sort()).toEqual([...pipeMaterials].sort());
  });
  it.each([
    ["copper", ["10", "15", "22", "28", "35", "42", "54"]],
    ["steel", ["DN15", "DN20", "DN25", "DN32", "DN40", "DN50"]],
    ["pex", ["16x2", "20x2", "26x3", "32x3"]],
    ["multilayer", ["16x2", "20x2", "26x3", "32x3"]],
  ] as const)("%s sizes", (material, sizes) => {
    expect(pipeCatalogue[material].map((p) => p.size)).toEqual(sizes);
  });
  it("every row has positive dimensions, d_i = OD − 2·wall, and a source", () => {
    for (const m of pipeMaterials) {
      for (const p of pipeCatalogue[m]) {
        expect(p.innerDiameterMm).toBeCloseTo(p.outerDiameterMm - 2 * p.wallMm, 9);
        expect(p.innerDiameterMm).toBeGreaterThan(0);
        expect(p.roughnessMm).toBeGreaterThan(0);
        expect(p.source.length).toBeGreaterThan(10);
      }
    }
  });
  it("findPipeSize finds rows and returns undefined for unknown sizes", () => {
    expect(findPipeSize("copper", "22")?.innerDiameterMm).toBe(20.2);
    expect(findPipeSize("copper", "DN20")).toBeUndefined();
    expect(findPipeSize("steel", "DN65")).toBeUndefined();
  });
});

describe("copper EN 1057 R250 (references.md §4.1, confirmed-in-search; 10 mm wall from memory)", () => {
  // Bores are OD − 2·wall of the published OD × wall → exact. Water content printed to 3
  // decimals → 0.5 % (check #21); ε drawn copper 0.0015 mm exact (check #18).
  it.each([
    ["10", 8.8, 0.061], ["15", 13.6, 0.145], ["22", 20.2, 0.32], ["28", 26.2, 0.539],
    ["35", 32.6, 0.835], ["42", 39.6, 1.232], ["54", 51.6, 2.091],
  ])("%s: d_i %f mm, %f L/m", (size, di, lPerM) => {
    const p = findPipeSize("copper", size)!;
    expect(p.innerDiameterMm).toBe(di);
    expect(p.roughnessMm).toBe(0.0015);
    expect(Math.abs(pipeWaterVolumeLPerM(p.innerDiameterMm) / lPerM - 1)).toBeLessThan(5e-3);
  });
});

describe("steel EN 10255 medium (references.md §4.2; walls confirmed, ODs from memory)", () => {
  it.each([
    ["DN15", 21.3, 2.6, 16.1], ["DN20", 26.9, 2.6, 21.7], ["DN25", 33.7, 3.2, 27.3],
    ["DN32", 42.4, 3.2, 36.0], ["DN40", 48.3, 3.2, 41.9], ["DN50", 60.3, 3.6, 53.1],
  ])("%s: %f × %f → d_i %f mm (check #22 is DN20), ε 0.045 mm (check #19)", (size, od, wall, di) => {
    const p = findPipeSize("steel", size)!;
    expect([p.outerDiameterMm, p.wallMm, p.innerDiameterMm, p.roughnessMm]).toEqual([od, wall, di, 0.045]);
  });
});

describe("plastic pipes (references.md §4.3, from memory / common practice)", () => {
  it.each([["16x2", 12], ["20x2", 16], ["26x3", 20], ["32x3", 26]])("PE-X and multilayer %s: d_i %f mm, ε 0.007 mm", (size, di) => {
    for (const m of ["pex", "multilayer"] as const) {
      expect(findPipeSize(m, size)?.innerDiameterMm).toBe(di);
      expect(findPipeSize(m, size)?.roughnessMm).toBe(0.007);
    }
  });
});

describe("pipeWaterVolumeLPerM", () => {
  it("π·d²/4: 20.2 mm → 0.32047 L/m; rejects d ≤ 0", () => {
    expect(pipeWaterVolumeLPerM(20.2)).toBeCloseTo(0.320474, 6);
    expect(() => pipeWaterVolumeLPerM(0)).toThrow(/innerDiameterMm/);
  });
});
