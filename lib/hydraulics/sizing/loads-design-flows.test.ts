/**
 * Design loads and their flows q = P/(ρ·cp·ΔT) (defining equation; water ρ, cp at the 40 °C
 * mean of 45/35 °C from the hand-calc WATER table, IAPWS-95): each kind of load, its own ΔT,
 * a cylinder coil as a heating zone when no diverter serves it, the hot-water mode (the coil
 * takes the source's rated output), the header's primary pass (the source's rated output at
 * the design ΔT), and the loads that get no flow.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { flowM3h, WATER } from "@/lib/hydraulics/testing/hand-calc";
import { teeChain } from "@/lib/hydraulics/testing/tee-chain";

type Props = Record<string, unknown>;
const cu = (id: string, from: string, to: string, lengthM = 2) => ({ id, from, to, material: "copper", size: "22", lengthM });
const DESIGN = { flowTemperatureC: 45, returnTemperatureC: 35, maxFlowTemperatureC: 65, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 500 };
const PUMP = [[0, 60], [1, 50], [2, 0]];
const W40 = WATER[40];

function run(d: unknown) {
  const out = calculate(d);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
const mode = (r: ReturnType<typeof run>, m: "heating" | "hot-water") => r.modes.find((x) => x.mode === m)!;
const partFlow = (r: ReturnType<typeof run>, m: "heating" | "hot-water", id: string) => mode(r, m).parts.find((p) => p.id === id)?.flowM3h ?? null;
// ρ·cp of the engine's water at 40 °C against the table: ±0.1 %
const near = (got: number | null, want: number) => expect(Math.abs(got! / want - 1)).toBeLessThan(1e-3);

/** heat pump → tee chain → loads in parallel → back. */
function parallel(loads: { id: string; type: string; props: Props }[], design: Props = {}, fluid: Props = { kind: "water" }) {
  const hp = { id: "hp", type: "heat-pump", props: { ratedOutputKw: 8, kv: 4, waterVolumeL: 20, pumpCurve: PUMP } };
  const chain = teeChain(loads, cu);
  return { format: "loopwright/schematic", version: 1, name: "loads", fluid, design: { ...DESIGN, ...design }, parts: [hp, ...chain.parts], pipes: chain.pipes };
}

describe("heating: each kind of load gets q = P/(ρ·cp·ΔT)", () => {
  it("UFH 700 W, fan coil 900 W, heat load 400 W at ΔT 10 K; a radiator with its own ΔT 5 K carries 800 W at twice the flow per watt", () => {
    const r = run(parallel([
      { id: "u", type: "ufh-loop", props: { heatLoadW: 700 } },
      { id: "fc", type: "fan-coil", props: { heatLoadW: 900, kv: 2 } },
      { id: "hl", type: "heat-load", props: { heatLoadW: 400, kv: 2 } },
      { id: "r1", type: "radiator", props: { outputAtDt50W: 3000, heatLoadW: 800, valveKv: 1, waterVolumeL: 5, deltaTK: 5 } },
    ]));
    // 700 W / (992.2 kg/m³ · 4179 J/kgK · 10 K) · 3600 = 0.06078 m³/h
    expect(flowM3h(700, 10, W40)).toBeCloseTo(0.0608, 4);
    near(partFlow(r, "heating", "u"), flowM3h(700, 10, W40));
    near(partFlow(r, "heating", "fc"), flowM3h(900, 10, W40));
    near(partFlow(r, "heating", "hl"), flowM3h(400, 10, W40));
    near(partFlow(r, "heating", "r1"), flowM3h(800, 5, W40));
    near(mode(r, "heating").heatSourceFlowM3h, flowM3h(700 + 900 + 400, 10, W40) + flowM3h(800, 5, W40));
  });

  it("a load of 0 W gets no flow and no circuit", () => {
    const r = run(parallel([
      { id: "hl", type: "heat-load", props: { heatLoadW: 400, kv: 2 } },
      { id: "hz", type: "heat-load", props: { heatLoadW: 0, kv: 2 } },
    ]));
    expect(partFlow(r, "heating", "hz") ?? 0).toBe(0);
    expect(mode(r, "heating").circuits.map((c) => c.load)).toEqual(["hl"]);
    near(mode(r, "heating").heatSourceFlowM3h, flowM3h(400, 10, W40));
  });

  it("a radiator with no heat load and no output (return 15 °C in a 20 °C room): load.no-heat-load saying so, no flow", () => {
    const r = run(parallel([
      { id: "hl", type: "heat-load", props: { heatLoadW: 400, kv: 2 } },
      { id: "r1", type: "radiator", props: { outputAtDt50W: 3000, heatLoadW: null, valveKv: 1, waterVolumeL: 5, deltaTK: 30 } },
    ]));
    const f = r.findings.filter((x) => x.code === "load.no-heat-load");
    expect(f.map((x) => [x.severity, x.refs, x.message])).toEqual([
      ["warning", ["r1"], "radiator r1: no heat load and no output at the design temperatures, so it gets no design flow"],
    ]);
    expect(partFlow(r, "heating", "r1") ?? 0).toBe(0);
  });

  it("a fluid with no properties at the design temperatures (glycol above its table): no design loads, no crash", () => {
    const out = calculate(parallel([{ id: "hl", type: "heat-load", props: { heatLoadW: 400, kv: 2 } }], { flowTemperatureC: 105, returnTemperatureC: 100, maxFlowTemperatureC: null }, { kind: "propylene-glycol", percentByVolume: 30 }));
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.results.findings.map((f) => f.code)).toContain("fluid.out-of-range");
  });
});

