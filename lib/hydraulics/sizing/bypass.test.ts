/**
 * dp-bypass opening recommendation (common practice: set the bypass above the
 * highest differential pressure it sees with every zone open, plus a margin
 * of max(10 %, 2 kPa), so it stays shut in normal running). The checker found
 * Millbrook's recommendation taken from the design-flow Δp only, while the
 * real pump on its curve puts more across the zones with every zone open, so
 * a valve set to the recommendation would leak constantly.
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { perTest } from "@/lib/hydraulics/testing/per-test";
import type { Results } from "@/lib/schematic/results";

type Doc = { parts: { id: string; type: string; props: Record<string, unknown> }[] };
const millbrook = (): Doc =>
  JSON.parse(fs.readFileSync(path.resolve(__dirname, "../../../db/seeds/data/millbrook-hall.json"), "utf8"));
function run(doc: unknown): Results {
  const r = calculate(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.results;
}
/** The margin written out (common practice, not the engine's constants): the larger of +10 % and +2 kPa. */
const withMargin = (dp: number) => Math.max(dp * 1.1, dp + 2);
const setOpening = (d: Doc, kpa: number | null) => {
  d.parts.find((p) => p.id === "bp")!.props.openingKpa = kpa;
  return d;
};

describe("dp-bypass recommendation covers the simulated all-zones-open Δp (Millbrook demo)", () => {
  const sized = perTest(() => {
    const r = run(millbrook());
    const design = r.modes.find((m) => m.mode === "heating")!.parts.find((p) => p.id === "bp")!.pressureDropKpa!;
    const openScen = r.scenarios.find((s) => s.name === "all zones open")!;
    return { r, design, openScen, openBp: openScen.parts.find((p) => p.id === "bp")! };
  });

  it("the pump on its curve puts more across the bypass than the design flows do", () => {
    const { design, openScen, openBp } = sized();
    expect(openScen.converged).toBe(true);
    expect(openBp.flowM3h).toBe(0); // drawn at 30 kPa: shut with all zones open
    expect(openBp.pressureDropKpa!).toBeGreaterThan(design);
  });

  it("recommended = max(design Δp, all-zones-open Δp) + max(10 %, 2 kPa)", () => {
    const { r, design, openBp } = sized();
    const need = Math.max(design, openBp.pressureDropKpa!);
    expect(r.bypass!.recommendedOpeningKpa!).toBeCloseTo(withMargin(need), 2);
    expect(r.bypass!.recommendedOpeningKpa!).toBeGreaterThan(openBp.pressureDropKpa! + 2 - 1e-9);
  });

  it("a bypass set to the recommendation passes nothing with every zone open", () => {
    const { r } = sized();
    const rec = r.bypass!.recommendedOpeningKpa!;
    const r2 = run(setOpening(millbrook(), rec));
    const s = r2.scenarios.find((x) => x.name === "all zones open")!;
    expect(s.converged).toBe(true);
    expect(s.parts.find((p) => p.id === "bp")!.flowM3h).toBe(0);
    expect(r2.findings.some((f) => f.code === "bypass.opening-low")).toBe(false);
  });

  it("with no opening drawn the recommendation is simulated and the bypass stays shut with every zone open", () => {
    const { r } = sized();
    const r3 = run(setOpening(millbrook(), null));
    expect(r3.bypass!.recommendedOpeningKpa!).toBeCloseTo(r.bypass!.recommendedOpeningKpa!, 6);
    const s = r3.scenarios.find((x) => x.name === "all zones open")!;
    expect(s.parts.find((p) => p.id === "bp")!.flowM3h).toBe(0);
    // …and opens when every zone shuts
    expect(r3.scenarios.find((x) => x.name === "all zones shut")!.parts.find((p) => p.id === "bp")!.flowM3h!).toBeGreaterThan(0);
  });

  it("an opening between the design Δp and the all-zones-open Δp → bypass.opening-low naming the bypass", () => {
    const { design, openBp } = sized();
    const between = (design + openBp.pressureDropKpa!) / 2;
    const r4 = run(setOpening(millbrook(), between));
    const f = r4.findings.find((x) => x.code === "bypass.opening-low")!;
    expect(f.refs).toEqual(["bp"]);
    expect(f.message).toMatch(/every zone open/);
    expect(r4.scenarios.find((x) => x.name === "all zones open")!.parts.find((p) => p.id === "bp")!.flowM3h!).toBeGreaterThan(0);
  });
});
