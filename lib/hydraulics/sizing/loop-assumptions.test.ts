/**
 * Issue 15, "marks every number that depends on it": a design flow rests on an assumed
 * resistance only where a loop splits it. On a tree the flows follow the loads by
 * continuity, whatever the resistances; beside a loop the split follows them.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { smallSystem, type SmallSystem } from "@/lib/hydraulics/testing/small-system";
import type { Results } from "@/lib/schematic/results";

function run(change: (d: SmallSystem) => void): Results {
  const d = smallSystem();
  change(d);
  const out = calculate(d);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
const heating = (r: Results) => r.modes.find((m) => m.mode === "heating")!;
const pipeOf = (r: Results, id: string) => heating(r).pipes.find((p) => p.id === id)!;

/** The return main p6a split into two parallel runs, one through an isolation valve of Kv `kv` (null: assumed). */
function withParallelReturn(kv: number | null) {
  return (d: SmallSystem) => {
    d.parts.push({ id: "ta", type: "tee" }, { id: "tb", type: "tee" }, { id: "iv", type: "isolation-valve", props: { kv } });
    d.pipes = d.pipes.filter((p) => p.id !== "p6a");
    const pipe = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
    d.pipes.push(pipe("p6a", "tr.c", "ta.a", 1), pipe("p6x", "ta.b", "tb.a", 3), pipe("p6y", "ta.c", "iv.a", 1),
      pipe("p6z", "iv.b", "tb.b", 1), pipe("p6w", "tb.c", "te.a", 1));
  };
}

describe("pipe flows resting on assumed resistances", () => {
  it("on a tree no pipe's flow rests on an assumption, though one is made (r1's valve Kv)", () => {
    const r = run((d) => delete d.parts.find((p) => p.id === "r1")!.props!.valveKv);
    expect(r.assumptions.map((a) => a.ref)).toContain("r1.valveKv");
    for (const p of heating(r).pipes) expect(p.restsOn, p.id).toEqual([]);
    // the circuit through r1 does rest on it (its drop uses that Kv)
    expect(heating(r).circuits.find((c) => c.load === "r1")!.restsOn).toContain("r1.valveKv");
  });

  it("beside a loop every flow rests on the assumed Kv, and the split really moves with it", () => {
    const assumed = run(withParallelReturn(null));
    const ref = assumed.assumptions.find((a) => a.part === "iv")!.ref;
    for (const id of ["p6x", "p6y", "p6z", "p1"]) expect(pipeOf(assumed, id).restsOn, id).toContain(ref);
    expect(heating(assumed).parts.find((p) => p.id === "iv")!.restsOn).toContain(ref);
    // the two runs carry the whole return flow between them (continuity) …
    const total = pipeOf(assumed, "p6a").flowM3h!;
    expect(pipeOf(assumed, "p6x").flowM3h! + pipeOf(assumed, "p6y").flowM3h!).toBeCloseTo(total, 9);
    // … and how they share it follows the valve's Kv: a nearly shut valve sends almost all through p6x
    const throttled = run(withParallelReturn(0.05));
    expect(pipeOf(throttled, "p6y").flowM3h!).toBeLessThan(0.5 * pipeOf(assumed, "p6y").flowM3h!);
    for (const p of heating(throttled).pipes) expect(p.restsOn.filter((x) => x.startsWith("iv.")), p.id).toEqual([]);
  });
});