describe("cylinder coil: a heating zone without a diverter, the whole source in hot-water mode", () => {
  /** source → (diverter: a → heat load, b → cylinder coil) or, without a diverter, both in parallel from a tee. */
  function plant(diverter: boolean, source: { type: string; kw: number } = { type: "heat-pump", kw: 6 }) {
    const parts: unknown[] = [
      { id: "src", type: source.type, props: { ratedOutputKw: source.kw, kv: 4, waterVolumeL: 10, pumpCurve: PUMP } },
      { id: "hl", type: "heat-load", props: { heatLoadW: 2000, kv: 2, waterVolumeL: 10 } },
      { id: "tr", type: "tee" },
      { id: "cyl", type: "cylinder", props: { volumeL: 200, coilKv: 3, coilOutputKw: 3, coldWaterC: 10, storeTemperatureC: 60, coilWaterVolumeL: 0 } },
      diverter ? { id: "dv", type: "diverter-valve", props: { kvs: 6, position: "a" } } : { id: "tf", type: "tee" },
    ];
    const split = diverter ? ["dv.ab", "dv.a", "dv.b"] : ["tf.a", "tf.b", "tf.c"];
    const pipes = [cu("f0", "src.flow", split[0]!), cu("f", split[1]!, "hl.flow"), cu("r", "hl.return", "tr.a"),
      cu("c1", split[2]!, "cyl.coilFlow"), cu("c2", "cyl.coilReturn", "tr.b"), cu("r0", "tr.c", "src.return")];
    return run({ format: "loopwright/schematic", version: 1, name: "plant", fluid: { kind: "water" }, design: DESIGN, parts, pipes });
  }

  it("no diverter: the coil is a 3 kW heating zone beside the 2 kW load", () => {
    const r = plant(false);
    near(partFlow(r, "heating", "cyl"), flowM3h(3000, 10, W40));
    near(partFlow(r, "heating", "hl"), flowM3h(2000, 10, W40));
    near(mode(r, "heating").heatSourceFlowM3h, flowM3h(5000, 10, W40));
  });

  it("with a diverter: heating serves the load alone; hot water sends the source's rated 6 kW through the coil", () => {
    const r = plant(true);
    near(mode(r, "heating").heatSourceFlowM3h, flowM3h(2000, 10, W40));
    expect(partFlow(r, "heating", "cyl") ?? 0).toBe(0);
    near(partFlow(r, "hot-water", "cyl"), flowM3h(6000, 10, W40));
    expect(partFlow(r, "hot-water", "hl") ?? 0).toBe(0);
    near(mode(r, "hot-water").heatSourceFlowM3h, flowM3h(6000, 10, W40));
  });

  it("a boiler's rating is the hot-water load too (4 kW boiler → 4 kW through the coil)", () => {
    near(partFlow(plant(true, { type: "boiler", kw: 4 }), "hot-water", "cyl"), flowM3h(4000, 10, W40));
  });
});

