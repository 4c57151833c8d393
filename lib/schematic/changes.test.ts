import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { docChanges } from "./doc-changes";
import { diffFromNothing, docDiff } from "./doc-diff";
import { parseSchematic } from "./parse";
import { resultsChanges } from "./results-changes";

const raw = JSON.parse(fs.readFileSync(path.join(process.cwd(), "db/seeds/data/orchard-end-bypass-only.json"), "utf8"));
const load = (edit: (d: typeof raw) => void = () => {}) => {
  const d = structuredClone(raw);
  edit(d);
  const p = parseSchematic(d);
  if (!p.ok) throw new Error(p.issues[0]?.message);
  return p.doc;
};

describe("docChanges: what changed since a drawing was sized", () => {
  it("names a lengthened pipe, a new part, a removed pipe and a design change", () => {
    const before = load();
    const after = load((d) => {
      d.pipes.find((p: { id: string }) => p.id === "z1-f0").lengthM = 80;
      d.parts.push({ id: "rad-new", type: "radiator", x: 0, y: 0 });
      d.pipes = d.pipes.filter((p: { id: string }) => p.id !== "acc-dc");
      d.design.flowTemperatureC = 50;
    });
    const texts = docChanges(before, after).map((c) => c.text);
    expect(texts).toContain("pipe z1-f0: length 6 → 80 m");
    expect(texts).toContain("part rad-new added (radiator)");
    expect(texts).toContain("pipe acc-dc removed");
    expect(texts).toContain("design: flowTemperatureC 45 → 50");
  });
  it("ignores what does not change the numbers: moves and labels", () => {
    const before = load();
    const after = load((d) => {
      d.parts[0].x += 200;
      d.parts[1].label = "Renamed";
    });
    expect(docChanges(before, after)).toEqual([]);
    expect(docChanges(before, before)).toEqual([]);
  });
  it("names changed props of a part", () => {
    const after = load((d) => { d.parts.find((p: { id: string }) => p.id === "rad-lounge").props.heatLoadW = 2500; });
    const [c] = docChanges(load(), after);
    expect(c).toMatchObject({ kind: "changed", ref: "rad-lounge" });
    expect(c!.text).toMatch(/^part rad-lounge: heatLoadW \d+ → 2500$/);
  });
});

describe("resultsChanges: what a second sizing computed differently", () => {
  const sized = (doc: unknown) => {
    const r = calculate(doc);
    if (!r.ok) throw new Error("refused");
    return r.results;
  };
  it("finds nothing between two sizings of the same document", () => {
    expect(resultsChanges(sized(raw), sized(raw))).toEqual([]);
  });
  it("names the figures that moved when a pipe is ten times longer, and not the ones that did not", () => {
    const longer = structuredClone(raw);
    longer.pipes.find((p: { id: string }) => p.id === "z1-f0").lengthM = 60;
    const changes = resultsChanges(sized(raw), sized(longer));
    const what = changes.map((c) => c.what);
    expect(what).toContain("heating · pipe z1-f0 Δp (kPa)");
    expect(what.some((w) => w.startsWith("heating · pump"))).toBe(true);
    // the hot-water run does not pass that pipe
    expect(what).not.toContain("hot-water · pipe hw-f flow (m³/h)");
  });
  it("reads an older engine's answer that lacks fields as 'not computed'", () => {
    const now = sized(raw);
    const old = { ...now, hotWater: null, modes: now.modes.map((m) => ({ ...m, pumps: undefined })) };
    const what = resultsChanges(old, now).map((c) => c.what);
    expect(what).toContain("cylinder cyl reheat (min)");
  });
});

// docDiff: the comparison the revision history, the out-of-date note and side by side share.
type Item = { id: string; [k: string]: any };

describe("docDiff: parts and pipes added, removed and changed, by id, with the fields that changed", () => {
  it("names each kind of change once", () => {
    const after = load((d) => {
      d.parts.find((p: Item) => p.id === "rad-lounge").props.heatLoadW = 2500;
      d.parts.find((p: Item) => p.id === "bp").props.openingKpa = 30;
      d.parts.push({ id: "rad-new", type: "radiator", x: 0, y: 0 });
      d.pipes.find((p: Item) => p.id === "z1-f0").lengthM = 80;
      d.pipes.find((p: Item) => p.id === "z1-f0").size = "28";
      d.pipes = d.pipes.filter((p: Item) => p.id !== "acc-dc");
      d.design.flowTemperatureC = 50;
      d.fluid = { kind: "propylene-glycol", percentByVolume: 25 };
    });
    const d = docDiff(load(), after);
    expect(d.added).toEqual(["rad-new"]);
    expect(d.removed).toEqual(["acc-dc"]);
    // in document order (parts, then pipes)
    expect(d.changed).toEqual([{ id: "bp", fields: ["openingKpa"] }, { id: "rad-lounge", fields: ["heatLoadW"] }, { id: "z1-f0", fields: ["size", "lengthM"] }]);
    expect(d.settings).toEqual(["design.flowTemperatureC", "fluid"]);
  });
  it("leaves moves and labels out for sizing, and names them for the history", () => {
    const after = load((d) => { d.parts[0].x += 40; d.parts[1].label = "Renamed"; d.parts[2].rotation = 90; });
    expect(docDiff(load(), after)).toEqual({ added: [], removed: [], changed: [], settings: [] });
    const withLayout = docDiff(load(), after, { layout: true });
    expect(withLayout.changed).toEqual([
      { id: raw.parts[0].id, fields: ["position"] }, { id: raw.parts[1].id, fields: ["label"] }, { id: raw.parts[2].id, fields: ["rotation"] }]);
  });
  it("a part that changes type is one change of its type; the first revision is all added", () => {
    const after = load((d) => { const p = d.parts.find((x: Item) => x.id === "zv1"); p.type = "isolation-valve"; p.props = {}; });
    expect(docDiff(load(), after).changed).toEqual([{ id: "zv1", fields: ["type"] }]);
    const first = diffFromNothing(load());
    expect(first.added).toHaveLength(raw.parts.length + raw.pipes.length);
    expect(first.added).toContain("z1-f0");
  });
});
