/**
 * Flow and return sides as the drawing shows them (flow-sides.ts): each part with a flow direction
 * scored +1 (its ports on the sides they are named for), −1 (on the wrong ones), 0 (the drawing does
 * not say). The expected sides are read off each drawing by hand (the diagram in each fixture's
 * comment): which port a pipe from a heat source's flow port reaches without passing a load.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { buildModel } from "@/lib/hydraulics/network/model";
import { parseSchematic } from "@/lib/schematic/parse";
import { oneLoadLoop, reversed } from "@/lib/hydraulics/testing/reversed";
import { fixedBypass, smallSystem } from "@/lib/hydraulics/testing/small-system";
import { twoZoneBypass, STRONG } from "@/lib/hydraulics/testing/two-zone-bypass";
import { flowSides } from "./flow-sides";

/** Score by "id role" (a buffer has two scored passes), for the parts that get one. */
function scores(doc: unknown): Record<string, number> {
  const parsed = parseSchematic(doc);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  const model = buildModel(parsed.doc);
  const { score } = flowSides(model);
  const out: Record<string, number> = {};
  model.links.forEach((l, k) => {
    if (!Number.isNaN(score[k]!)) out[l.role.startsWith("header-") ? `${l.id} ${l.role}` : l.id] = score[k]!;
  });
  return out;
}
const demo = (name: string) => JSON.parse(readFileSync(path.resolve(__dirname, "../../../db/seeds/data", name), "utf8"));

describe("flow and return sides of a drawing", () => {
  it("the small system as drawn: heat source and both radiators on their sides; pipes, tees and the pump get no score", () => {
    expect(scores(smallSystem())).toEqual({ hp: 1, r1: 1, r2: 1 });
  });

  it("one radiator of two piped backwards is outvoted by the heat source and the other radiator", () => {
    expect(scores(reversed(smallSystem(), "r1"))).toEqual({ hp: 1, r1: -1, r2: 1 });
  });

  it("the heat source piped backwards is outvoted by its two radiators", () => {
    expect(scores(reversed(smallSystem(), "hp"))).toEqual({ hp: -1, r1: 1, r2: 1 });
  });

  it("a fixed bypass joins flow and return into one piece: no verdict either way round", () => {
    expect(scores(fixedBypass())).toEqual({ hp: 0, rad: 0 });
    expect(scores(reversed(fixedBypass(), "rad"))).toEqual({ hp: 0, rad: 0 });
  });

  it("one heat source and one load that disagree tie: the sides alone cannot say which is wrong", () => {
    expect(scores(oneLoadLoop())).toEqual({ hp: 1, hl: 1 });
    expect(scores(reversed(oneLoadLoop(), "hl"))).toEqual({ hp: 0, hl: 0 });
  });

  it("a dp-bypass valve (shut at design) does not join the sides", () => {
    expect(scores(twoZoneBypass({ curve: STRONG, valveKv: 1 }))).toEqual({ hp: 1, r1: 1, r2: 1 });
  });

  it("a buffer's passes vote for their sides; its secondary ports swapped leave the radiators and heat source right", () => {
    const asDrawn = scores(demo("orchard-end-buffer-40l.json"));
    expect(asDrawn["buf header-primary"]).toBe(1);
    expect(asDrawn["buf header-secondary"]).toBe(1);
    const swapped = demo("orchard-end-buffer-40l.json");
    for (const p of swapped.pipes) for (const end of ["from", "to"]) p[end] = ({ "buf.p3": "buf.p4", "buf.p4": "buf.p3" } as Record<string, string>)[p[end]] ?? p[end];
    const s = scores(swapped);
    expect(s["buf header-secondary"]).toBe(-1);
    expect(Object.entries(s).filter(([id, v]) => !id.startsWith("buf ") && v !== 1)).toEqual([]);
  });
});
