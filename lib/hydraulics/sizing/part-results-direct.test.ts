/**
 * partResults called on its own with a design solution (sizing/mode.ts runMode): flows below the
 * stated reporting tolerance NO_FLOW_M3H = 1e-5 m³/h (network/behaviour.ts: "flows below this are
 * no flow") are 0 and the tolerance itself is a flow; with no list of shared assumptions a row rests
 * only on its own assumed Kv; a pump run past its curve has no stated drop.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { Findings } from "@/lib/hydraulics/findings/finding";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";
import { parseSchematic } from "@/lib/schematic/parse";
import { createContext } from "./context";
import { runMode } from "./mode";
import { partResults } from "./part-results";

function solved(d = smallSystem()) {
  const parsed = parseSchematic(d);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  const ctx = createContext(parsed.doc, new Findings());
  const sol = runMode(ctx, "heating").solution;
  return { ctx, sol, kHp: ctx.model.linksOfPart.get("hp")![0]! };
}

describe("partResults on a design solution", () => {
  it("1e-5 m³/h is a flow; half of it is reported as 0", () => {
    const { ctx, sol, kHp } = solved();
    const q = Float64Array.from(sol.q);
    q[kHp] = 1e-5;
    expect(partResults(ctx, sol.state, sol.laws, q, sol.head).find((p) => p.id === "hp")!.flowM3h).toBe(1e-5);
    q[kHp] = 0.5e-5;
    const hp = partResults(ctx, sol.state, sol.laws, q, sol.head).find((p) => p.id === "hp")!;
    expect(hp.flowM3h).toBe(0);
    expect(hp.pressureDropKpa).toBe(0); // Kv 4 at no flow: no drop
  });

  it("without shared assumptions a part with a typed Kv rests on nothing; with them, on those", () => {
    const { ctx, sol } = solved();
    expect(partResults(ctx, sol.state, sol.laws, sol.q, sol.head).find((p) => p.id === "hp")!.restsOn).toEqual([]);
    const shared = partResults(ctx, sol.state, sol.laws, sol.q, sol.head, ["r1.valveKv"]);
    expect(shared.find((p) => p.id === "hp")!.restsOn).toEqual(["r1.valveKv"]);
  });

  it("a pump run past the end of its curve has no stated drop (no extrapolation)", () => {
    // the curve ends at 0.2 m³/h; the design flow is 1500 W at 5 K ≈ 0.26 m³/h
    const d = smallSystem();
    d.parts.find((p) => p.id === "pump")!.props = { curve: [[0, 40], [0.1, 30], [0.2, 0]] };
    const out = calculate(d);
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    const pump = out.results.modes.find((m) => m.mode === "heating")!.parts.find((p) => p.id === "pump")!;
    expect(pump.pressureDropKpa).toBeNull();
    expect(pump.flowM3h!).toBeGreaterThan(0.2); // the design flow still passes through it
  });
});
