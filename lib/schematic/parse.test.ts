import { describe, expect, it } from "vitest";
import { parseSchematic, formatPath } from "./parse";
import { partPropsSchemas, partTypes } from "./schema";
import { partRegistry, portsOf } from "./parts";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";

const issuesOf = (doc: unknown) => {
  const r = parseSchematic(doc);
  if (r.ok) throw new Error("expected issues");
  return r.issues;
};

describe("parseSchematic", () => {
  it("accepts the small system and fills defaults", () => {
    const r = parseSchematic(smallSystem());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const r1 = r.doc.parts.find((p) => p.id === "r1")!;
    expect(r1.type === "radiator" && r1.props.exponentN).toBe(1.3);
    expect(r.doc.pipes[0]!.fittings).toEqual({ elbow: 0, bend: 0, teeRun: 0, teeBranch: 0, reducer: 0 });
  });

  it("keeps fields it does not know (the drawing board's layout)", () => {
    const doc = { ...smallSystem(), viewport: { zoom: 2 } };
    const r = parseSchematic(doc);
    expect(r.ok && (r.doc as Record<string, unknown>).viewport).toEqual({ zoom: 2 });
  });

  it("writes paths like parts[3].props.kvs and names the field in the message", () => {
    const doc = smallSystem();
    doc.parts.push({ id: "zv", type: "zone-valve", props: { kvs: -1 } });
    const [issue] = issuesOf(doc);
    expect(issue!.path).toBe(`parts[${doc.parts.length - 1}].props.kvs`);
    expect(issue!.message).toContain("parts[10].props.kvs");
  });

  it("names an unknown part type with the allowed ones", () => {
    const doc = smallSystem();
    doc.parts[2]!.type = "teapot";
    const [issue] = issuesOf(doc);
    expect(issue!.path).toBe("parts[2].type");
    expect(issue!.message).toMatch(/unknown type.*zone-valve/);
  });

  it("rejects pipes to missing parts or ports, and duplicate ids", () => {
    const doc = smallSystem();
    doc.pipes[0]!.to = "nope.a";
    doc.pipes[1]!.to = "r1.inlet";
    doc.pipes[2]!.id = "p1";
    const issues = issuesOf(doc);
    expect(issues.map((i) => i.path)).toEqual(["pipes[0].to", "pipes[1].to", "pipes[2].id"]);
    expect(issues[1]!.message).toContain("ports: flow, return");
  });

  it("a pipe id repeating a part id is a duplicate (parts come first); an end naming a pipe's id names no part", () => {
    const doc = smallSystem();
    doc.pipes[0]!.id = "r1";
    doc.pipes[1]!.from = `${doc.pipes[2]!.id}.a`;
    const issues = issuesOf(doc);
    expect(issues.map((i) => i.message)).toEqual([
      "pipes[0].id: id 'r1' is used more than once",
      `pipes[1].from: pipe '${doc.pipes[1]!.id}' names part '${doc.pipes[2]!.id}', which does not exist`,
    ]);
  });

  it("manifold ports come from its outlets", () => {
    expect(portsOf({ type: "manifold", props: { outlets: 3 } } as never)).toEqual(["common", "p1", "p2", "p3"]);
  });

  it("refuses a newer version and a wrong format", () => {
    expect(issuesOf({ format: "loopwright/schematic", version: 9 })[0]!.path).toBe("version");
    expect(issuesOf({ format: "other", version: 1 })[0]!.path).toBe("format");
    expect(issuesOf(42)[0]!.path).toBe("");
  });

  it("every part type has a registry entry, a props schema with defaults and a label", () => {
    for (const t of partTypes) {
      expect(partRegistry[t].label.length).toBeGreaterThan(0);
      expect(partPropsSchemas[t].safeParse({}).success).toBe(true);
    }
  });

  it("formatPath", () => {
    expect(formatPath(["parts", 3, "props", "kvs"])).toBe("parts[3].props.kvs");
    expect(formatPath(["pumpCurve", 0, 1])).toBe("pumpCurve[0][1]");
  });
});
