import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { parseSchematic, type Part, type Results } from "@/lib/schematic";
import { groupFindings, sortedFindings } from "./findings";
import { partBadge } from "./part-badges";
import { pipeLabels } from "./pipe-labels";
import { emittersInView, findingInView, pipesInView, scenarioKey, viewOfFinding, viewsOf, viewSummary } from "./results-view";

// The seeded Orchard End house (bypass only): 7 kW heat pump, diverter to a 200 L cylinder, two zones.
const raw = JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data/orchard-end-bypass-only.json"), "utf8"));
const parsed = parseSchematic(raw);
if (!parsed.ok) throw new Error("seed document refused");
const doc = parsed.doc;
const sized = calculate(doc);
if (!sized.ok) throw new Error("seed document not sized");
const results = sized.results;
const si = { flow: "m3/h", pressure: "kPa" } as const;
const flowOf = (view: string, id: string) => pipesInView(results, view).find((p) => p.id === id)?.flowM3h ?? null;

describe("results views: design modes and simulated scenarios", () => {
  it("offers both design modes and every scenario the engine ran", () => {
    expect(viewsOf(results).map((v) => v.key)).toEqual(["heating", "hot-water", ...results.scenarios.map((s) => scenarioKey(s.name))]);
    expect(viewsOf(null)).toEqual([]);
  });
  it("hot water: the cylinder coil pipes carry the heat source's whole flow; heating: none (the diverter is on heating)", () => {
    const hw = results.modes.find((m) => m.mode === "hot-water")!;
    // continuity: with the diverter to the cylinder, all of the heat source's flow passes the coil run
    expect(flowOf("hot-water", "hw-f")).toBeGreaterThan(0.1);
    expect(flowOf("hot-water", "hw-f")).toBeCloseTo(hw.heatSourceFlowM3h!, 6);
    expect(flowOf("hot-water", "hw-r")).toBeCloseTo(hw.heatSourceFlowM3h!, 6);
    expect(flowOf("heating", "hw-f")).toBe(0);
    const label = pipeLabels(results, doc, si, "hot-water").get("hw-f")!;
    expect(label.flow).toBe(`${hw.heatSourceFlowM3h!.toFixed(3)} m³/h`);
    expect(pipeLabels(results, doc, si, "heating").get("hw-f")!.flow).toBe("0.000 m³/h");
  });
  it("a scenario's pipes carry its simulated flow, with a velocity from the bore (v = Q/A)", () => {
    const shut = results.scenarios.find((s) => s.name === "all zones shut")!;
    const p = pipesInView(results, scenarioKey("all zones shut")).find((x) => x.id === "pri-f1")!;
    expect(p.flowM3h).toBe(shut.pipes.find((x) => x.id === "pri-f1")!.flowM3h);
    // copper 28 mm, EN 1057 28 × 0.9: bore 26.2 mm; v = Q / (π d²/4)
    expect(p.velocityMps).toBeCloseTo(p.flowM3h! / 3600 / (Math.PI * 0.0262 ** 2 / 4), 6);
  });
  it("all zones shut: the bypass passes the heat source's flow, no heat reaches the emitters", () => {
    const sum = viewSummary(results, doc, scenarioKey("all zones shut"))!;
    expect(sum.bypass?.id).toBe("bp");
    expect(sum.bypass!.flowM3h).toBeCloseTo(sum.heatSourceFlowM3h!, 6); // the only path left
    expect(sum.heatToEmittersW).toBeCloseTo(0, 6);
    expect(sum.heatSourceMinM3h).toBe(0.6); // the heat pump's minFlowM3h in the seed
    const open = viewSummary(results, doc, scenarioKey("all zones open"))!;
    expect(open.heatToEmittersW!).toBeGreaterThan(1000);
    // heating design: emitter outputs are the engine's design outputs
    expect(emittersInView(results, "heating").map((e) => e.outputW)).toEqual(results.emitters.map((e) => e.outputAtDesignW));
  });
});

