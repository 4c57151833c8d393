/**
 * Design mode's paths: a load whose outlet has no way back to its inlet gets no flow
 * and an error naming it; a header whose primary ports are not joined through the heat
 * source gets a warning instead; and where the open links close a loop, the design
 * flows (split by resistances) rest on every assumed resistance, while a tree's flows
 * follow from continuity alone. Flows are worked out here: Q = Φ/(ρ·cp·ΔT) with water
 * at the 40 °C mean of 45/35 °C (testing/hand-calc.ts WATER, references §1.1).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { flowM3h, kvDpKpa, WATER } from "@/lib/hydraulics/testing/hand-calc";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";
import type { Results } from "@/lib/schematic/results";

type Doc = ReturnType<typeof smallSystem>;
const part = (id: string, type: string, props: Record<string, unknown> = {}) => ({ id, type, props });
const cu = (id: string, from: string, to: string, lengthM: number, size = "22") => ({ id, from, to, material: "copper", size, lengthM });
const w40 = WATER[40];

function run(d: unknown): Results {
  const out = calculate(d);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
const heating = (r: Results) => r.modes.find((m) => m.mode === "heating")!;
const flowOf = (r: Results, id: string) => heating(r).pipes.find((p) => p.id === id)!.flowM3h;
const withCode = (r: Results, code: string) => r.findings.filter((f) => f.code === code);

/** The small system at 45/35 °C (flow of r1 1000 W, r2 500 W). */
function small(): Doc {
  const d = smallSystem();
  d.design = { ...d.design, flowTemperatureC: 45, returnTemperatureC: 35 };
  return d;
}

describe("a load with no path back", () => {
  it("r2's return unpiped → load.no-return-path (error) naming r2 and the mode; r1 keeps its design flow, r2's branch none", () => {
    const d = small();
    d.pipes = d.pipes.filter((p) => p.id !== "p5");
    const r = run(d);
    expect(withCode(r, "load.no-return-path").map((f) => [f.severity, f.message, f.refs])).toEqual([
      ["error", "r2: no path from its outlet back to its inlet in heating mode (unconnected port or shut valve), so it gets no flow", ["r2"]],
    ]);
    expect(withCode(r, "header.primary-unconnected")).toEqual([]);
    const q1 = flowM3h(1000, 10, w40); // 0.08681 m³/h
    expect(Math.abs(flowOf(r, "p2")! / q1 - 1)).toBeLessThan(2e-4); // engine ρ, cp vs the IAPWS-95 table: ≤ 0.01 %
    expect(Math.abs(flowOf(r, "p1")! / q1 - 1)).toBeLessThan(2e-4); // the heat source carries r1 alone
    expect(flowOf(r, "p3")).toBe(0);
  });

  it("every load piped back: no load.no-return-path", () => {
    expect(withCode(run(small()), "load.no-return-path")).toEqual([]);
  });
});

/**
 * Heat pump (3 kW, own pump) → low-loss header p1/p2; secondary p3 → pump → r1, r2 in
 * parallel → p4. `primaryJoined: false` leaves p2 unpiped; `loop` adds a second path
 * beside the radiators (a balancing valve between a flow tee and a return tee), a loop
 * on the secondary side only; r1 has no valve Kv, so the typical one is assumed.
 */
function headerDoc(primaryJoined: boolean, loop: boolean) {
  const d = small() as unknown as Record<string, unknown> & { pipes: ReturnType<typeof cu>[]; parts: ReturnType<typeof part>[] };
  d.parts = [
    part("hp", "heat-pump", { ratedOutputKw: 3, minFlowM3h: 0.1, kv: 4, waterVolumeL: 2, pumpCurve: [[0, 40], [1, 30], [2, 0]] }),
    part("llh", "low-loss-header"),
    part("pump", "pump", { curve: [[0, 40], [0.5, 35], [1, 25], [1.5, 10]] }),
    part("tf", "tee"), part("tr", "tee"), part("te", "tee"),
    part("r1", "radiator", { outputAtDt50W: 3000, heatLoadW: 1000, waterVolumeL: 6 }),
    part("r2", "radiator", { outputAtDt50W: 1500, heatLoadW: 500, valveKv: 1, waterVolumeL: 3 }),
    part("ev", "expansion-vessel", { volumeL: 8 }),
  ];
  d.pipes = [
    cu("a1", "hp.flow", "llh.p1", 2),
    ...(primaryJoined ? [cu("a2", "llh.p2", "te.a", 1)] : []),
    cu("a3", "te.b", "hp.return", 1),
    cu("pev", "te.c", "ev.connection", 0.5, "15"),
    cu("s1", "llh.p3", "pump.in", 1),
    cu("s3", "tf.b", "r1.flow", 3, "15"), cu("s4", "tf.c", "r2.flow", 8, "15"),
    cu("s5", "r1.return", "tr.a", 3, "15"), cu("s6", "r2.return", "tr.b", 8, "15"),
  ];
  if (loop) {
    d.parts.push(part("bv", "balancing-valve", { kv: 0.2 }), part("tf2", "tee"), part("tr2", "tee"));
    d.pipes.push(cu("s2", "pump.out", "tf2.a", 1), cu("s2b", "tf2.b", "tf.a", 2), cu("s7", "tr.c", "tr2.a", 2), cu("s7b", "tr2.b", "llh.p4", 1), cu("y1", "tf2.c", "bv.a", 1, "15"), cu("y2", "bv.b", "tr2.c", 1, "15"));
  } else {
    d.pipes.push(cu("s2", "pump.out", "tf.a", 3), cu("s7", "tr.c", "llh.p4", 3));
  }
  return d;
}

