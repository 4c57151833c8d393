import { describe, expect, it } from "vitest";
import { createBoardStore } from "./store";
import { demoDoc } from "./dev/demo-doc";

const make = (readOnly = false) => createBoardStore(demoDoc(), { readOnly });

describe("board store", () => {
  it("undoes and redoes every kind of change in order", () => {
    const store = make();
    const s = () => store.getState();
    const docs = [s().doc];
    const steps: (() => void)[] = [
      () => s().dispatch("add-part", { type: "radiator", x: 100, y: 100 }),
      () => s().dispatch("move-parts", { moves: [{ id: "hp1", x: 20, y: 40 }] }),
      () => s().dispatch("update-part-props", { id: "rad1", props: { outputAtDt50W: 1500 } }),
      () => s().dispatch("update-pipe", { id: "p4", patch: { lengthM: 12 } }),
      () => s().dispatch("update-part", { id: "rad1", patch: { label: "Hall" } }),
      () => (s().setSelection(["zv1"], []), s().dispatch("duplicate-selection")),
      () => (s().setSelection(["rad2"], []), s().dispatch("delete-selection")),
      () => s().dispatch("connect-pipe", { from: "rad3.flow", to: "zv3.a" }),
      () => (s().setSelection(["hp1", "pump1"], []), s().dispatch("rotate-selection")),
      () => s().dispatch("tidy-selection"),
      () => s().dispatch("apply-doc", { doc: { ...s().doc, name: "Renamed" } }),
    ];
    for (const step of steps) {
      step();
      docs.push(s().doc);
    }
    expect(new Set(docs).size).toBe(docs.length); // each step changed the doc
    expect(s().revision).toBe(steps.length);
    for (let i = docs.length - 2; i >= 0; i--) {
      s().dispatch("undo");
      expect(s().doc).toBe(docs[i]);
    }
    expect(s().dispatch("undo")).toEqual({ ok: true }); // nothing left: a no-op
    for (let i = 1; i < docs.length; i++) {
      s().dispatch("redo");
      expect(s().doc).toBe(docs[i]);
    }
    expect(s().revision).toBe(steps.length * 3);
  });

  it("clears redo after a new change and caps history", () => {
    const store = make();
    const s = () => store.getState();
    for (let i = 0; i < 120; i++) s().dispatch("move-parts", { moves: [{ id: "hp1", x: i + 1, y: 0 }] });
    expect(s().past.length).toBe(100);
    s().dispatch("undo");
    expect(s().future.length).toBe(1);
    s().dispatch("move-parts", { moves: [{ id: "hp1", x: 999, y: 0 }] });
    expect(s().future.length).toBe(0);
  });

  it("refuses edits on a read-only board but allows selection", () => {
    const store = make(true);
    const s = () => store.getState();
    expect(s().dispatch("add-part", { type: "pump", x: 0, y: 0 }).ok).toBe(false);
    expect(s().dispatch("select-all").ok).toBe(true);
    expect(s().selection.parts.length).toBe(s().doc.parts.length);
    expect(s().revision).toBe(0);
  });

  it("marks results stale on change and indexes findings by ref", () => {
    const store = make();
    const s = () => store.getState();
    s().setResults({ findings: [{ severity: "warning", code: "pipe.velocity-high", message: "fast", refs: ["p3", "zv1"] }, { severity: "error", code: "a.b", message: "x", refs: ["zv1"] }] } as never);
    expect(s().findings.get("zv1")).toBe("error");
    expect(s().findings.get("p3")).toBe("warning");
    expect(s().resultsStale).toBe(false);
    s().dispatch("update-pipe", { id: "p3", patch: { size: "28" } });
    expect(s().resultsStale).toBe(true);
  });
});
