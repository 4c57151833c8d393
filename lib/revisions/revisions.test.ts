import { describe, expect, it } from "vitest";
import { draftIsReadOnly } from "./draft-state";
import { transitionsFor } from "./transitions";

describe("revision moves per role (product.md roles table)", () => {
  const moves = (from: Parameters<typeof transitionsFor>[0], role: Parameters<typeof transitionsFor>[1]) => transitionsFor(from, role).map((t) => t.to);
  it("designers submit and issue; reviewers approve or send back; owners do all; others nothing", () => {
    expect(moves("draft", "designer")).toEqual(["in-review"]);
    expect(moves("in-review", "designer")).toEqual([]);
    expect(moves("in-review", "reviewer")).toEqual(["approved", "draft"]);
    expect(moves("approved", "designer")).toEqual(["issued"]);
    expect(moves("approved", "reviewer")).toEqual([]);
    expect(moves("in-review", "owner")).toEqual(["approved", "draft"]);
    for (const role of ["installer", "trainee"] as const) expect(moves("draft", role)).toEqual([]);
    expect(moves("issued", "owner")).toEqual([]);
    expect(moves("draft", null)).toEqual([]);
  });
});

describe("draft lock after an issue", () => {
  const t = (s: number) => new Date(Date.UTC(2026, 11, 1, 22, 0, s)).toISOString();
  it("locks the draft once the latest revision is issued, until the draft is touched again", () => {
    expect(draftIsReadOnly({ draftUpdatedAt: t(0), latest: { status: "issued", statusChangedAt: t(5) } })).toBe(true);
    expect(draftIsReadOnly({ draftUpdatedAt: t(9), latest: { status: "issued", statusChangedAt: t(5) } })).toBe(false);
    expect(draftIsReadOnly({ draftUpdatedAt: t(0), latest: { status: "approved", statusChangedAt: t(5) } })).toBe(false);
    expect(draftIsReadOnly({ draftUpdatedAt: t(0), latest: null })).toBe(false);
  });
});
