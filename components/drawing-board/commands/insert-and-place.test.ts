import { describe, expect, it } from "vitest";
import { parseSchematic } from "@/lib/schematic";
import { layoutOf } from "../parts/layout";
import { createBoardStore } from "../store";
import { demoDoc } from "../dev/demo-doc";
import { freeSpotNear } from "./free-spot";

const make = () => {
  const store = createBoardStore(demoDoc(), { readOnly: false });
  return () => store.getState();
};

describe("insert-on-pipe (a tee or valve dropped on a pipe)", () => {
  it("splits the pipe into two connected pipes through the part, lengths shared, and one undo restores it", () => {
    const s = make();
    const before = s().doc;
    // p4 runs zv1 (540,160) → rad1 (700,160), 6 m: a tee dropped a quarter of the way along
    expect(s().dispatch("insert-on-pipe", { type: "tee", x: 580, y: 160, pipeId: "p4" }).ok).toBe(true);
    const doc = s().doc;
    const tee = doc.parts.at(-1)!;
    expect(tee).toMatchObject({ type: "tee", x: 580, y: 160 });
    const first = doc.pipes.find((p) => p.id === "p4")!;
    const second = doc.pipes.find((p) => p.from === `${tee.id}.b`)!;
    expect(first).toMatchObject({ from: "zv1.b", to: `${tee.id}.a`, material: "copper", size: "15" });
    expect(second).toMatchObject({ to: "rad1.flow", material: "copper", size: "15" });
    expect(first.lengthM + second.lengthM).toBeCloseTo(6, 9);
    expect(first.lengthM).toBeCloseTo(1.5, 9); // 40 of 160 px along the run
    expect(doc.pipes).toHaveLength(before.pipes.length + 1);
    expect(parseSchematic(doc).ok).toBe(true);
    s().dispatch("undo");
    expect(s().doc).toBe(before);
  });
  it("takes a valve through its inlet and outlet, and refuses a part that cannot sit in a run", () => {
    const s = make();
    expect(s().dispatch("insert-on-pipe", { type: "isolation-valve", x: 400, y: 230, pipeId: "p5" }).ok).toBe(true);
    const iso = s().doc.parts.at(-1)!;
    expect(s().doc.pipes.filter((p) => p.to === `${iso.id}.a` || p.from === `${iso.id}.b`)).toHaveLength(2);
    const doc = s().doc;
    expect(s().dispatch("insert-on-pipe", { type: "radiator", x: 0, y: 0, pipeId: "p1" })).toMatchObject({ ok: false });
    expect(s().doc).toBe(doc);
  });
});

describe("free spot near the view's centre (parts clicked in from the bin)", () => {
  const clear = (doc: ReturnType<typeof demoDoc>, x: number, y: number, type: "radiator" | "pump") => {
    const me = layoutOf(type);
    return doc.parts.every((p) => {
      const l = layoutOf(p.type, p.props);
      return Math.abs(p.x - x) >= (l.w + me.w) / 2 || Math.abs(p.y - y) >= (l.h + me.h) / 2;
    });
  };
  it("keeps the centre when it is free, and moves off a part that sits there", () => {
    const doc = demoDoc();
    expect(freeSpotNear({ parts: [] }, "pump", 103, 97)).toEqual({ x: 100, y: 100 });
    const spot = freeSpotNear(doc, "radiator", 700, 160); // rad1 sits exactly there
    expect(spot).not.toEqual({ x: 700, y: 160 });
    expect(clear(doc, spot.x, spot.y, "radiator")).toBe(true);
    expect(Math.hypot(spot.x - 700, spot.y - 160)).toBeLessThan(200);
  });
  it("places ten parts clicked in one after another on ten different free spots", () => {
    const s = make();
    for (let i = 0; i < 10; i++) s().dispatch("add-part", { type: "pump", ...freeSpotNear(s().doc, "pump", 400, 300) });
    const added = s().doc.parts.slice(-10);
    expect(new Set(added.map((p) => `${p.x},${p.y}`)).size).toBe(10);
    for (const p of added) expect(clear({ ...s().doc, parts: s().doc.parts.filter((q) => q !== p) }, p.x, p.y, "pump")).toBe(true);
  });
});