describe("part badges: the number a part shows in the view chosen", () => {
  const part = (id: string) => doc.parts.find((p) => p.id === id)!;
  it("the cylinder shows its coil flow in hot water and none in heating; a radiator its output", () => {
    const hw = results.modes.find((m) => m.mode === "hot-water")!.parts.find((p) => p.id === "cyl")!.flowM3h!;
    expect(partBadge(results, part("cyl"), "hot-water", si)).toEqual({ text: `${hw.toFixed(3)} m³/h`, warn: false });
    expect(partBadge(results, part("cyl"), "heating", si)?.text).toBe("0.000 m³/h");
    const out = results.emitters.find((e) => e.id === "rad-lounge")!.outputAtDesignW!;
    expect(partBadge(results, part("rad-lounge"), "heating", si)?.text).toBe(out >= 1000 ? `${(out / 1000).toFixed(2)} kW` : `${out.toFixed(0)} W`);
    expect(partBadge(results, part("t-sv"), "heating", si)).toBeNull();
  });
  it("a heat source below its minimum flow is marked", () => {
    const shut = scenarioKey("all zones shut");
    const hp = { ...part("hp"), props: { ...(part("hp").props as object), minFlowM3h: 5 } } as Part;
    expect(partBadge(results, hp, shut, si)).toMatchObject({ warn: true, text: expect.stringMatching(/< min$/) });
  });
});

describe("findings say which mode or scenario they belong to", () => {
  it("tags a mode's findings with it, and 'in … mode' messages agree with the tag", () => {
    const modal = results.findings.filter((f) => / in (heating|hot-water) mode/.test(f.message));
    expect(modal.length).toBeGreaterThan(0);
    for (const f of modal) {
      // tagged: its messages are of that mode; found in both modes: untagged, and its message names both
      if (f.mode) expect(f.message).toContain(`in ${f.mode} mode`);
      else expect(f.message).toMatch(/in (heating|hot-water) mode.*; .*in (heating|hot-water) mode/);
    }
    const general = results.findings.find((f) => f.code === "system.volume-low")!;
    expect(viewOfFinding(general)).toBeNull();
    expect(findingInView(general, scenarioKey("all zones shut"))).toBe(true);
  });
  it("a heat source below its minimum at design and with every zone shut: one finding, shown in every view", () => {
    const starved = structuredClone(raw);
    starved.parts.find((p: { id: string }) => p.id === "hp").props.minFlowM3h = 5; // above anything the bypass can pass
    const r = calculate(starved);
    if (!r.ok) throw new Error("refused");
    const all = r.results.findings.filter((x) => x.code === "heat-source.min-flow");
    expect(all).toHaveLength(1); // one fault, one finding; its message names both situations
    const f = all[0]!;
    expect(f.message).toMatch(/every zone valve shut/);
    expect(f.mode).toBeUndefined();
    expect(f.scenario).toBeUndefined();
    expect(viewOfFinding(f)).toBeNull();
    expect(findingInView(f, "heating")).toBe(true);
    expect(findingInView(f, scenarioKey("all zones shut"))).toBe(true);
    expect(viewSummary(r.results, starved, scenarioKey("all zones shut"))!.belowMinimum).toBe(true);
  });
});

describe("findings grouped by check", () => {
  it("one group per code with its count, errors first, then the biggest", () => {
    const many: Results = { ...results, findings: [
      ...["p1", "p2", "p3"].map((id) => ({ severity: "warning" as const, code: "pipe.velocity-high", message: `pipe ${id} fast`, refs: [id], mode: "heating" as const })),
      { severity: "warning", code: "pipe.velocity-high", message: "pipe p1 fast", refs: ["p1"], mode: "hot-water" },
      { severity: "info", code: "pipe.no-flow", message: "x", refs: [] },
      { severity: "error", code: "pump.head-low", message: "y", refs: ["hp"] },
    ] };
    const groups = groupFindings(sortedFindings(many));
    expect(groups.map((g) => [g.code, g.items.length])).toEqual([["pump.head-low", 1], ["pipe.velocity-high", 4], ["pipe.no-flow", 1]]);
    expect(groups[1]!.title).toBe("Pipes too fast");
    expect(groups[2]!.title).toBe("Pipes with no flow");
  });

  it("parts piped the wrong way round read in our words", () => {
    const codes = ["heat-source.reversed", "pump.reversed", "load.reversed"];
    const backwards = codes.map((code) => ({ severity: "error" as const, code, message: "m", refs: ["x"] }));
    expect(groupFindings(backwards).map((g) => g.title).sort()).toEqual(["Emitters piped backwards", "Heat source backwards", "Pump drawn backwards"]);
  });
});
