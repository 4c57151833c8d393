/**
 * Property: whatever comes in — random documents, mutated real ones, junk —
 * calculate() never throws, and answers either a valid Results document
 * (parsed by the results schema, which rejects NaN and ±Infinity) with no
 * finding repeated (same code and refs), or ok:false with issues that each
 * name a JSON path.
 */
import fc from "fast-check";
import { readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { partRegistry, portsOf } from "@/lib/schematic/parts";
import { partTypes, type PartType } from "@/lib/schematic/schema";
import { resultsSchema } from "@/lib/schematic/results";
import { calculate } from "./calculate";
import { repeatedFindings } from "./testing/repeated-findings";
import { smallSystem } from "./testing/small-system";

function check(doc: unknown): void {
  const r = calculate(doc);
  if (r.ok) {
    const parsed = resultsSchema.safeParse(r.results);
    if (!parsed.success) throw new Error(`invalid results: ${JSON.stringify(parsed.error.issues.slice(0, 3))}`);
    expect(repeatedFindings(r.results.findings)).toEqual([]); // one finding per fault (same code, same refs once)
  } else {
    expect(r.issues.length).toBeGreaterThan(0);
    for (const i of r.issues) {
      expect(i.message).not.toMatch(/^internal engine error/);
      expect(typeof i.path).toBe("string");
      expect(i.message.length).toBeGreaterThan(0);
    }
  }
}

const seedDir = path.resolve(__dirname, "../../db/seeds/data");
// The demo documents are the mutated bases: a missing folder fails here, it does not shrink the property.
const seeds: unknown[] = readdirSync(seedDir)
  .filter((f) => f.endsWith(".json"))
  .map((f) => JSON.parse(readFileSync(path.join(seedDir, f), "utf8")))
  .filter((doc) => doc.format === "loopwright/schematic"); // the rooms and plant files beside them are not schematics
const bases = [smallSystem(), ...seeds];

const num = fc.oneof(
  fc.double({ min: -1e6, max: 1e6, noNaN: true }),
  fc.constantFrom(0, -1, 1e-9, 1e9, 3, 0.5, 45, 40, Number.NaN, Number.POSITIVE_INFINITY),
  fc.integer({ min: -5, max: 100 }),
);
const anyValue = fc.oneof(num, fc.boolean(), fc.constant(null), fc.string({ maxLength: 6 }), fc.constantFrom("a", "b", "22", "DN20", "16x2"));

/** A random schematic: random parts with random (often partly valid) props, pipes between their ports. */
const randomDoc = fc
  .record({
    types: fc.array(fc.constantFrom(...partTypes), { minLength: 0, maxLength: 14 }),
    props: fc.array(fc.dictionary(fc.constantFrom("kv", "kvs", "open", "heatLoadW", "ratedOutputKw", "volumeL", "openingKpa", "outlets", "position", "valveKv", "minFlowM3h", "curve", "pumpCurve", "deltaTK"), anyValue, { maxKeys: 3 }), { maxLength: 14 }),
    wires: fc.array(fc.tuple(fc.nat(), fc.nat(), fc.nat(), fc.nat(), fc.constantFrom("15", "22", "28", "10", "x"), fc.double({ min: -2, max: 40, noNaN: true })), { maxLength: 24 }),
    flowC: fc.constantFrom(35, 45, 55, 70, 40, 100),
    returnC: fc.constantFrom(30, 40, 45, 50),
    fluid: fc.constantFrom({ kind: "water" }, { kind: "propylene-glycol", percentByVolume: 30 }, { kind: "ethylene-glycol", percentByVolume: 20 }),
  })
  .map(({ types, props, wires, flowC, returnC, fluid }) => {
    const parts = types.map((type: PartType, i) => {
      const p = { ...(props[i] ?? {}) } as Record<string, unknown>;
      // Half the time keep props the schema can take, so documents also reach the engine.
      if (i % 2 === 0) for (const k of Object.keys(p)) if (typeof p[k] !== "number" || !(Number(p[k]) > 0) || k === "curve" || k === "pumpCurve" || k === "outlets" || k === "position" || k === "open") delete p[k];
      if (type === "pump" && i % 3 === 0) p.curve = [[0, 40], [1, 30], [2, 0]];
      return { id: `${type}${i}`, type, props: p };
    });
    const ports = parts.flatMap((p) => portsOf({ type: p.type, props: { ...p.props, outlets: 2 } } as never).map((port) => `${p.id}.${port}`));
    const pipes = ports.length < 2 ? [] : wires.map(([a, b, , , size, len], i) => ({
      id: `pipe${i}`,
      from: ports[a % ports.length]!,
      to: ports[(a + 1 + (b % (ports.length - 1))) % ports.length]!,
      material: "copper",
      size,
      lengthM: len,
    }));
    return {
      format: "loopwright/schematic",
      version: 1,
      fluid,
      design: { flowTemperatureC: flowC, returnTemperatureC: returnC },
      parts,
      pipes,
    };
  });

/** A mutation of a real document: delete, rewire, change a number or a type, toggle valves. */
const mutation = fc.tuple(fc.constantFrom("delete-part", "delete-pipe", "rewire", "number", "type", "toggle", "design", "junk"), fc.nat(), fc.nat(), anyValue, fc.constantFrom(...partTypes));
const mutated = fc.tuple(fc.nat({ max: bases.length - 1 }), fc.array(mutation, { minLength: 1, maxLength: 4 })).map(([b, ms]) => {
  const doc = structuredClone(bases[b]) as { parts: { id: string; type: string; props?: Record<string, unknown> }[]; pipes: Record<string, unknown>[]; design: Record<string, unknown> } & Record<string, unknown>;
  // Junk last: the structural mutations need parts and pipes to still be arrays.
  ms.sort((a, b) => Number(a[0] === "junk") - Number(b[0] === "junk"));
  for (const [kind, i, j, value, type] of ms) {
    if (!Array.isArray(doc.parts) || !Array.isArray(doc.pipes)) break; // a junk step already ran
    const part = doc.parts[i % Math.max(1, doc.parts.length)];
    const pipe = doc.pipes[i % Math.max(1, doc.pipes.length)];
    switch (kind) {
      case "delete-part":
        if (part) doc.parts = doc.parts.filter((p) => p !== part);
        break;
      case "delete-pipe":
        if (pipe) doc.pipes = doc.pipes.filter((p) => p !== pipe);
        break;
      case "rewire": {
        const other = doc.pipes[j % Math.max(1, doc.pipes.length)];
        if (pipe && other) [pipe.to, other.to] = [other.to, pipe.to];
        break;
      }
      case "number":
        if (pipe && j % 2 === 0) pipe[j % 4 === 0 ? "lengthM" : "innerDiameterMm"] = value;
        else if (part) {
          const keys = Object.keys(part.props ?? {});
          const key = keys[j % Math.max(1, keys.length)] ?? "kv";
          part.props = { ...(part.props ?? {}), [key]: value };
        }
        break;
      case "type":
        if (part && part.type in partRegistry && partRegistry[type].ports.length === portsOf({ type: part.type, props: { ...(part.props ?? {}), outlets: 2 } } as never).length) {
          part.type = type;
          part.props = {};
        }
        break;
      case "toggle":
        for (const p of doc.parts) if (p.type === "zone-valve" || p.type === "isolation-valve") p.props = { ...(p.props ?? {}), open: (j + p.id.length) % 2 === 0 };
        break;
      case "design": {
        const keys = Object.keys(doc.design ?? {});
        if (keys.length) doc.design = { ...doc.design, [keys[j % keys.length]!]: value };
        break;
      }
      case "junk":
        (doc as Record<string, unknown>)[["parts", "pipes", "fluid", "version", "format"][j % 5]!] = value;
        break;
    }
  }
  return doc;
});

// Under mutation testing (npm run mutate) every surviving mutant reruns this file: a tenth of the cases there.
const runs = (n: number) => (process.env.LOOPWRIGHT_MUTATION === "1" ? n / 10 : n);

describe("calculate() on any input", () => {
  it("random documents: valid results or issues, never a throw or a NaN", () => {
    fc.assert(fc.property(randomDoc, (doc) => check(doc)), { numRuns: runs(800) });
  });

  it("mutated real documents: valid results or issues", () => {
    fc.assert(fc.property(mutated, (doc) => check(doc)), { numRuns: runs(300) });
  });

  it("junk: not objects, wrong formats", () => {
    fc.assert(fc.property(fc.jsonValue(), (v) => check(v)), { numRuns: runs(200) });
    for (const v of [null, 1, "x", [], {}, { format: "loopwright/schematic" }, { format: "loopwright/schematic", version: 2 }]) check(v);
  });
});

describe("the generators reach the engine", () => {
  it("mutates the three demo documents and the small system, not fewer", () => {
    expect(seeds).toHaveLength(3);
    expect(bases).toHaveLength(4);
  });

  it("a good share of random and mutated documents pass the schema and get calculated", () => {
    const share = (docs: unknown[]) => docs.filter((d) => calculate(d).ok).length / docs.length;
    expect(share(fc.sample(randomDoc, 200))).toBeGreaterThan(0.15);
    expect(share(fc.sample(mutated, 100))).toBeGreaterThan(0.15);
  });
});
