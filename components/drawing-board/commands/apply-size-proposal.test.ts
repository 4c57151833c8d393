import { describe, expect, it } from "vitest";
import { createBoardStore } from "../store";
import { demoDoc } from "../dev/demo-doc";

const make = (readOnly = false) => {
  const store = createBoardStore(demoDoc(), { readOnly });
  return () => store.getState();
};

describe("apply-size-proposal", () => {
  it("changes every proposed pipe in one step that one undo takes back", () => {
    const s = make();
    const before = s().doc;
    const [a, b] = before.pipes.filter((p) => p.material === "copper");
    const sizes = { [a!.id]: a!.size === "28" ? "35" : "28", [b!.id]: b!.size === "15" ? "22" : "15" };
    expect(s().dispatch("apply-size-proposal", { sizes }).ok).toBe(true);
    expect(s().doc.pipes.find((p) => p.id === a!.id)!.size).toBe(sizes[a!.id]);
    expect(s().doc.pipes.find((p) => p.id === b!.id)!.size).toBe(sizes[b!.id]);
    expect(s().past).toHaveLength(1);
    s().dispatch("undo");
    expect(s().doc).toBe(before);
    s().dispatch("redo");
    expect(s().doc.pipes.find((p) => p.id === a!.id)!.size).toBe(sizes[a!.id]);
  });
  it("refuses a size the pipe's material does not have, a proposal that changes nothing, and a read-only board", () => {
    const s = make();
    const before = s().doc;
    const pipe = before.pipes.find((p) => p.material === "copper")!;
    expect(s().dispatch("apply-size-proposal", { sizes: { [pipe.id]: "DN20" } })).toMatchObject({ ok: false, reason: expect.stringMatching(/no copper size "DN20"/) });
    expect(s().dispatch("apply-size-proposal", { sizes: { [pipe.id]: pipe.size } }).ok).toBe(false);
    expect(s().doc).toBe(before);
    expect(make(true)().dispatch("apply-size-proposal", { sizes: { [pipe.id]: "54" } }).ok).toBe(false);
  });
});
