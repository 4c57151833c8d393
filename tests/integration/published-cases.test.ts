/**
 * Small schematics whose answers were worked out by hand from published
 * formulations (shared/references.md, section named beside each check). The
 * fixtures live in tests/fixtures/published-cases/; each is sized through the
 * same path the API takes (parseSchematic → calculate).
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { beforeEach, describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { parseSchematic, resultsSchema, type Results } from "@/lib/schematic";

/** Sized in each describe's beforeEach, which runs inside every test: never while the file is collected. */
function size(name: string): Results {
  const raw: unknown = JSON.parse(readFileSync(path.resolve("tests/fixtures/published-cases", name), "utf8"));
  const parsed = parseSchematic(raw);
  if (!parsed.ok) throw new Error(`${name}: ${JSON.stringify(parsed.issues)}`);
  const out = calculate(parsed.doc);
  if (!out.ok) throw new Error(`${name}: ${JSON.stringify(out.issues)}`);
  return resultsSchema.parse(out.results); // also proves no NaN/Infinity leaked out
}
const heating = (r: Results) => r.modes.find((m) => m.mode === "heating")!;
const pipe = (r: Results, id: string) => heating(r).pipes.find((p) => p.id === id)!;
const rel = (actual: number | null | undefined, expected: number) => Math.abs((actual ?? NaN) / expected - 1);

describe("Q = ṁ·cp·ΔT — references §10 (IAPWS-95 ρ, cp at the 37.5 °C mean)", () => {
  let r: Results;
  beforeEach(() => {
    r = size("heat-flow-10kw-dt5.json");
  });
  it("10 kW at ΔT 5 K (40/35 °C) needs 1.7347 m³/h = 0.4819 L/s", () => {
    // tolerance 0.2 %: references §13 check 39; the simplified ρ 1000 / cp 4.18 convention gives 1.7225 (−0.7 %) and fails it
    expect(rel(pipe(r, "flow").flowM3h, 1.7347)).toBeLessThan(0.002);
    expect(rel(heating(r).heatSourceFlowM3h, 1.7347)).toBeLessThan(0.002);
  });
  it("evaluates water at the mean temperature: ρ 993.15 kg/m³, cp 4179.3 J/(kg·K) at 37.5 °C", () => {
    expect(r.fluid.temperatureC).toBeCloseTo(37.5, 6);
    expect(rel(r.fluid.densityKgM3, 993.15)).toBeLessThan(5e-4); // ±0.05 %, references §1.1
    expect(rel(r.fluid.specificHeatJkgK, 4179.3)).toBeLessThan(2e-3); // ±0.2 %, references §1.1
  });
});

describe("Darcy–Weisbach with Colebrook, copper EN 1057 at 50 °C — references §3.4", () => {
  let r: Results;
  beforeEach(() => {
    r = size("copper-pipes-50c.json");
  });
  // references §3.4 rows (IAPWS water at 50 °C, ε 0.0015 mm); printed to 3–4 significant figures,
  // so tolerances are the rounding of the printed value plus 0.1 % for the flow set through Q = P/(ρ·cp·ΔT)
  const rows = [
    { id: "a-f", what: "Cu 22×0.9 at 0.25 L/s", lps: 0.25, v: 0.78, re: 28_488, f: 0.02397, rPaM: 357 },
    { id: "b-f", what: "Cu 15×0.7 at 0.10 L/s", lps: 0.1, v: 0.688, re: 16_925, f: 0.0272, rPaM: 468 },
    { id: "main-f", what: "Cu 28×0.9 at 0.50 L/s", lps: 0.5, v: 0.927, re: 43_929, f: 0.0217, rPaM: 352 },
  ];
  it.each(rows)("$what: v $v m/s, Re $re, f $f, R $rPaM Pa/m", (row) => {
    const p = pipe(r, row.id);
    expect(rel(p.flowM3h, row.lps * 3.6)).toBeLessThan(1e-3);
    expect(rel(p.velocityMps, row.v)).toBeLessThan(2e-3);
    expect(rel(p.reynolds, row.re)).toBeLessThan(2e-3);
    expect(rel(p.frictionFactor, row.f)).toBeLessThan(2e-3);
    expect(rel(p.gradientPaPerM, row.rPaM)).toBeLessThan(3e-3);
  });
});

describe("Expansion vessel, EN 12828 Annex D — references §8.1 worked example A", () => {
  let r: Results;
  beforeEach(() => {
    r = size("en12828-example-a.json");
  });
  it("V_s 200 L, 10 → 55 °C, 5 m, SV 3 bar: p_0 0.7 bar, V_e 2.843 L, V_n 11.36 L", () => {
    const ev = r.expansionVessel!;
    expect(ev.systemVolumeL).toBeCloseTo(200, 2); // the fixture's parts + pipes hold exactly 200 L
    expect(rel(ev.expansionVolumeL, 2.843)).toBeLessThan(2e-3); // e = 1.4213 % (IAPWS-95, references §1.4)
    expect(ev.recommendedPrechargeBar).toBeCloseTo(0.7, 6); // p_st 0.5 + 0.2 bar (10 m of water per bar)
    expect(rel(ev.requiredVolumeL, 11.36)).toBeLessThan(5e-3); // 0.5 %: references §13 check 36
    expect(ev.ok).toBe(true); // a 12 L vessel is provided
  });
});

describe("Pump and system curve, closed loop — references §11", () => {
  let r: Results;
  beforeEach(() => {
    r = size("pump-closed-loop.json");
  });
  it("H = 6 − 4Q² m against 3Q² m meets at Q = √(6/7) = 0.9258 m³/h, H = 2.571 m", () => {
    const sc = r.scenarios.find((s) => s.name === "design")!;
    expect(sc.converged).toBe(true);
    // 0.2 %: the curve is given as 41 points, so a linear reading of it errs by < 0.01 % at the duty point
    expect(rel(sc.heatSourceFlowM3h, Math.sqrt(6 / 7))).toBeLessThan(2e-3);
    const load = sc.parts.find((p) => p.id === "load");
    expect(load?.pressureDropKpa, "the load's pressure drop in the scenario").toEqual(expect.any(Number));
    const headM = (load!.pressureDropKpa! * 1000) / (r.fluid.densityKgM3! * 9.80665);
    expect(rel(headM, (3 * 6) / 7)).toBeLessThan(4e-3); // H = 3Q², twice the flow tolerance
  });
});
