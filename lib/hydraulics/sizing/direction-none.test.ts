/**
 * No part is called backwards where nothing is (direction.ts): the demo documents, generated
 * buildings, parts that legitimately carry water either way — a dp-bypass, a fixed bypass or check
 * valve drawn either way round, a buffer or low-loss header whatever its ports — and random two-pipe
 * trees with a direct or a reverse return. In the same random trees, reversing one part names that
 * part and no other (where the drawing can tell: a heat source with its own pump and a single
 * radiator tie, so that radiator is left out).
 */
import fc from "fast-check";
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { randomTree } from "@/lib/hydraulics/testing/random-tree";
import { reversed } from "@/lib/hydraulics/testing/reversed";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";
import { twoZoneBypass, STRONG } from "@/lib/hydraulics/testing/two-zone-bypass";
import { generateBuilding } from "@/lib/schematic/generate-building";

const CODES = ["heat-source.reversed", "pump.reversed", "load.reversed"];
function named(doc: unknown): string[] {
  const r = calculate(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.results.findings.filter((f) => CODES.includes(f.code)).map((f) => `${f.code} [${f.refs.join(", ")}]`);
}
type Doc = { parts: { id: string; type: string; props?: Record<string, unknown> }[]; pipes: { id: string; from: string; to: string }[] };
const demo = (name: string): Doc => JSON.parse(readFileSync(path.resolve(__dirname, "../../../db/seeds/data", name), "utf8"));
const DEMOS = ["millbrook-hall.json", "orchard-end-bypass-only.json", "orchard-end-buffer-40l.json"];

/** `doc` with the pipe ends at ports a and b of one part exchanged. */
function swapPorts<T extends Doc>(doc: T, a: string, b: string): T {
  const d = structuredClone(doc);
  for (const p of d.pipes) for (const end of ["from", "to"] as const) p[end] = p[end] === a ? b : p[end] === b ? a : p[end];
  return d;
}

/** The small system with a valve of `type` between r2's flow and return pipes (tees tb and tc on p3 and p5). */
function withBypassValve(type: string, from: "a" | "b") {
  const d = smallSystem();
  d.parts.push({ id: "tb", type: "tee" }, { id: "tc", type: "tee" }, { id: "bv", type, props: {} });
  const cu = (id: string, a: string, b: string) => ({ id, from: a, to: b, material: "copper", size: "15", lengthM: 1 });
  d.pipes = d.pipes.filter((p) => p.id !== "p3" && p.id !== "p5");
  const to = from === "a" ? "b" : "a";
  d.pipes.push(cu("p3", "tf.c", "tb.a"), cu("p3b", "tb.b", "r2.flow"), cu("p5", "r2.return", "tc.a"), cu("p5b", "tc.b", "tr.b"), cu("x1", "tb.c", `bv.${from}`), cu("x2", `bv.${to}`, "tc.c"));
  return d;
}

describe("nothing backwards, nothing said", () => {
  it.each(DEMOS)("demo %s", (name) => expect(named(demo(name))).toEqual([]));

  it("generated buildings, one and two risers", () => {
    expect(named(generateBuilding({ floors: 3, radiatorsPerFloor: 4 }))).toEqual([]);
    expect(named(generateBuilding({ floors: 4, radiatorsPerFloor: 6, risers: 2 }))).toEqual([]);
  });

  it("a dp-bypass valve across two zones", () => {
    expect(named(twoZoneBypass({ curve: STRONG, valveKv: 1 }))).toEqual([]);
  });

  it.each([
    ["check-valve", "a"],
    ["check-valve", "b"],
    ["balancing-valve", "b"],
  ] as const)("a %s between flow and return drawn from its %s port", (type, from) => {
    const d = withBypassValve(type, from);
    const r = calculate(d);
    // the valve does join flow to return: the design flow passes it (a check valve drawn from b holds it shut)
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    const bv = r.results.modes[0]!.parts.find((p) => p.id === "bv")!;
    expect(Math.abs(bv.flowM3h ?? 0) > 0.01).toBe(!(type === "check-valve" && from === "b"));
    expect(named(d)).toEqual([]);
  });

  it.each(["buffer-vessel", "low-loss-header"])("a %s as drawn, and with its primary or secondary ports swapped", (type) => {
    const d = demo("orchard-end-buffer-40l.json");
    d.parts.find((p) => p.id === "buf")!.type = type;
    expect(named(d)).toEqual([]);
    expect(named(swapPorts(d, "buf.p1", "buf.p2"))).toEqual([]);
    expect(named(swapPorts(d, "buf.p3", "buf.p4"))).toEqual([]);
  });

  it("millbrook-hall's buffer with its primary ports swapped: the primary pump's design flow runs backwards, but the buffer is not judged and no pump is named", () => {
    const d = swapPorts(demo("millbrook-hall.json"), "buf.p1", "buf.p2");
    const r = calculate(d);
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    // the buffer's primary pass carries its design flow p1 → p2, now back round through pp
    expect(r.results.modes[0]!.parts.find((p) => p.id === "pp")!.flowM3h!).toBeLessThan(0);
    expect(named(d)).toEqual([]);
  });
});

const stream = fc.array(fc.double({ min: 0, max: 1, noNaN: true, maxExcluded: true }), { minLength: 120, maxLength: 120 });
const rng = (xs: number[]) => {
  let i = 0;
  return () => xs[i++ % xs.length]!;
};
// Under mutation testing (npm run mutate) every surviving mutant reruns this file: a tenth of the cases there.
const runs = (n: number) => (process.env.LOOPWRIGHT_MUTATION === "1" ? Math.ceil(n / 10) : n);

describe("random two-pipe trees, direct and reverse return", () => {
  it("as drawn: nothing; one part reversed: that part alone", () => {
    fc.assert(
      fc.property(stream, fc.integer({ min: 1, max: 3 }), fc.boolean(), fc.nat(), (xs, radiators, direct, pick) => {
        const t = randomTree(rng(xs), 12, { radiators, direct });
        expect(named(t.doc)).toEqual([]);
        const rads = t.circuits.map((c) => c.rad);
        // a lone radiator beside a heat source with its own pump ties with it: left out
        const candidates = ["hp", ...(t.pumpPart ? ["pump"] : []), ...(rads.length > 1 || t.pumpPart ? rads : [])];
        const id = candidates[pick % candidates.length]!;
        const code = id === "hp" ? "heat-source.reversed" : id === "pump" ? "pump.reversed" : "load.reversed";
        expect(named(reversed(t.doc as unknown as Doc, id))).toEqual([`${code} [${id}]`]);
      }),
      { numRuns: runs(150) },
    );
  });
});
