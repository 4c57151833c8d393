import { describe, expect, it } from "vitest";
import { parseSchematic } from "./parse";
import { splitPortRef } from "./parts";
import { buildingPipeCount, generateBuilding, generateBuildingWithPipes } from "./generate-building";
import type { Schematic } from "./schema";

/** Parts reachable from `start` through pipes and parts (every part joins all its ports). */
function reachable(doc: Schematic, start: string): Set<string> {
  const adj = new Map<string, string[]>();
  for (const p of doc.pipes) {
    const a = splitPortRef(p.from).partId, b = splitPortRef(p.to).partId;
    adj.set(a, [...(adj.get(a) ?? []), b]);
    adj.set(b, [...(adj.get(b) ?? []), a]);
  }
  const seen = new Set([start]);
  const stack = [start];
  while (stack.length) for (const n of adj.get(stack.pop()!) ?? []) if (!seen.has(n)) (seen.add(n), stack.push(n));
  return seen;
}

describe("generateBuilding", () => {
  it("builds a valid schematic whose pipe count matches the formula", () => {
    const doc = generateBuilding({ floors: 4, radiatorsPerFloor: 6 });
    const parsed = parseSchematic(doc);
    expect(parsed.ok ? [] : parsed.issues).toEqual([]);
    expect(doc.pipes.length).toBe(buildingPipeCount(4, 6));
    expect(doc.parts.filter((p) => p.type === "radiator")).toHaveLength(24);
  });

  it("connects every radiator's flow and return, and reaches it from the boiler", () => {
    const doc = generateBuilding({ floors: 3, radiatorsPerFloor: 5, extraValves: 7 });
    const ends = new Set(doc.pipes.flatMap((p) => [p.from, p.to]));
    const seen = reachable(doc, "boiler");
    for (const rad of doc.parts.filter((p) => p.type === "radiator")) {
      expect(ends.has(`${rad.id}.flow`), rad.id).toBe(true);
      expect(ends.has(`${rad.id}.return`), rad.id).toBe(true);
      expect(seen.has(rad.id), rad.id).toBe(true);
    }
  });

  it("is deterministic", () => {
    expect(JSON.stringify(generateBuilding({ floors: 5, radiatorsPerFloor: 3 }))).toBe(
      JSON.stringify(generateBuilding({ floors: 5, radiatorsPerFloor: 3 })),
    );
  });

  it.each([17, 18, 50, 500, 2_000, 5_001, 20_000])("hits a target of %i pipes exactly and parses", (n) => {
    const doc = generateBuildingWithPipes(n);
    expect(doc.pipes).toHaveLength(n);
    const parsed = parseSchematic(doc);
    expect(parsed.ok ? [] : parsed.issues.slice(0, 3)).toEqual([]);
  });
});

describe("generateBuilding with several risers", () => {
  it("parses, counts and reaches every radiator from the boiler", () => {
    const doc = generateBuilding({ floors: 3, radiatorsPerFloor: 4, risers: 3, extraValves: 5 });
    const parsed = parseSchematic(doc);
    expect(parsed.ok ? [] : parsed.issues).toEqual([]);
    expect(doc.pipes).toHaveLength(buildingPipeCount(3, 4, 3) + 5);
    const seen = reachable(doc, "boiler");
    const rads = doc.parts.filter((p) => p.type === "radiator");
    expect(rads).toHaveLength(36);
    for (const r of rads) expect(seen.has(r.id), r.id).toBe(true);
  });
});
