/**
 * A pipe whose size is not in the catalogue (and has no bore typed) cannot be sized: the
 * calculation says so with input.pipe-size naming it, and still answers for the rest of the
 * system rather than failing (product rule: bad input gets a clear message, never a crash).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";

describe("a pipe size missing from the catalogue", () => {
  it("copper size 99: input.pipe-size names the pipe and the rest is still calculated", () => {
    const d = smallSystem();
    d.pipes = d.pipes.map((p) => (p.id === "p3" ? { ...p, size: "99" } : p));
    const out = calculate(d);
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    const f = out.results.findings.filter((x) => x.code === "input.pipe-size");
    expect(f.map((x) => x.refs)).toEqual([["p3"]]);
    expect(f[0]!.message).toContain('size "99"');
    expect(out.results.modes).toHaveLength(1);
    expect(out.results.modes[0]!.pipes.find((p) => p.id === "p1")!.flowM3h).toBeGreaterThan(0);
  });
});
