/**
 * Whole-network sizing on real documents: every answer checked by running the
 * engine itself on the proposed sizes (velocity in every mode, each pump's
 * required head against its curve), never against the optimiser's own model.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";
import type { Results } from "@/lib/schematic/results";
import { DEFAULT_PRICES_PER_M } from "./prices";
import { optimise } from "./request";

const seed = (f: string) => JSON.parse(readFileSync(path.resolve(__dirname, "../../../db/seeds/data", f), "utf8"));
const run = (doc: unknown, options: unknown = {}) => {
  const r = optimise(doc, options);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.result;
};
const withSizes = <T extends { pipes: { id: string; size: string }[] }>(doc: T, sizes: Record<string, string>): T => ({ ...doc, pipes: doc.pipes.map((p) => ({ ...p, size: sizes[p.id]! })) });
const results = (doc: unknown): Results => {
  const r = calculate(doc);
  if (!r.ok) throw new Error("not calculated");
  return r.results;
};
/** The engine's own verdict: every flowing pipe within the velocity limit, every pump's head within its curve less the margin. */
function meetsLimits(doc: { design: { maxVelocityMps: number } }, r: Results, marginKpa = 0) {
  for (const m of r.modes) {
    for (const p of m.pipes) if (p.velocityMps !== null) expect(Math.abs(p.velocityMps)).toBeLessThanOrEqual(doc.design.maxVelocityMps);
    for (const d of m.pumps) expect(d.requiredHeadKpa!).toBeLessThanOrEqual(d.availableHeadKpa! - marginKpa + 1e-6);
  }
}
const cost = (doc: { pipes: { material: string; size: string; lengthM: number }[] }) =>
  doc.pipes.reduce((s, p) => s + DEFAULT_PRICES_PER_M[p.material as "copper"][p.size]! * p.lengthM, 0);

describe("the demo hall (two pumps, buffer, hot-water and heating modes)", () => {
  const hall = seed("millbrook-hall.json");
  const r = run(hall);
  it("proposes sizes the engine finds within every limit, at a cost no higher than drawn", () => {
    expect(r.feasible).toBe(true);
    expect(r.exact).toBe(true);
    expect(r.method).toBe("circuit-tree-dp");
    const after = withSizes(hall, r.sizes);
    meetsLimits(hall, results(after));
    expect(r.cost).toBeCloseTo(cost(after), 9);
    expect(r.before.cost).toBeCloseTo(cost(hall), 9);
    expect(r.cost).toBeLessThan(r.before.cost);
    expect(r.changes.length).toBeGreaterThan(0);
    expect(r.after.pumps.map((p) => `${p.id}/${p.mode}`).sort()).toEqual(["pp/heating", "pp/hot-water", "ps/heating"]);
  });
  it("keeps pipes with no design flow (vessel, safety valve, bypass legs) and says so", () => {
    for (const id of ["acc-sv", "acc-ev", "byp-f", "byp-r"]) expect(r.sizes[id]).toBe(hall.pipes.find((p: { id: string }) => p.id === id).size);
    expect(r.findings.find((f) => f.code === "optimise.kept-no-flow")?.refs).toEqual(expect.arrayContaining(["acc-sv", "byp-f"]));
  });
  it("keeps the dp bypass's legs even where the shut valve leaks solver round-off (Orchard End)", () => {
    const orchard = seed("orchard-end-bypass-only.json");
    const o = run(orchard);
    expect(o.feasible).toBe(true);
    for (const id of ["byp-f", "byp-r", "acc-ev", "acc-sv"]) expect(o.sizes[id]).toBe(orchard.pipes.find((p: { id: string }) => p.id === id).size);
  });
  it("keeps locked pipes and keeps a head margin", () => {
    const locked = ["sec-f5", "sec-f6", "sec-r6"];
    const m = run(hall, { locked, headMarginKpa: 8 });
    for (const id of locked) expect(m.sizes[id]).toBe(hall.pipes.find((p: { id: string }) => p.id === id).size);
    meetsLimits(hall, results(withSizes(hall, m.sizes)), 8);
    expect(m.cost).toBeGreaterThanOrEqual(r.cost - 1e-9);
  });
  it("life-cost trades pipe cost for pump head: dearer energy, lower head", () => {
    const cheap = run(hall, { objective: "life-cost", lifeCost: { pricePerKwh: 0.01 } });
    const dear = run(hall, { objective: "life-cost", lifeCost: { pricePerKwh: 5 } });
    expect(dear.after.requiredHeadKpa! + dear.after.pumps.reduce((s, p) => s + p.requiredHeadKpa!, 0))
      .toBeLessThan(cheap.after.requiredHeadKpa! + cheap.after.pumps.reduce((s, p) => s + p.requiredHeadKpa!, 0));
    expect(dear.cost).toBeGreaterThan(cheap.cost);
    // each is no worse on its own objective than the pipe-cost answer
    const asLife = run(withSizes(hall, r.sizes), { objective: "life-cost", locked: hall.pipes.map((p: { id: string }) => p.id), lifeCost: { pricePerKwh: 5 } });
    expect(dear.after.lifeCost!).toBeLessThanOrEqual(asLife.after.lifeCost! + 1e-6);
  });
  it("offers only the sizes a firm's price list stocks", () => {
    const firm = run(hall, { prices: { copper: { "22": 9, "28": 13, "35": 21, "42": 29 } } });
    expect(firm.priceSource.copper).toBe("options");
    for (const c of firm.changes) if (c.to.match(/^\d+$/)) expect(["22", "28", "35", "42"]).toContain(c.to);
  });
});

