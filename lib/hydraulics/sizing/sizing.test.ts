/**
 * Design-mode sizing of the small system (testing/small-system.ts), checked
 * against a hand calculation: flows from Q = P/(ρ·cp·ΔT), each element's Δp
 * from its own law (Darcy–Weisbach for pipes, Δp = (q/Kv)² bar·ρ/1000 for Kv
 * devices), circuit sums, index circuit and balancing Kv.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { fluidProperties } from "@/lib/hydraulics/fluids";
import { kvPressureDropPa } from "@/lib/hydraulics/losses";
import { findPipeSize, pipePressureDrop } from "@/lib/hydraulics/pipes";
import { resultsSchema, type Results } from "@/lib/schematic/results";
import { smallSystem } from "@/lib/hydraulics/testing/small-system";

function run(doc: unknown = smallSystem()): Results {
  const r = calculate(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  resultsSchema.parse(r.results);
  return r.results;
}

// Hand calculation, step by step, from the published formulas.
const water = fluidProperties({ kind: "water" }, 42.5); // mean of 45/40
const flow = (w: number) => (w / (water.densityKgM3 * water.specificHeatJkgK * 5)) * 3600; // m³/h
const kvDp = (q: number, kv: number) => kvPressureDropPa(q, kv, water.densityKgM3) / 1000; // kPa
const pipeDp = (size: string, lengthM: number, q: number) => {
  const row = findPipeSize("copper", size)!;
  return (
    pipePressureDrop({
      flowM3s: q / 3600,
      innerDiameterM: row.innerDiameterMm / 1000,
      lengthM,
      roughnessM: row.roughnessMm / 1000,
      densityKgM3: water.densityKgM3,
      kinematicViscosityM2s: water.kinematicViscosityM2s,
      sumK: 0,
    }).dpPa / 1000
  );
};
const q1 = flow(1000);
const q2 = flow(500);
const q = q1 + q2;
// Common legs: p1, p6a, p6b, p6c, p7 (22 mm) and the heat pump (Kv 4).
const common = pipeDp("22", 5, q) + pipeDp("22", 2, q) + pipeDp("22", 0.5, q) * 2 + pipeDp("22", 5, q) + kvDp(q, 4);
const circuit1 = common + pipeDp("15", 3, q1) * 2 + kvDp(q1, 1);
const circuit2 = common + pipeDp("15", 8, q2) * 2 + kvDp(q2, 1);

describe("design sizing of a two-radiator system (hand-checked)", () => {
  const r = run();
  const heating = r.modes.find((m) => m.mode === "heating")!;

  it("load flows follow Q = P/(ρ·cp·ΔT): 1000 W at 5 K ≈ 0.1738 m³/h", () => {
    expect(q1).toBeCloseTo(0.17383, 4);
    const byId = new Map(heating.parts.map((p) => [p.id, p]));
    expect(byId.get("r1")!.flowM3h).toBeCloseTo(q1, 8);
    expect(byId.get("r2")!.flowM3h).toBeCloseTo(q2, 8);
    expect(heating.heatSourceFlowM3h).toBeCloseTo(q, 8);
  });

  it("pipe flows by continuity, pressure drops by Darcy–Weisbach", () => {
    const pipes = new Map(heating.pipes.map((p) => [p.id, p]));
    expect(pipes.get("p2")!.flowM3h).toBeCloseTo(q1, 8);
    expect(pipes.get("p3")!.flowM3h).toBeCloseTo(q2, 8);
    expect(pipes.get("p1")!.flowM3h).toBeCloseTo(q, 8);
    expect(pipes.get("p3")!.pressureDropKpa).toBeCloseTo(pipeDp("15", 8, q2), 7);
    expect(Math.abs(pipes.get("pev")!.flowM3h!)).toBeLessThan(1e-9); // the vessel leg carries nothing
  });

  it("circuits: sums of their elements, the larger is the index, the other gets a balancing Kv", () => {
    const c1 = heating.circuits.find((c) => c.load === "r1")!;
    const c2 = heating.circuits.find((c) => c.load === "r2")!;
    // Hand numbers: r1 ≈ 4.786 kPa (valve 2.995 kPa dominates), r2 ≈ 2.318 kPa.
    expect(c1.pressureDropKpa).toBeCloseTo(circuit1, 6);
    expect(c2.pressureDropKpa).toBeCloseTo(circuit2, 6);
    expect(circuit1).toBeCloseTo(4.786, 2);
    expect(c1.index).toBe(true);
    expect(c2.index).toBe(false);
    expect(c2.excessKpa).toBeCloseTo(circuit1 - circuit2, 6);
    // Kv = q·√((ρ/1000)/(Δp/100 kPa)) — the valve that burns the excess at r2's flow.
    const kv = q2 * Math.sqrt(water.densityKgM3 / 1000 / ((circuit1 - circuit2) / 100));
    expect(c2.balancingKv).toBeCloseTo(kv, 6);
    expect(c1.path).toEqual(["p7", "hp", "p1", "p2", "r1", "p4", "p6a", "p6b", "p6c"]);
  });

  it("pump: required = index circuit, available read off the curve at design flow", () => {
    expect(heating.pump!.id).toBe("pump");
    expect(heating.pump!.requiredHeadKpa).toBeCloseTo(circuit1, 6);
    expect(heating.pump!.availableHeadKpa).toBeCloseTo(40 - 10 * q, 6); // first segment: 40 → 35 kPa over 0.5 m³/h
    expect(heating.pump!.ok).toBe(true);
  });

  it("expansion vessel per EN 12828 from the system volume", () => {
    const ev = r.expansionVessel!;
    // Pipes: 22 mm d_i 20.2 (13 m), 15 mm d_i 13.6 (22.8 m) + heat pump 2 L.
    const vol = (Math.PI / 4) * (20.2 ** 2 * 13 + 13.6 ** 2 * 22.8) / 1000 + 2;
    expect(ev.systemVolumeL).toBeCloseTo(vol, 6);
    expect(ev.requiredVolumeL!).toBeGreaterThan(0);
    expect(ev.ok).toBe(true);
  });

  it("emitters: EN 442 output at 45/40/20 = 0.3538 × Φ50", () => {
    const e1 = r.emitters.find((e) => e.id === "r1")!;
    expect(e1.outputAtDesignW! / 3000).toBeCloseTo(0.3538, 3);
    expect(e1.ok).toBe(true);
  });

  it("simulated 'all zones open': the pump on its curve pushes more than design, in the same split", () => {
    const s = r.scenarios.find((x) => x.name === "all zones open")!;
    expect(s.converged).toBe(true);
    expect(s.heatSourceFlowM3h!).toBeGreaterThan(q);
    const r1 = s.emitters.find((e) => e.id === "r1")!;
    expect(r1.returnTemperatureC!).toBeLessThan(45);
    expect(r1.returnTemperatureC!).toBeGreaterThan(20);
    // heat balance of the emitter: output = ṁ·cp·(45 − t_return)
    const mdot = (r1.flowM3h! / 3600) * water.densityKgM3;
    expect(r1.outputW!).toBeCloseTo(mdot * water.specificHeatJkgK * (45 - r1.returnTemperatureC!), 3);
  });
});

describe("design sizing with a fixed bypass beside the radiator (hand-checked)", () => {
  // hp.flow ─p1─ ta ─p2─ rad ─p3─ tb ─p4─ hp.return, and ta ─x1─ bv (Kv 0.5) ─x2─ tb.
  // At design the radiator takes its design flow; the bypass takes what the
  // radiator branch's Δp between the tees drives through it, from ta to tb; the
  // heat source (its own pump) carries both and must give the index circuit's Δp.
  const part = (id: string, type: string, props: Record<string, unknown> = {}) => ({ id, type, props });
  const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
  const doc = {
    ...smallSystem(),
    design: { ...smallSystem().design, flowTemperatureC: 45, returnTemperatureC: 35 },
    parts: [
      part("hp", "heat-pump", { ratedOutputKw: 5, minFlowM3h: 0, kv: 4, waterVolumeL: 2, pumpCurve: [[0, 30], [1, 22], [2, 8], [3, 0]] }),
      part("ta", "tee"),
      part("tb", "tee"),
      part("rad", "radiator", { outputAtDt50W: 8000, heatLoadW: 2000, valveKv: 1.5 }),
      part("bv", "balancing-valve", { kv: 0.5 }),
    ],
    pipes: [cu("p1", "hp.flow", "ta.a", 2), cu("p2", "ta.b", "rad.flow", 5), cu("p3", "rad.return", "tb.a", 5), cu("p4", "tb.b", "hp.return", 2), cu("x1", "ta.c", "bv.a", 0.5), cu("x2", "bv.b", "tb.c", 0.5)],
  };
  const w40 = fluidProperties({ kind: "water" }, 40);
  const kv40 = (q: number, kv: number) => kvPressureDropPa(q, kv, w40.densityKgM3) / 1000;
  const cu22 = (q: number, lengthM: number) => {
    const row = findPipeSize("copper", "22")!;
    return pipePressureDrop({ flowM3s: q / 3600, innerDiameterM: row.innerDiameterMm / 1000, lengthM, roughnessM: row.roughnessMm / 1000, densityKgM3: w40.densityKgM3, kinematicViscosityM2s: w40.kinematicViscosityM2s, sumK: 0 }).dpPa / 1000;
  };
  const qRad = (2000 / (w40.densityKgM3 * w40.specificHeatJkgK * 10)) * 3600;
  const dpTees = cu22(qRad, 10) + kv40(qRad, 1.5);
  // bypass flow: the q with cu22(q, 1 m) + Kv-drop(q, 0.5) = dpTees, by bisection
  let lo = 0, hi = 2;
  for (let i = 0; i < 100; i++) {
    const mid = (lo + hi) / 2;
    if (cu22(mid, 1) + kv40(mid, 0.5) < dpTees) lo = mid;
    else hi = mid;
  }
  const qBypass = lo;
  const results = run(doc);
  const heating = results.modes.find((m) => m.mode === "heating")!;
  const pipe = (id: string) => heating.pipes.find((p) => p.id === id)!;

  it("the bypass carries flow from the flow tee to the return tee, as the Δp across the radiator branch drives", () => {
    expect(qBypass).toBeGreaterThan(0.05); // a material flow: a backwards or zero answer cannot pass
    expect(pipe("x1").flowM3h).toBeCloseTo(qBypass, 4);
    expect(pipe("p2").flowM3h).toBeCloseTo(qRad, 6);
  });

  it("the heat source carries radiator + bypass, and its required head is the index circuit with that flow", () => {
    const total = qRad + qBypass;
    expect(heating.heatSourceFlowM3h!).toBeCloseTo(total, 4);
    const required = kv40(total, 4) + cu22(total, 4) + dpTees;
    expect(heating.pump!.requiredHeadKpa!).toBeCloseTo(required, 3);
  });
});
