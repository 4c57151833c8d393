import { describe, expect, it } from "vitest";
import { parseSchematic, splitPortRef } from "@/lib/schematic";
import { createBoardStore } from "../store";
import { demoDoc } from "../dev/demo-doc";
import { parseClipboard } from "./paste";

const make = () => {
  const store = createBoardStore(demoDoc(), { readOnly: false });
  return () => store.getState();
};

describe("connect-pipe", () => {
  it("joins two free ports with a default copper pipe", () => {
    const s = make();
    s().dispatch("add-part", { type: "pump", x: 0, y: 0 });
    expect(s().dispatch("connect-pipe", { from: "pump2.out", to: "ev1.connection" }).ok).toBe(true);
    const pipe = s().doc.pipes.at(-1)!;
    expect(pipe).toMatchObject({ from: "pump2.out", to: "ev1.connection", material: "copper", size: "22" });
    expect(pipe.id).toBe("p10");
  });
  it("refuses an occupied port, the same part, and unknown ports", () => {
    const s = make();
    const before = s().doc;
    const busy = s().dispatch("connect-pipe", { from: "t1.a", to: "ev1.connection" });
    expect(busy).toMatchObject({ ok: false });
    expect(s().hint).toMatch(/already has a pipe/);
    expect(s().dispatch("connect-pipe", { from: "t1.a", to: "t1.b" })).toMatchObject({ ok: false, reason: expect.stringMatching(/itself/) });
    expect(s().dispatch("connect-pipe", { from: "ev1.connection", to: "t2.zz" }).ok).toBe(false);
    expect(s().doc).toBe(before);
  });
});

describe("copy / paste / duplicate", () => {
  it("pastes the selection with its internal pipes under new ids", () => {
    const s = make();
    s().setSelection(["zv1", "rad1", "t1"], []);
    s().dispatch("copy");
    s().dispatch("paste");
    const doc = s().doc;
    const newParts = s().selection.parts;
    const newPipes = doc.pipes.filter((p) => s().selection.pipes.includes(p.id));
    expect(newParts).toHaveLength(3);
    // internal pipes t1.b→zv1.a and zv1.b→rad1.flow come along; pipes to outside parts do not
    expect(newPipes).toHaveLength(2);
    for (const p of newPipes) {
      expect(newParts).toContain(splitPortRef(p.from).partId);
      expect(newParts).toContain(splitPortRef(p.to).partId);
    }
    expect(new Set([...doc.parts, ...doc.pipes].map((x) => x.id)).size).toBe(doc.parts.length + doc.pipes.length);
    expect(parseSchematic(doc).ok).toBe(true);
    s().dispatch("paste"); // a second paste lands further away
    const twice = s().doc.parts.filter((p) => s().selection.parts.includes(p.id));
    expect(twice.find((p) => p.type === "radiator")!.x).toBe(700 + 80);
  });
  it("duplicates without touching the clipboard", () => {
    const s = make();
    s().setSelection(["rad1"], []);
    s().dispatch("duplicate-selection");
    expect(s().clipboard).toBeNull();
    expect(s().doc.parts.at(-1)).toMatchObject({ id: "rad3", type: "radiator", x: 740, y: 200 });
  });
  it("accepts only well-formed clipboard JSON from outside", () => {
    expect(parseClipboard("not json")).toBeNull();
    expect(parseClipboard(JSON.stringify({ kind: "loopwright/clipboard", parts: [{ id: "x", type: "nope" }], pipes: [] }))).toBeNull();
    const ok = parseClipboard(JSON.stringify({ kind: "loopwright/clipboard", parts: [{ id: "x", type: "tee" }], pipes: [] }));
    expect(ok?.parts[0]).toMatchObject({ id: "x", type: "tee", x: 0, y: 0 });
  });
});

describe("validated edits", () => {
  it("refuses props and pipe values the schema rejects", () => {
    const s = make();
    const before = s().doc;
    expect(s().dispatch("update-part-props", { id: "zv1", props: { kvs: -1 } }).ok).toBe(false);
    expect(s().dispatch("update-pipe", { id: "p3", patch: { lengthM: "six" as never } }).ok).toBe(false);
    expect(s().doc).toBe(before);
  });
  it("deletes a part with the pipes attached to it", () => {
    const s = make();
    s().setSelection(["zv1"], []);
    s().dispatch("delete-selection");
    expect(s().doc.pipes.map((p) => p.id)).not.toContain("p3");
    expect(s().doc.pipes.map((p) => p.id)).not.toContain("p4");
    expect(s().selection.parts).toEqual([]);
  });
  it("apply-doc refuses an invalid document", () => {
    const s = make();
    const bad = { ...s().doc, pipes: [...s().doc.pipes, { ...s().doc.pipes[0]!, id: "p99", to: "ghost.a" }] };
    expect(s().dispatch("apply-doc", { doc: bad }).ok).toBe(false);
  });
  it("tidy lays a loop out in columns from its leftmost part", () => {
    const s = make();
    s().dispatch("tidy-selection");
    const at = new Map(s().doc.parts.map((p) => [p.id, p]));
    expect(at.get("hp1")!.x).toBeLessThan(at.get("pump1")!.x);
    expect(at.get("pump1")!.x).toBeLessThan(at.get("t1")!.x);
  });
});
