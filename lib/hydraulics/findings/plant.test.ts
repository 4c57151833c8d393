/**
 * Strainer and isolation at the heat source: the walk from the heat source to
 * the first real branch must pass tees whose branch leads only to dead ends
 * (vessel, filling loop, drain cock — no circulating flow), however many tees
 * deep. Common practice: a strainer / dirt separator on the heat-source return
 * and isolation valves both sides (heat-pump installation manuals; the check
 * itself is the engine's, plant.ts). The document is the Orchard End demo with
 * the expansion vessel and filling loop hung off an extra tee between the heat
 * pump and its return isolation valve.
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import type { Finding } from "@/lib/schematic/results";

type Doc = { parts: { id: string; type: string; props?: Record<string, unknown> }[]; pipes: Record<string, unknown>[] };
const seed = (): Doc =>
  JSON.parse(fs.readFileSync(path.resolve(__dirname, "../../../db/seeds/data/orchard-end-bypass-only.json"), "utf8"));

/** hp.return ← t-x (→ t-y → ev + fl) ← iso-hr ← t-dc (→ dc) ← flt ← t-cyl */
function orchardWithDeadSubTree(): Doc {
  const d = seed();
  d.parts = d.parts.filter((p) => p.id !== "t-ev" && p.id !== "t-fl");
  d.parts.push({ id: "t-x", type: "tee" }, { id: "t-y", type: "tee" });
  d.pipes = d.pipes.filter((p) => !["pri-r4", "pri-r5", "acc-ev", "acc-fl", "pri-r7"].includes(p.id as string));
  d.pipes.find((p) => p.id === "pri-r3")!.to = "t-dc.a";
  const cu = (id: string, from: string, to: string, size = "28", lengthM = 0.4) => ({ id, from, to, material: "copper", size, lengthM });
  d.pipes.push(
    cu("pri-r7", "iso-hr.b", "t-x.a"),
    cu("pri-r8", "t-x.b", "hp.return", "28", 3.6),
    cu("acc-x", "t-x.c", "t-y.a", "22", 0.5),
    cu("acc-ev", "t-y.b", "ev.connection", "22", 1),
    cu("acc-fl", "t-y.c", "fl.connection", "15", 0.5),
  );
  return d;
}

function findings(d: Doc): Finding[] {
  const r = calculate(d);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.results.findings;
}
const codes = (d: Doc) => findings(d).map((f) => f.code);

/** Remove a two-port part, joining the pipes on its a and b ports into one. */
function bridge(d: Doc, id: string): void {
  d.parts = d.parts.filter((p) => p.id !== id);
  const into = d.pipes.find((p) => p.to === `${id}.a`)!;
  const out = d.pipes.find((p) => p.from === `${id}.b`)!;
  into.to = out.to;
  d.pipes = d.pipes.filter((p) => p !== out);
}

describe("heat-source strainer / isolation walk skips dead-end sub-trees", () => {
  it("the modified document still parses and calculates", () => {
    expect(calculate(orchardWithDeadSubTree()).ok).toBe(true);
  });

  it("vessel + filling loop on tee → tee between the heat pump and the strainer: no heat-source.no-strainer", () => {
    expect(codes(orchardWithDeadSubTree())).not.toContain("heat-source.no-strainer");
  });

  it("…and no heat-source.no-isolation (the return isolation valve lies beyond the dead sub-tree)", () => {
    expect(codes(orchardWithDeadSubTree())).not.toContain("heat-source.no-isolation");
  });

  it("remove the strainer → heat-source.no-strainer naming hp", () => {
    const d = orchardWithDeadSubTree();
    bridge(d, "flt");
    const f = findings(d).find((x) => x.code === "heat-source.no-strainer");
    expect(f?.refs).toEqual(["hp"]);
  });

  it("remove the return isolation valve → heat-source.no-isolation on the return only", () => {
    const d = orchardWithDeadSubTree();
    bridge(d, "iso-hr");
    const f = findings(d).find((x) => x.code === "heat-source.no-isolation");
    expect(f?.refs).toEqual(["hp"]);
    expect(f?.message).toMatch(/on its return before/);
  });

  it("a real branch (the cylinder return tee) still stops the walk: a strainer beyond it does not count", () => {
    const d = orchardWithDeadSubTree();
    // Move the strainer onto the heating return leg, beyond the t-cyl branch.
    bridge(d, "flt");
    d.parts.push({ id: "flt", type: "strainer", props: { kv: 12 } });
    const htg = d.pipes.find((p) => p.id === "htg-r1")!;
    htg.to = "flt.a";
    d.pipes.push({ id: "htg-r1b", from: "flt.b", to: "t-cyl.a", material: "copper", size: "28", lengthM: 0.3 });
    expect(codes(d)).toContain("heat-source.no-strainer");
  });
});
