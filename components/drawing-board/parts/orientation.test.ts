import { describe, expect, it } from "vitest";
import { parseSchematic } from "@/lib/schematic";
import { layoutOf } from "./layout";
import { autoOrient, orientedLayout } from "./orientation";

describe("orientation", () => {
  it("turns a link valve a quarter clockwise: a on top", () => {
    const l = orientedLayout(layoutOf("zone-valve"), { rotation: 90, flipX: false });
    expect([l.w, l.h]).toEqual([60, 60]);
    expect(l.ports.a).toEqual({ side: "top", at: 0.5 });
    expect(l.ports.b).toEqual({ side: "bottom", at: 0.5 });
  });
  it("mirrors a tee's run and opens a return tee upwards", () => {
    const doc = parseSchematic({
      format: "loopwright/schematic", version: 1,
      parts: [
        { id: "t", type: "tee", x: 100, y: 100 },
        { id: "r", type: "radiator", x: 100, y: 0 },
        { id: "left", type: "tee", x: 0, y: 100 },
        { id: "right", type: "tee", x: 200, y: 100 },
      ],
      pipes: [
        { id: "p1", from: "r.return", to: "t.c", material: "copper", size: "15", lengthM: 1 },
        { id: "p2", from: "right.a", to: "t.a", material: "copper", size: "15", lengthM: 1 },
        { id: "p3", from: "t.b", to: "left.b", material: "copper", size: "15", lengthM: 1 },
      ],
    });
    if (!doc.ok) throw new Error("bad fixture");
    const o = autoOrient(doc.doc).get("t")!;
    const l = orientedLayout(layoutOf("tee"), o);
    expect(l.ports.c!.side).toBe("top");
    expect(l.ports.a!.side).toBe("right");
  });
});
