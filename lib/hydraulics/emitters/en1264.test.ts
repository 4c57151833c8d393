import { describe, expect, it } from "vitest";
import { EN1264_SOURCE, en1264HeatFluxWm2, en1264SurfaceTemperatureC } from "./en1264";

// EN 1264-2 basic characteristic q = 8.92·(θ_F,m − θ_i)^1.1 — recalled from memory, then found in
// print: the trade journal IKZ ("Gut geplant ist optimal wärmeversorgt", ikz.de) gives the DIN EN 1264
// Basiskennlinie as q = 8,92·(t_FB,m − t_i)^1,1 with exponent 1.1 and factor 8.92. Second, independent
// check: "at most 100 W/m² with a 29 °C floor in a 20 °C room" (haustechnikdialog.de SHK-Wissen
// "Zusatzheizkörper"; EN 1264 trade pages, references.md §9). 8.92·9^1.1 = 100.04 → 0.1 W/m², 0.01 K.
describe("EN 1264 basic characteristic", () => {
  it("9 K surface excess → 100 W/m²", () => {
    expect(Math.abs(en1264HeatFluxWm2(29, 20) - 100.0)).toBeLessThan(0.1);
  });
  it("100 W/m² at 20 °C room → surface 20 + (100/8.92)^(1/1.1) = 29.0 °C (the inverse, by hand)", () => {
    expect(Math.abs(en1264SurfaceTemperatureC(100, 20) - 29.0)).toBeLessThan(0.01);
  });
  it("no flux at or below room temperature; rejects negative flux", () => {
    expect(en1264HeatFluxWm2(19, 20)).toBe(0);
    expect(() => en1264SurfaceTemperatureC(-5, 20)).toThrow(/qWm2/);
  });
});

describe("EN 1264 arguments: each limit on both sides", () => {
  it("surface at the room gives 0 W/m², 1 K above gives 8.92 W/m² (8.92·1^1.1)", () => {
    expect(en1264HeatFluxWm2(20, 20)).toBe(0);
    expect(en1264HeatFluxWm2(21, 20)).toBeCloseTo(8.92, 12);
  });
  it("0 W/m² needs the room temperature; the inverse of 8.92 W/m² is 1 K above it", () => {
    expect(en1264SurfaceTemperatureC(0, 20)).toBe(20);
    expect(en1264SurfaceTemperatureC(8.92, 20)).toBeCloseTo(21, 12);
  });
  it("non-finite temperatures and fluxes are refused by name", () => {
    expect(() => en1264HeatFluxWm2(Number.NaN, 20)).toThrow(/^surfaceC must be finite, got NaN$/);
    expect(() => en1264HeatFluxWm2(29, Number.POSITIVE_INFINITY)).toThrow(/^roomC must be finite, got Infinity$/);
    expect(() => en1264SurfaceTemperatureC(Number.POSITIVE_INFINITY, 20)).toThrow(/^qWm2 must be ≥ 0, got Infinity$/);
    expect(() => en1264SurfaceTemperatureC(100, Number.NaN)).toThrow(/^roomC must be finite, got NaN$/);
  });
});

describe("the citation shown with the working", () => {
  it("names EN 1264-2, the formula and where it was read (the standard's text not seen)", () => {
    expect(EN1264_SOURCE).toMatch(/^EN 1264-2 basic characteristic q = 8\.92·\(θF,m − θi\)\^1\.1 W\/m²/);
    expect(EN1264_SOURCE).toMatch(/IKZ-Haustechnik and SBZ/);
  });
});
