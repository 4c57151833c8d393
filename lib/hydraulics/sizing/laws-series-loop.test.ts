/**
 * The law each part puts on its link, seen through one series loop worked out by hand:
 * heat pump (own pump on its curve, heat exchanger Kv 5) → 5 m Cu 22 → device → load →
 * 5 m Cu 22 → back. Simulated (the schematic's own scenario), the flow is where the pump
 * curve meets the loop's losses: curve(Q) = Σ Kv drops (IEC 60534-1: Δp = (Q/Kv)² bar ·
 * ρ/1000) + pipe drops (Darcy–Weisbach with Colebrook). A device drawn backwards passes
 * the same flow (valves, strainers, meters are two-way), except a check valve, which
 * shuts. Water at the 40 °C mean of 45/35 °C (IAPWS, references §1.1).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { bisect, copperDpKpa, curveHeadKpa, kvDpKpa, pipeFlow, WATER } from "@/lib/hydraulics/testing/hand-calc";

const W = WATER[40];
const CURVE: [number, number][] = [[0, 50], [1, 40], [2, 0]];

interface Loop {
  device?: { type: string; props: Record<string, unknown> };
  reversed?: boolean;
  load?: { id: string; type: string; props: Record<string, unknown> };
  mode?: "heating" | "hot-water";
  curve?: [number, number][];
}
function loopDoc(o: Loop) {
  const cu = (id: string, from: string, to: string) => ({ id, from, to, material: "copper", size: "22", lengthM: 5 });
  const load = o.load ?? { id: "r1", type: "radiator", props: { outputAtDt50W: 4000, heatLoadW: 1500, valveKv: 4 } };
  const [i, x] = o.load?.type === "cylinder" ? ["coilFlow", "coilReturn"] : ["flow", "return"];
  const parts: unknown[] = [
    { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, kv: 5, waterVolumeL: 2, pumpCurve: o.curve ?? CURVE } },
    load,
    { id: "ev", type: "expansion-vessel", props: { volumeL: 8 } },
    { id: "t", type: "tee" },
  ];
  const pipes = [cu("r", `${load.id}.${x}`, "t.a"), cu("r2", "t.b", "hp.return"), { ...cu("v", "t.c", "ev.connection"), size: "15", lengthM: 0.5 }];
  if (o.device) {
    parts.push({ id: "d", ...o.device });
    const [a, b] = o.reversed ? ["b", "a"] : ["a", "b"];
    pipes.push(cu("f", "hp.flow", `d.${a}`), { ...cu("f2", `d.${b}`, `${load.id}.${i}`), lengthM: 0.5 });
  } else pipes.push({ ...cu("f", "hp.flow", `${load.id}.${i}`), lengthM: 5.5 });
  return {
    format: "loopwright/schematic", version: 1, name: "series loop", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 1000 },
    parts,
    pipes,
    scenarios: [{ name: "run", mode: o.mode ?? "heating", valves: {} }],
  };
}
function run(o: Loop) {
  const out = calculate(loopDoc(o));
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
const flowOf = (r: ReturnType<typeof run>) => r.scenarios[0]!.heatSourceFlowM3h!;

/** Hand: heat exchanger Kv 5, 15.5 m Cu 22 in series (f + f2 = 5.5 m, r and r2 5 m each), plus the device and load. */
const mains = (q: number) => kvDpKpa(q, 5, W.rho) + copperDpKpa(q, "22", 15.5, W);
const operatingPoint = (extra: (q: number) => number) => bisect((q) => curveHeadKpa(CURVE, q) - mains(q) - extra(q), 0.01, 1.99);
// ±0.5 %: the engine's operating point against the hand bisection (Colebrook both sides, solver accuracy 1e-5)
const near = (got: number, want: number) => expect(Math.abs(got / want - 1)).toBeLessThan(5e-3);

const devices: [string, string][] = [
  ["balancing-valve", "kv"],
  ["isolation-valve", "kv"],
  ["strainer", "kv"],
  ["magnetic-filter", "kv"],
  ["heat-meter", "kv"],
  ["zone-valve", "kvs"],
];

