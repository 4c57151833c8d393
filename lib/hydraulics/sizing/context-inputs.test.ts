/**
 * What createContext makes of the document's inputs before any solve: each pipe's
 * geometry (catalogue bore and roughness, or the designer's override; fittings ΣK by
 * Crane TP-410), the design ΔT, the fluid at the mean temperature — and the input.*
 * and fluid.* findings for what cannot be used, naming the pipe or field and number.
 */
import { describe, expect, it } from "vitest";
import { COPPER_EPS_MM, COPPER_ID_MM } from "@/lib/hydraulics/testing/hand-calc";
import { contextOf } from "@/lib/hydraulics/testing/context-of";
import { smallSystem, type SmallSystem } from "@/lib/hydraulics/testing/small-system";

function context(change: (d: SmallSystem) => void = () => {}) {
  const d = smallSystem();
  change(d);
  const { ctx, findings } = contextOf(d);
  const geom = (id: string) => ctx.pipeGeom[ctx.doc.pipes.findIndex((p) => p.id === id)];
  const of = (code: string) => findings.list.filter((f) => f.code === code);
  return { ctx, geom, of, findings };
}
const pipe = (d: SmallSystem, id: string) => d.pipes.find((p) => p.id === id)!;

describe("pipe geometry", () => {
  it("a catalogue pipe: EN 1057 Cu 22 bore 20.2 mm, drawn-copper ε 0.0015 mm, no fittings ΣK 0; no input finding", () => {
    const { geom, findings } = context();
    expect(geom("p1")).toEqual({ innerDiameterM: COPPER_ID_MM["22"] / 1000, roughnessM: COPPER_EPS_MM / 1000, lengthM: 5, sumK: 0 });
    expect(geom("p3")).toEqual({ innerDiameterM: COPPER_ID_MM["15"] / 1000, roughnessM: COPPER_EPS_MM / 1000, lengthM: 8, sumK: 0 });
    expect(findings.list.filter((f) => f.code.startsWith("input.") || f.code.startsWith("fluid."))).toEqual([]);
  });

  it("fittings count: 2 elbows + 1 tee branch in a 20.2 mm bore → ΣK = (2·30 + 60)·fT(¾\") 0.025 = 3.0", () => {
    // Crane TP-410 A-26/A-27: elbow 30 fT, tee branch 60 fT; 20.2 mm is nearest the ¾" Sch 40 bore (20.93 mm), fT 0.025
    const { geom } = context((d) => void (pipe(d, "p1").fittings = { elbow: 2, teeBranch: 1 }));
    expect(geom("p1")!.sumK).toBeCloseTo(3.0, 12);
  });

  it("a size not in the catalogue with bore and roughness typed: the typed values, no finding", () => {
    const { geom, of } = context((d) => Object.assign(pipe(d, "p3"), { size: "99", innerDiameterMm: 13.6, roughnessMm: 0.0015 }));
    expect(geom("p3")).toEqual({ innerDiameterM: 0.0136, roughnessM: 0.0000015, lengthM: 8, sumK: 0 });
    expect(of("input.pipe-size")).toEqual([]);
  });

  const noSize = 'pipe p3: no copper size "99" in the catalogue and no inner diameter and roughness typed for it';
  it.each([
    ["neither bore nor roughness", {}],
    ["a bore but no roughness", { innerDiameterMm: 13.6 }],
    ["a roughness but no bore", { roughnessMm: 0.0015 }],
  ])("a size not in the catalogue with %s → input.pipe-size naming it, no geometry", (_, typed) => {
    const { geom, of, findings } = context((d) => Object.assign(pipe(d, "p3"), { size: "99" }, typed));
    expect(of("input.pipe-size").map((f) => [f.severity, f.message, f.refs])).toEqual([["error", noSize, ["p3"]]]);
    expect(findings.list.filter((f) => f.code === "input.pipe-diameter")).toEqual([]);
    expect(geom("p3")).toBeNull();
    expect(geom("p2")).not.toBeNull();
  });

  it("a bore of 0.5 mm → input.pipe-diameter naming the pipe and the 0.5 mm, no geometry", () => {
    const { geom, of } = context((d) => void (pipe(d, "p3").innerDiameterMm = 0.5));
    expect(of("input.pipe-diameter").map((f) => [f.severity, f.message, f.refs])).toEqual([
      ["error", "pipe p3: inner diameter 0.5 mm is not a usable pipe bore (≥ 1 mm)", ["p3"]],
    ]);
    expect(geom("p3")).toBeNull();
  });

  it("a bore of exactly 1 mm is usable (the limit is ≥ 1 mm)", () => {
    const { geom, of } = context((d) => void (pipe(d, "p3").innerDiameterMm = 1));
    expect(of("input.pipe-diameter")).toEqual([]);
    expect(geom("p3")!.innerDiameterM).toBe(0.001);
  });

  it("a negative length → input.pipe-length error naming the pipe and −2 m, no geometry", () => {
    const { geom, of } = context((d) => void (pipe(d, "p3").lengthM = -2));
    expect(of("input.pipe-length").map((f) => [f.severity, f.message, f.refs])).toEqual([["error", "pipe p3: length -2 m is negative", ["p3"]]]);
    expect(geom("p3")).toBeNull();
  });

  it("a bad bore and a negative length on one pipe: both errors", () => {
    const { geom, of } = context((d) => Object.assign(pipe(d, "p3"), { innerDiameterMm: 0.5, lengthM: -2 }));
    expect(of("input.pipe-diameter").map((f) => f.refs)).toEqual([["p3"]]);
    expect(of("input.pipe-length").map((f) => [f.severity, f.refs])).toEqual([["error", ["p3"]]]);
    expect(geom("p3")).toBeNull();
  });
});

