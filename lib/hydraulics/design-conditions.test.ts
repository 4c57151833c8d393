import { describe, expect, it } from "vitest";
import { designConditionIssues } from "./design-conditions";
import { designSchema } from "@/lib/schematic/schema";
import { calculate } from "@/lib/hydraulics/calculate";
import { resultsSchema } from "@/lib/schematic/results";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";

const base = designSchema.parse({});
const paths = (design: object, fluid: object = { kind: "water" }) => designConditionIssues({ ...base, ...design }, fluid).map((i) => i.path);

describe("design conditions sizing could not use are refused, naming the field", () => {
  it("the defaults are fine", () => expect(paths({})).toEqual([]));
  it("a return at or above the flow (no ΔT, so no design flow: q = P/(ρ·cp·ΔT))", () => {
    expect(paths({ returnTemperatureC: 50 })).toContain("design.returnTemperatureC");
    expect(paths({ returnTemperatureC: 45 })).toContain("design.returnTemperatureC");
  });
  it("a glycol share outside the 0–50 % vol tables", () => {
    expect(paths({}, { kind: "propylene-glycol", percentByVolume: 55 })).toEqual(["fluid.percentByVolume"]);
    expect(paths({}, { kind: "propylene-glycol", percentByVolume: 30 })).toEqual([]);
  });
  it("a static height whose EN 12828 pre-charge (h/10 + 0.2 bar) is not below p_e = p_SV − 0.5 bar", () => {
    // 3 bar valve: p_e 2.5 bar, so 23 m (2.5 bar) is refused and 22 m (2.4 bar) is not
    expect(paths({ staticHeightM: 23 })).toContain("design.staticHeightM");
    expect(paths({ staticHeightM: 22 })).toEqual([]);
  });
  it("a cold fill at the safety valve, a highest flow below the design flow, bad shapes", () => {
    expect(paths({ coldFillPressureBar: 3 })).toContain("design.coldFillPressureBar");
    expect(paths({ maxFlowTemperatureC: 40 })).toContain("design.maxFlowTemperatureC");
    expect(paths({ hotWaterFlowTemperatureC: 40 })).toContain("design.hotWaterFlowTemperatureC");
    expect(paths({ flowTemperatureC: "hot" })).toContain("design.flowTemperatureC");
  });
});

describe("the same bad conditions reaching the engine (a document typed by hand): findings naming the field, never a NaN", () => {
  it.each([
    ["return above flow", (d: ReturnType<typeof smallSystem>) => Object.assign(d.design, { returnTemperatureC: 50 }), "design.returnTemperatureC"],
    ["glycol outside the tables", (d: ReturnType<typeof smallSystem>) => Object.assign(d, { fluid: { kind: "propylene-glycol", percentByVolume: 55 } }), "fluid.percentByVolume"],
    ["static height the safety valve cannot take", (d: ReturnType<typeof smallSystem>) => Object.assign(d.design, { staticHeightM: 30 }), "design.staticHeightM"],
  ])("%s", (_what, change, field) => {
    const d = smallSystem();
    change(d);
    const r = calculate(d);
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    resultsSchema.parse(r.results); // zod numbers reject NaN and ±Infinity
    expect(r.results.findings.some((f) => f.fields?.includes(field))).toBe(true);
  });
});
