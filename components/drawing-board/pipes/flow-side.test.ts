import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { parseSchematic } from "@/lib/schematic";
import { demoDoc } from "../dev/demo-doc";
import { pipeSides } from "./flow-side";

describe("pipeSides", () => {
  it("colours the demo: heat pump flow run red, radiator returns blue", () => {
    const sides = pipeSides(demoDoc());
    for (const id of ["p1", "p2", "p3", "p4", "p5", "p6"]) expect(sides.get(id)).toBe("flow");
    for (const id of ["p7", "p8", "p9"]) expect(sides.get(id)).toBe("return");
  });
  it("keeps a pump on the return run blue, and splits runs at the bypass", () => {
    const file = path.resolve(__dirname, "../../../db/seeds/data/millbrook-hall.json");
    const parsed = parseSchematic(JSON.parse(readFileSync(file, "utf8")));
    if (!parsed.ok) throw new Error(parsed.issues[0]?.message);
    const sides = pipeSides(parsed.doc);
    expect(sides.get("pri-r5")).toBe("return"); // pp.out on the primary return
    expect(sides.get("byp-f")).toBe("flow");
    expect(sides.get("byp-r")).toBe("return");
    expect(sides.get("acc-sv")).toBe("flow");
    expect(sides.get("z3-l1-r")).toBe("return");
  });
  it("falls back to pump ports, then neutral", () => {
    const parsed = parseSchematic({
      format: "loopwright/schematic", version: 1,
      parts: [{ id: "pu", type: "pump" }, { id: "t", type: "tee" }, { id: "v", type: "zone-valve" }, { id: "w", type: "zone-valve" }],
      pipes: [
        { id: "a", from: "pu.out", to: "t.a", material: "copper", size: "22", lengthM: 1 },
        { id: "b", from: "v.b", to: "w.a", material: "copper", size: "22", lengthM: 1 },
      ],
    });
    if (!parsed.ok) throw new Error("fixture");
    const sides = pipeSides(parsed.doc);
    expect(sides.get("a")).toBe("flow");
    expect(sides.get("b")).toBe("none");
  });
});