describe("zero-length pipes: computed as direct joints, one warning naming them", () => {
  const tail = " 0 m — treated as a direct joint (fittings only, no pipe friction); type the length if it has one";
  const zeroed = (ids: string[]) => context((d) => ids.forEach((id) => (pipe(d, id).lengthM = 0)));

  it("one: 'pipe p6b: length 0 m', geometry kept with length 0", () => {
    const { geom, of } = zeroed(["p6b"]);
    expect(of("input.pipe-length").map((f) => [f.severity, f.message, f.refs])).toEqual([["warning", `pipe p6b: length${tail}`, ["p6b"]]]);
    expect(geom("p6b")).toEqual({ innerDiameterM: COPPER_ID_MM["22"] / 1000, roughnessM: COPPER_EPS_MM / 1000, lengthM: 0, sumK: 0 });
  });

  it("two: 'pipes p6b, pev: lengths 0 m'", () => {
    const { of } = zeroed(["p6b", "pev"]);
    expect(of("input.pipe-length").map((f) => [f.message, f.refs])).toEqual([[`pipes p6b, pev: lengths${tail}`, ["p6b", "pev"]]]);
  });

  it("five: all five named, no 'more'", () => {
    const { of } = zeroed(["p1", "p2", "p3", "p4", "p5"]);
    expect(of("input.pipe-length").map((f) => [f.message, f.refs])).toEqual([[`pipes p1, p2, p3, p4, p5: lengths${tail}`, ["p1", "p2", "p3", "p4", "p5"]]]);
  });

  it("seven: the first five named 'and 2 more', all seven in refs", () => {
    const ids = ["p1", "p2", "p3", "p4", "p5", "p6a", "p6b"];
    const { of } = zeroed(ids);
    expect(of("input.pipe-length").map((f) => [f.message, f.refs])).toEqual([[`pipes p1, p2, p3, p4, p5 and 2 more: lengths${tail}`, ids]]);
  });
});

describe("design ΔT and the fluid", () => {
  it("45/40 °C: ΔT 5 K, fluid at the mean 42.5 °C, no input.delta-t", () => {
    const { ctx, of } = context();
    expect(ctx.deltaTK).toBe(5);
    expect(ctx.fluid!.temperatureC).toBe(42.5);
    expect(of("input.delta-t")).toEqual([]);
  });

  it.each([
    [40, 40],
    [40, 45],
  ])("flow %d °C, return %d °C: no ΔT, input.delta-t naming both temperatures and fields", (flowC, returnC) => {
    const { ctx, of } = context((d) => Object.assign(d.design, { flowTemperatureC: flowC, returnTemperatureC: returnC }));
    expect(ctx.deltaTK).toBeNull();
    expect(of("input.delta-t")).toEqual([
      {
        severity: "error",
        code: "input.delta-t",
        message: `design: flow ${flowC} °C is not above return ${returnC} °C, so no design flow can be computed (ΔT must be > 0)`,
        refs: [],
        fields: ["design.flowTemperatureC", "design.returnTemperatureC"],
      },
    ]);
  });

  it("water at a mean of 105 °C (110/100): above liquid water's 100 °C at 1 atm → fluid.out-of-range, no fluid", () => {
    // liquid water at 1 atm ends at the normal boiling point, 99.97 °C (IAPWS-95)
    const { ctx, of } = context((d) => Object.assign(d.design, { flowTemperatureC: 110, returnTemperatureC: 100 }));
    expect(ctx.fluid).toBeNull();
    expect(of("fluid.out-of-range")).toEqual([
      {
        severity: "error",
        code: "fluid.out-of-range",
        message: "fluid: no properties for water at 105 °C (water properties are valid for 0–100 °C liquid, not 105 °C); hydraulic results are not computed",
        refs: [],
        fields: ["fluid.kind", "fluid.percentByVolume", "design.flowTemperatureC"],
      },
    ]);
  });
});