describe("header primary pass: the source's rated output at the design ΔT", () => {
  /** source → header p1/p2 (primary); secondary p3 → pump → load → p4; optionally a diverter to a cylinder on the primary. */
  function headed(type: string, opts: { cylinder?: boolean; design?: Props } = {}) {
    const parts: unknown[] = [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, kv: 4, waterVolumeL: 10, pumpCurve: PUMP } },
      { id: "h", type, props: { volumeL: 20 } },
      { id: "pu", type: "pump", props: { curve: PUMP } },
      { id: "hl", type: "heat-load", props: { heatLoadW: 3000, kv: 2, waterVolumeL: 10 } },
    ];
    const pipes = [cu("a", "hp.flow", "h.p1"), cu("b", "h.p2", "hp.return"), cu("c", "h.p3", "pu.in"), cu("d", "pu.out", "hl.flow"), cu("e", "hl.return", "h.p4")];
    if (opts.cylinder) {
      parts.push({ id: "dv", type: "diverter-valve", props: { kvs: 6, position: "a" } }, { id: "tr", type: "tee" },
        { id: "cyl", type: "cylinder", props: { volumeL: 150, coilKv: 3, coilOutputKw: 8, coldWaterC: 10, storeTemperatureC: 60, coilWaterVolumeL: 0 } });
      pipes.splice(0, 2, cu("a0", "hp.flow", "dv.ab"), cu("a", "dv.a", "h.p1"), cu("b", "h.p2", "tr.a"), cu("b0", "tr.c", "hp.return"),
        cu("c1", "dv.b", "cyl.coilFlow"), cu("c2", "cyl.coilReturn", "tr.b"));
    }
    return run({ format: "loopwright/schematic", version: 1, name: "headed", fluid: { kind: "water" }, design: { ...DESIGN, ...opts.design }, parts, pipes });
  }

  for (const type of ["low-loss-header", "buffer-vessel"]) {
    it(`${type}: heat pump flow 5 kW/(ρ·cp·10 K) on the primary, the 3 kW load's flow on the secondary`, () => {
      const r = headed(type);
      expect(flowM3h(5000, 10, W40)).toBeCloseTo(0.4341, 4);
      near(mode(r, "heating").heatSourceFlowM3h, flowM3h(5000, 10, W40));
      near(partFlow(r, "heating", "hp"), flowM3h(5000, 10, W40));
      near(partFlow(r, "heating", "hl"), flowM3h(3000, 10, W40));
    });
  }

  it("hot-water mode: the primary pass takes no load, the coil takes the rated 5 kW", () => {
    const r = headed("low-loss-header", { cylinder: true });
    near(mode(r, "heating").heatSourceFlowM3h, flowM3h(5000, 10, W40));
    near(mode(r, "hot-water").heatSourceFlowM3h, flowM3h(5000, 10, W40));
    near(partFlow(r, "hot-water", "cyl"), flowM3h(5000, 10, W40));
  });

  it("no design ΔT (flow = return): no design flows at all, no crash", () => {
    const r = headed("low-loss-header", { design: { returnTemperatureC: 45 } });
    expect(r.findings.map((f) => f.code)).toContain("input.delta-t");
    for (const m of r.modes) for (const p of m.parts) expect(p.flowM3h === null || p.flowM3h === 0).toBe(true);
  });
});