describe("a two-port device's Kv is in series with the loop, both ways round", () => {
  for (const [type, field] of devices) {
    it(`${type} Kv 1.2: the flow meets the pump curve with (Q/1.2)² bar added, drawn either way`, () => {
      const want = operatingPoint((q) => kvDpKpa(q, 1.2, W.rho) + kvDpKpa(q, 4, W.rho));
      const without = operatingPoint((q) => kvDpKpa(q, 4, W.rho));
      expect(without / want).toBeGreaterThan(1.05); // the device's drop moves the point: a zero-loss device would show
      near(flowOf(run({ device: { type, props: { [field]: 1.2 } } })), want);
      near(flowOf(run({ device: { type, props: { [field]: 1.2 } }, reversed: true })), want);
    });
  }

  it("a check valve passes forward with its Kv drop and shuts backwards (no flow anywhere)", () => {
    const want = operatingPoint((q) => kvDpKpa(q, 1.2, W.rho) + kvDpKpa(q, 4, W.rho));
    near(flowOf(run({ device: { type: "check-valve", props: { kv: 1.2 } } })), want);
    const back = run({ device: { type: "check-valve", props: { kv: 1.2 } }, reversed: true });
    expect(back.scenarios[0]!.heatSourceFlowM3h).toBe(0);
  });

  it("a zone valve drawn shut cuts the loop at design and passes nothing simulated; opened by the scenario it passes its Kvs flow", () => {
    const doc = loopDoc({ device: { type: "zone-valve", props: { kvs: 1.2, open: false } } });
    const shut = calculate(doc);
    if (!shut.ok) throw new Error("refused");
    expect(shut.results.scenarios[0]!.heatSourceFlowM3h).toBe(0);
    // at design the shut valve cuts the loop: the radiator has no return path, and the valve is reported shut
    expect(shut.results.findings.filter((f) => f.code === "load.no-return-path").map((f) => f.refs)).toEqual([["r1"]]);
    expect(shut.results.findings.some((f) => f.code === "valve.shut" && f.refs.includes("d"))).toBe(true);
    const opened = calculate({ ...doc, scenarios: [{ name: "run", mode: "heating", valves: { d: true } }] });
    if (!opened.ok) throw new Error("refused");
    near(opened.results.scenarios[0]!.heatSourceFlowM3h!, operatingPoint((q) => kvDpKpa(q, 1.2, W.rho) + kvDpKpa(q, 4, W.rho)));
  });

  it("an isolation valve drawn shut cuts the loop at design (the load has no return path) and passes nothing simulated", () => {
    const r = run({ device: { type: "isolation-valve", props: { kv: 1.2, open: false } } });
    expect(r.findings.some((f) => f.code === "load.no-return-path" && f.refs.includes("r1"))).toBe(true);
    expect(r.scenarios[0]!.heatSourceFlowM3h).toBe(0);
  });
});

describe("a load's own resistance is in series with the loop", () => {
  it("fan coil Kv 1.2", () => {
    near(flowOf(run({ load: { id: "fc", type: "fan-coil", props: { heatLoadW: 1500, kv: 1.2 } } })), operatingPoint((q) => kvDpKpa(q, 1.2, W.rho)));
  });
  it("heat load Kv 1.2", () => {
    near(flowOf(run({ load: { id: "hl", type: "heat-load", props: { heatLoadW: 1500, kv: 1.2 } } })), operatingPoint((q) => kvDpKpa(q, 1.2, W.rho)));
  });
  it("radiator valve Kv 1.2", () => {
    near(flowOf(run({ load: { id: "r1", type: "radiator", props: { outputAtDt50W: 4000, heatLoadW: 1500, valveKv: 1.2 } } })), operatingPoint((q) => kvDpKpa(q, 1.2, W.rho)));
  });
  it("cylinder coil Kv 1.2 (hot-water scenario)", () => {
    const r = run({ mode: "hot-water", load: { id: "cyl", type: "cylinder", props: { coilKv: 1.2, coilOutputKw: 5 } } });
    near(flowOf(r), operatingPoint((q) => kvDpKpa(q, 1.2, W.rho)));
  });
  it("UFH loop 60 m of 12 mm PE-X (ε 0.007 mm, DIN 1988-300): simulated flow and design loop drop", () => {
    const loop = (q: number) => pipeFlow(q, 12, 0.007, 60, W).dpKpa;
    const r = run({ load: { id: "u", type: "ufh-loop", props: { heatLoadW: 1500, loopLengthM: 60, innerDiameterMm: 12 } } });
    near(flowOf(r), operatingPoint(loop));
    // design: the loop's drop at its design flow Q = Φ/(ρ·cp·ΔT) = 1500 W / (ρ cp 10 K)
    const q = (1500 / (W.rho * W.cp * 10)) * 3600;
    const part = r.modes[0]!.parts.find((p) => p.id === "u")!;
    near(part.pressureDropKpa!, loop(q));
    near(r.modes[0]!.circuits[0]!.pressureDropKpa!, loop(q) + mains(q));
  });
});

describe("which pump curves the heat pump runs on", () => {
  it("a curve whose head rises at first (30 → 35 kPa) is still run on: the flow meets it where the loop's losses do", () => {
    const rising: [number, number][] = [[0, 30], [0.5, 35], [2, 0]];
    const r = run({ curve: rising });
    const want = bisect((q) => curveHeadKpa(rising, q) - mains(q) - kvDpKpa(q, 4, W.rho), 0.6, 1.99);
    near(flowOf(r), want);
    expect(r.findings.some((f) => f.code === "pump.curve-rising")).toBe(true);
  });

  it("a curve whose flows do not increase cannot be read: no head, no flow, and the calculation still answers", () => {
    const r = run({ curve: [[0, 40], [1, 30], [1, 10]] });
    expect(r.scenarios[0]!.heatSourceFlowM3h).toBe(0);
    expect(r.modes[0]!.heatSourceFlowM3h).toBeGreaterThan(0); // design flows follow the load, pump or not
  });
});
