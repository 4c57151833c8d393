/**
 * What the designer is told when the design flows cannot be trusted (sizing/design.ts):
 * `design.not-converged`, naming the pumps whose head did not settle. No valid drawing found so far
 * leaves the head unsettled after its 30 secant rounds, so the rounds are cut to 2 here: the head of
 * the pump beside the fixed bypass (testing/small-system.ts, fixedBypass) is then still moving.
 */
import { describe, expect, it, vi } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { fixedBypass, smallSystem } from "@/lib/hydraulics/testing/small-system";

vi.mock(import("./secant-settle"), async (importOriginal) => {
  const real = await importOriginal();
  return { settleBySecant: (start, residual, _rounds, tolerance) => real.settleBySecant(start, residual, 2, tolerance) };
});

function findings(doc: unknown) {
  const out = calculate(doc);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results.findings.filter((f) => f.code === "design.not-converged");
}

describe("a pump head that does not settle", () => {
  it("is a warning naming the pump, with how far its head still moved", () => {
    const f = findings(fixedBypass());
    expect(f.map((x) => [x.severity, x.refs])).toEqual([["warning", ["hp"]]]);
    const m = /^heating design flows did not settle: the head of a pump beside a bypass or other passive path changed by (\S+) kPa after 2 rounds, so its required head and the flows it drives are not reliable$/.exec(f[0]!.message);
    expect(m).not.toBeNull();
    expect(Number(m![1])).toBeGreaterThan(1e-7);
  });

  it("is not raised where no pump is on a loop (the small system's loads cut every loop)", () => {
    expect(findings(smallSystem())).toEqual([]);
  });
});