describe("a header's primary pass", () => {
  it("p2 unpiped → header.primary-unconnected (warning) naming the header and mode, not a load error; the secondary still sized", () => {
    const r = run(headerDoc(false, false));
    expect(withCode(r, "header.primary-unconnected").map((f) => [f.severity, f.message, f.refs])).toEqual([
      ["warning", "llh: ports p1 and p2 are not joined through the heat source, so no primary flow is sized (heating mode)", ["llh"]],
    ]);
    expect(withCode(r, "load.no-return-path")).toEqual([]);
    expect(flowOf(r, "a1")).toBe(0);
    expect(Math.abs(flowOf(r, "s2")! / flowM3h(1500, 10, w40) - 1)).toBeLessThan(2e-4);
  });

  it("p1 and p2 joined through the heat source: the primary carries the rated 3 kW at ΔT 10 K, no header finding", () => {
    const r = run(headerDoc(true, false));
    expect(withCode(r, "header.primary-unconnected")).toEqual([]);
    expect(Math.abs(flowOf(r, "a1")! / flowM3h(3000, 10, w40) - 1)).toBeLessThan(2e-4); // 0.2604 m³/h
  });

  it("the heat source's own pump lies on no loop (every loop through it passes the header's cut primary pass): its drop is its Kv drop alone", () => {
    // Δp = 100·(Q/Kv)²·ρ/1000 kPa (Kv definition, IEC 60534-1, references §6): Q = 0.2604 m³/h, Kv 4 → 0.4205 kPa; no pump head mixed in
    const r = run(headerDoc(true, false));
    const hp = heating(r).parts.find((p) => p.id === "hp")!;
    const q = flowM3h(3000, 10, w40);
    expect(Math.abs(hp.pressureDropKpa! / kvDpKpa(q, 4, w40.rho) - 1)).toBeLessThan(5e-4); // Q² → twice the flow's 0.02 %
  });
});

describe("design flows rest on the assumed resistances only where loops split them", () => {
  // Cyclomatic number links − nodes + pieces (Harary, Graph Theory, 1969, Thm 4.5) of the
  // links open in design (loads and the header's primary pass cut): the primary side is a
  // tree, the secondary a tree too (0 + 0) or, with the second path, one loop (0 + 1).
  it("two trees (primary and secondary): no pipe flow rests on r1's assumed Kv", () => {
    const r = run(headerDoc(true, false));
    expect(withCode(r, "input.assumed-values").map((f) => f.refs)).toEqual([["r1"]]);
    for (const p of heating(r).pipes) expect([p.id, p.restsOn]).toEqual([p.id, []]);
  });

  it("a tree beside a loop (two pieces, one loop): every flowing pipe's flow rests on r1's assumed Kv", () => {
    const r = run(headerDoc(true, true));
    const flowing = heating(r).pipes.filter((p) => p.flowM3h !== 0);
    expect(flowing.map((p) => p.id).sort()).toEqual(["a1", "a2", "a3", "s1", "s2", "s2b", "s3", "s4", "s5", "s6", "s7", "s7b", "y1", "y2"]);
    for (const p of flowing) expect([p.id, p.restsOn]).toEqual([p.id, ["r1.valveKv"]]);
  });
});

describe("design.not-converged only when the design solve does not converge", () => {
  // A tree is one linear step (continuity) and this loop splits by smooth Darcy/Kv laws: both converge
  it.each([
    ["a tree", () => small()],
    ["a tree beside a loop", () => headerDoc(true, true)],
  ])("%s: no design.not-converged", (_, make) => {
    expect(withCode(run(make()), "design.not-converged")).toEqual([]);
  });
});