describe("infeasible: a pump too small for any sizes", () => {
  it("answers feasible: false, proposes nothing and names the index circuit", () => {
    const doc = smallSystem();
    doc.parts.find((p) => p.id === "pump")!.props = { curve: [[0, 3], [0.5, 2.5], [1, 2], [1.5, 1]] };
    const r = run(doc);
    expect(r.feasible).toBe(false);
    expect(r.changes).toEqual([]);
    expect(r.sizes).toEqual(Object.fromEntries(doc.pipes.map((p) => [p.id, p.size])));
    const f = r.findings.find((x) => x.code === "optimise.infeasible")!;
    expect(f.severity).toBe("error");
    // the index circuit: r2's, the long 8 m branch (the engine's own index with every pipe at its largest size)
    const largest = results(withSizes(doc, Object.fromEntries(doc.pipes.map((p) => [p.id, "54"]))));
    const index = largest.modes[0]!.circuits.find((c) => c.index)!.load;
    expect(f.refs).toEqual([index, "pump"]);
    expect(f.message).toContain(index);
  });
  it("a locked pipe too small for its flow makes it infeasible, named", () => {
    const doc = smallSystem();
    doc.pipes.find((p) => p.id === "p1")!.size = "10";
    const r = run(doc, { locked: ["p1"] });
    expect(r.feasible).toBe(false);
    expect(r.findings.find((x) => x.code === "optimise.kept-pipe-too-fast")?.refs).toEqual(["p1"]);
  });
});

describe("reverse return (a tree whose circuits cross)", () => {
  it("is solved exactly by branch and bound and checked by the engine", () => {
    const rr = {
      format: "loopwright/schematic", version: 1, name: "reverse return", fluid: { kind: "water" },
      design: { flowTemperatureC: 55, returnTemperatureC: 45, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1, targetGradientPaPerM: 300 },
      parts: [
        { id: "hp", type: "heat-pump", props: { ratedOutputKw: 8, minFlowM3h: 0, kv: 4, waterVolumeL: 2, pumpCurve: [[0, 40], [0.5, 38], [1, 30], [1.5, 15]] } },
        ...["tf1", "tf2", "tr2", "tr3"].map((id) => ({ id, type: "tee" })),
        ...[1, 2, 3].map((k) => ({ id: `rad${k}`, type: "radiator", props: { outputAtDt50W: 2500, heatLoadW: 1200 + 300 * k, valveKv: 1 } })),
      ],
      pipes: [
        ["f0", "hp.flow", "tf1.a", 5], ["f1", "tf1.c", "tf2.a", 6], ["f2", "tf2.c", "rad3.flow", 4],
        ["b1", "tf1.b", "rad1.flow", 2], ["b2", "tf2.b", "rad2.flow", 2],
        ["r1", "rad1.return", "tr2.a", 6], ["c2", "rad2.return", "tr2.b", 2], ["r2", "tr2.c", "tr3.a", 6],
        ["c3", "rad3.return", "tr3.b", 2], ["r3", "tr3.c", "hp.return", 9],
      ].map(([id, from, to, lengthM]) => ({ id: id as string, from: from as string, to: to as string, material: "copper", size: "22", lengthM: lengthM as number })),
    };
    const r = run(rr);
    expect(r.feasible).toBe(true);
    expect(r.method).toBe("branch-and-bound");
    expect(r.exact).toBe(true);
    meetsLimits(rr, results(withSizes(rr, r.sizes)));
  });
});

describe("a looped design network (two pipes in parallel on the flow main)", () => {
  it("gives sizes the engine finds within every limit, says the network is looped and gives the gap", () => {
    const doc = smallSystem();
    doc.parts.push({ id: "tx", type: "tee" }, { id: "ty", type: "tee" });
    doc.pipes = doc.pipes.filter((p) => p.id !== "p1");
    doc.pipes.push(
      { id: "p1", from: "hp.flow", to: "tx.a", material: "copper", size: "22", lengthM: 1 },
      { id: "la", from: "tx.b", to: "ty.a", material: "copper", size: "15", lengthM: 6 },
      { id: "lb", from: "tx.c", to: "ty.b", material: "copper", size: "22", lengthM: 9 },
      { id: "p1b", from: "ty.c", to: "tf.a", material: "copper", size: "22", lengthM: 1 },
    );
    const r = run(doc);
    expect(r.looped).toBe(true);
    expect(r.feasible).toBe(true);
    expect(r.exact).toBe(false);
    expect(r.findings.some((f) => f.code === "optimise.looped")).toBe(true);
    expect(r.gap === null || (r.gap >= 0 && r.gap < 1)).toBe(true);
    meetsLimits(doc, results(withSizes(doc, r.sizes)));
  });
});
