/**
 * Pumps on one side are sized as in series (heads added, pumps/curve.ts seriesCurve). Two pumps drawn
 * in parallel are not modelled: the one off the index circuit's path is named, with the duty it
 * makes unreliable, instead of a quiet answer; pumps in series get no such finding.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { SERIES_PUMP_CURVE, smallSystem, withPumpInSeries } from "@/lib/hydraulics/testing/small-system";

const findingsOf = (doc: unknown) => {
  const r = calculate(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.results.findings.filter((f) => f.code === "pump.not-in-series");
};

describe("pumps beside each other on one side", () => {
  it("a second pump across the first one's ports (in parallel) is named, with the duty it makes unreliable", () => {
    // ts ─p6c─ tp1 ─ pump ─ tp2 ─p7─ hp.return, and tp1 ─ pump2 ─ tp2
    const d = smallSystem();
    d.parts.push({ id: "tp1", type: "tee" }, { id: "tp2", type: "tee" }, { id: "pump2", type: "pump", props: { curve: SERIES_PUMP_CURVE.map(([q, h]) => [q, h]) } });
    const cu = (id: string, from: string, to: string) => ({ id, from, to, material: "copper", size: "22", lengthM: 0.3 });
    d.pipes = d.pipes.filter((p) => p.id !== "p6c" && p.id !== "p7");
    d.pipes.push(
      { ...cu("p6c", "ts.b", "tp1.a"), lengthM: 0.5 },
      cu("q1", "tp1.b", "pump.in"),
      cu("q2", "pump.out", "tp2.a"),
      cu("q3", "tp1.c", "pump2.in"),
      cu("q4", "pump2.out", "tp2.b"),
      { ...cu("p7", "tp2.c", "hp.return"), lengthM: 5 },
    );
    const [f, ...rest] = findingsOf(d);
    expect(rest).toEqual([]);
    expect(f).toMatchObject({ severity: "warning" });
    expect(f!.refs.slice().sort()).toEqual(["pump", "pump2"]);
    const m = /^(pump2?): not on the index circuit's path through (pump2?), so in parallel with it or beside it; pumps on one side are sized as in series \(heads added\), so this heating duty and the flows through \1 are not reliable\. Draw pumps in parallel as one pump with their combined curve$/.exec(f!.message);
    expect(m).not.toBeNull();
    expect(m![1]).not.toBe(m![2]); // the pump beside, then the one the index circuit passes
  });

  it("three pumps side by side: the two beside the index circuit's pump are named together, comma-separated", () => {
    // tp1 ─ pump ─ tp2 as above, and tp1 ─ pump2 ─ tp2, tq1 ─ pump3 ─ tq2 with tq1/tq2 on the pump2 legs
    const d = smallSystem();
    const curve = () => SERIES_PUMP_CURVE.map(([q, h]) => [q, h]);
    d.parts.push({ id: "tp1", type: "tee" }, { id: "tp2", type: "tee" }, { id: "tq1", type: "tee" }, { id: "tq2", type: "tee" });
    d.parts.push({ id: "pump2", type: "pump", props: { curve: curve() } }, { id: "pump3", type: "pump", props: { curve: curve() } });
    const cu = (id: string, from: string, to: string) => ({ id, from, to, material: "copper", size: "22", lengthM: 0.3 });
    d.pipes = d.pipes.filter((p) => p.id !== "p6c" && p.id !== "p7");
    d.pipes.push(
      { ...cu("p6c", "ts.b", "tp1.a"), lengthM: 0.5 },
      cu("q1", "tp1.b", "pump.in"), cu("q2", "pump.out", "tp2.a"),
      cu("q3", "tp1.c", "tq1.a"), cu("q3a", "tq1.b", "pump2.in"), cu("q4", "pump2.out", "tq2.a"), cu("q4a", "tq2.b", "tp2.b"),
      cu("q5", "tq1.c", "pump3.in"), cu("q6", "pump3.out", "tq2.c"),
      { ...cu("p7", "tp2.c", "hp.return"), lengthM: 5 },
    );
    const [f, ...rest] = findingsOf(d);
    expect(rest).toEqual([]);
    const m = /^(\w+), (\w+): not on the index circuit's path through (\w+), so .* and the flows through (\w+), (\w+) are not reliable\./.exec(f!.message);
    expect(m).not.toBeNull();
    expect([m![1], m![2], m![3]].sort()).toEqual(["pump", "pump2", "pump3"]);
    expect([m![4], m![5]]).toEqual([m![1], m![2]]);
  });

  it("two pumps in series, and a single pump, get no such finding", () => {
    expect(findingsOf(withPumpInSeries())).toEqual([]);
    expect(findingsOf(smallSystem())).toEqual([]);
  });
});
