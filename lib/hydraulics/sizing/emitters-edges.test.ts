/**
 * Emitter rows and the hot-water store, the cases the verdict tests leave open: no design ΔT,
 * each verdict exactly at its limit (EN 442-2 radiator output ≥ load, EN 1264-2 floor capacity
 * ≥ load), a radiator whose return would fall to the room, loads no heat source reaches, and
 * the cylinder's reheat (V·ρ·cp·ΔT/P, references §1.1) with the coil limited to the source.
 */
import { describe, expect, it } from "vitest";
import { teeChain } from "@/lib/hydraulics/testing/tee-chain";
import { calculate } from "@/lib/hydraulics/calculate";
import { en442LogW, WATER } from "@/lib/hydraulics/testing/hand-calc";

type Props = Record<string, unknown>;
const cu = (id: string, from: string, to: string, lengthM = 2) => ({ id, from, to, material: "copper", size: "22", lengthM });
const DESIGN = { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 500 };

/** heat pump → each load in parallel (flow tee chain) → back; loads given as parts with flow/return ports. */
function parallel(loads: { id: string; type: string; props: Props }[], design: Props = {}, extra: { parts?: unknown[]; pipes?: unknown[] } = {}) {
  const parts: unknown[] = [{ id: "hp", type: "heat-pump", props: { ratedOutputKw: 8, kv: 4, waterVolumeL: 20, pumpCurve: [[0, 60], [1, 50], [2, 0]] } }];
  const pipes: unknown[] = [];
  if (loads.length === 1) {
    parts.push(loads[0]);
    pipes.push(cu("f", "hp.flow", `${loads[0]!.id}.flow`), cu("ret", `${loads[0]!.id}.return`, "hp.return"));
  } else {
    const chain = teeChain(loads, cu);
    parts.push(...chain.parts);
    pipes.push(...chain.pipes);
  }
  return {
    format: "loopwright/schematic", version: 1, name: "emitter edges", fluid: { kind: "water" },
    design: { ...DESIGN, ...design },
    parts: [...parts, ...(extra.parts ?? [])],
    pipes: [...pipes, ...(extra.pipes ?? [])],
  };
}
function run(d: unknown) {
  const out = calculate(d);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
const found = (r: ReturnType<typeof run>, code: string) => r.findings.filter((f) => f.code === code);
const row = (r: ReturnType<typeof run>, id: string) => r.emitters.find((e) => e.id === id)!;
const rad = (id: string, props: Props = {}) => ({ id, type: "radiator", props: { outputAtDt50W: 2000, heatLoadW: 800, valveKv: 1, waterVolumeL: 5, ...props } });

describe("no design ΔT (flow = return): no emitter output and no verdict", () => {
  it("UFH loop, fan coil, heat load and radiator rows: output null, ok null; no emitter.no-output", () => {
    const r = run(parallel([
      { id: "u", type: "ufh-loop", props: { heatLoadW: 700, floorAreaM2: 10 } },
      { id: "fc", type: "fan-coil", props: { heatLoadW: 900, kv: 2 } },
      { id: "hl", type: "heat-load", props: { heatLoadW: 400, kv: 2 } },
      rad("r1"),
    ], { returnTemperatureC: 45 }));
    expect(found(r, "input.delta-t")).toHaveLength(1);
    expect(row(r, "u")).toEqual({ id: "u", outputAtDesignW: null, heatLoadW: 700, ok: null });
    expect(row(r, "fc")).toEqual({ id: "fc", outputAtDesignW: null, heatLoadW: 900, ok: null });
    expect(row(r, "hl")).toEqual({ id: "hl", outputAtDesignW: null, heatLoadW: 400, ok: null });
    expect(row(r, "r1")).toEqual({ id: "r1", outputAtDesignW: null, heatLoadW: 800, ok: null });
    expect(found(r, "emitter.no-output")).toEqual([]);
  });
});

describe("radiator (EN 442-2 log mean): output at design, exactly at the load, return at the room", () => {
  it("a radiator with an output: its EN 442 output, and no emitter.no-output", () => {
    const r = run(parallel([rad("r1")]));
    // Φ = 2000·(ΔT_ln/49.833)^1.3, ΔT_ln = 10/ln(25/15) = 19.576 K → 593.6 W (hand-calc en442LogW)
    const hand = en442LogW(2000, 1.3, 45, 35, 20);
    expect(hand).toBeCloseTo(593.6, 1);
    // same closed form both sides: 1e-9
    expect(Math.abs(row(r, "r1").outputAtDesignW! / hand - 1)).toBeLessThan(1e-9);
    expect(found(r, "emitter.no-output")).toEqual([]);
  });

  it("a load exactly at the output is met (ok when output ≥ load)", () => {
    const out = row(run(parallel([rad("r1")])), "r1").outputAtDesignW!;
    const r = run(parallel([rad("r1", { heatLoadW: out })]));
    expect(row(r, "r1").ok).toBe(true);
    expect(found(r, "emitter.undersized")).toEqual([]);
  });

  it("own ΔT 30 K at 45 °C flow: return 15 °C below the 20 °C room → emitter.no-output with the temperatures, output null", () => {
    const r = run(parallel([rad("r1", { deltaTK: 30 })]));
    expect(row(r, "r1")).toEqual({ id: "r1", outputAtDesignW: null, heatLoadW: 800, ok: null });
    expect(found(r, "emitter.no-output").map((f) => [f.refs, f.message])).toEqual([
      [["r1"], "r1: no EN 442 output at 45/15 °C in a 20 °C room (return must stay above the room)"],
    ]);
  });
});

describe("UFH floor capacity (EN 1264-2, q = 8.92·(θ_F,m − θ_i)^1.1): a load exactly at the capacity is met", () => {
  it("capacity of 10 m² at the 29 °C surface limit in a 20 °C room = 10·8.92·9^1.1 = 1000.1 W: that load is ok", () => {
    const hand = 10 * 8.92 * 9 ** 1.1;
    expect(hand).toBeCloseTo(1000.1, 1);
    const big = run(parallel([{ id: "u", type: "ufh-loop", props: { heatLoadW: 5000, floorAreaM2: 10 } }]));
    const cap = row(big, "u").outputAtDesignW!;
    // the engine's EN 1264 constant against the printed 8.92·Δθ^1.1: same form, 1e-9
    expect(Math.abs(cap / hand - 1)).toBeLessThan(1e-9);
    const r = run(parallel([{ id: "u", type: "ufh-loop", props: { heatLoadW: cap, floorAreaM2: 10 } }]));
    expect(row(r, "u").ok).toBe(true);
    expect(found(r, "emitter.undersized")).toEqual([]);
  });

  it("two loops without a floor area: one emitter.ufh-not-checked listing both, comma-separated", () => {
    const r = run(parallel([
      { id: "u1", type: "ufh-loop", props: { heatLoadW: 600 } },
      { id: "u2", type: "ufh-loop", props: { heatLoadW: 500 } },
    ]));
    const f = found(r, "emitter.ufh-not-checked");
    expect(f.map((x) => x.refs)).toEqual([["u1", "u2"]]);
    expect(f[0]!.message).toMatch(/^u1, u2: no floor area, so the output shown is the heat load/);
  });
});

describe("loads no heat source reaches: output 0; met only when there is no load", () => {
  it("a pumped loop of three radiators joined to no heat source: load null → ok null, 0 W → ok true, 500 W → ok false", () => {
    const d = parallel([rad("r1")], {}, {
      parts: [
        { id: "pu", type: "pump", props: { curve: [[0, 40], [1, 30], [2, 0]] } },
        rad("x1", { heatLoadW: null }), rad("x2", { heatLoadW: 0 }), rad("x3", { heatLoadW: 500 }),
      ],
      pipes: [cu("a", "pu.out", "x1.flow"), cu("b", "x1.return", "x2.flow"), cu("c", "x2.return", "x3.flow"), cu("e", "x3.return", "pu.in")],
    });
    const r = run(d);
    expect(found(r, "circuit.no-heat-source").map((f) => f.refs)).toEqual([["x1", "x2", "x3", "pu"]]);
    expect([row(r, "x1"), row(r, "x2"), row(r, "x3")]).toEqual([
      { id: "x1", outputAtDesignW: 0, heatLoadW: null, ok: null },
      { id: "x2", outputAtDesignW: 0, heatLoadW: 0, ok: true },
      { id: "x3", outputAtDesignW: 0, heatLoadW: 500, ok: false },
    ]);
    // the heated radiator keeps its EN 442 output
    expect(Math.abs(row(r, "r1").outputAtDesignW! / en442LogW(2000, 1.3, 45, 35, 20) - 1)).toBeLessThan(1e-9);
  });
});

describe("hot-water store: source limits, the field judged, the messages", () => {
  /** source (a heat pump or boiler, or none) → diverter: a → heat load, b → cylinder coil; returns teed. */
  function store(source: { type: string; kw: number } | null, cylinder: Props = {}, design: Props = {}) {
    const parts: unknown[] = [
      { id: "hl", type: "heat-load", props: { heatLoadW: 2000, kv: 2, waterVolumeL: 10 } },
      { id: "dv", type: "diverter-valve", props: { kvs: 6, position: "a" } }, { id: "tr", type: "tee" },
      { id: "cyl", type: "cylinder", props: { volumeL: 200, coilKv: 3, coilOutputKw: 10, coldWaterC: 10, storeTemperatureC: 60, coilWaterVolumeL: 0, ...cylinder } },
    ];
    const pipes = [cu("f", "dv.a", "hl.flow"), cu("r", "hl.return", "tr.a"), cu("c1", "dv.b", "cyl.coilFlow"), cu("c2", "cyl.coilReturn", "tr.b")];
    if (source) {
      parts.unshift({ id: "src", type: source.type, props: { ratedOutputKw: source.kw, kv: 4, waterVolumeL: 10, pumpCurve: [[0, 60], [1, 50], [2, 0]] } });
      pipes.push(cu("f0", "src.flow", "dv.ab"), cu("r0", "tr.c", "src.return"));
    } else {
      parts.push({ id: "pu", type: "pump", props: { curve: [[0, 60], [1, 50], [2, 0]] } });
      pipes.push(cu("f0", "pu.out", "dv.ab"), cu("r0", "tr.c", "pu.in"));
    }
    return run({ format: "loopwright/schematic", version: 1, name: "store", fluid: { kind: "water" }, design: { ...DESIGN, maxFlowTemperatureC: 65, ...design }, parts, pipes });
  }
  // reheat = 0.2 m³ · ρ·cp at the 35 °C store mean (10/60 °C, hand-calc WATER table) · 50 K / P
  const reheatAt = (kW: number) => (0.2 * WATER[35].rho * WATER[35].cp * 50) / (kW * 1000) / 60;
  // ±0.1 %: ρ·cp of water at the store mean against the table
  const near = (got: number | null, want: number) => expect(Math.abs(got! / want - 1)).toBeLessThan(1e-3);

  it("a 3 kW boiler limits the 10 kW coil: reheat 200 L 10 → 60 °C in 230.8 min (69.2 min at the full 10 kW)", () => {
    expect(reheatAt(3)).toBeCloseTo(230.8, 1);
    near(store({ type: "boiler", kw: 3 }).hotWater!.reheatMinutes, reheatAt(3));
  });
  it("a 12 kW heat pump does not raise the 10 kW coil", () => {
    near(store({ type: "heat-pump", kw: 12 }).hotWater!.reheatMinutes, reheatAt(10));
  });
  it("no heat source drawn: the reheat time is the coil's own, 10 kW", () => {
    near(store(null).hotWater!.reheatMinutes, reheatAt(10));
  });

  it("only the highest flow stated (no hot-water flow): hot-water.flow-too-cool points at design.maxFlowTemperatureC, with the numbers", () => {
    const r = store({ type: "heat-pump", kw: 6 }, { storeTemperatureC: 60 }, { maxFlowTemperatureC: 58 });
    const f = found(r, "hot-water.flow-too-cool");
    expect(f.map((x) => [x.refs, x.fields])).toEqual([[["cyl"], ["design.maxFlowTemperatureC"]]]);
    expect(f[0]!.message).toMatch(/^cyl: store set to 60 °C but the hot-water flow is 58 °C, so the coil cannot reheat it/);
    expect(r.hotWater!.reheatMinutes).toBeNull();
  });
  it("no hot-water or highest flow stated: hot-water.flow-unknown names the store temperature", () => {
    const f = found(store({ type: "heat-pump", kw: 6 }, { storeTemperatureC: 62 }, { maxFlowTemperatureC: null }), "hot-water.flow-unknown");
    expect(f[0]!.message).toMatch(/^cyl: no hot-water flow temperature stated, so the reheat time assumes the heat source can bring the store to 62 °C/);
  });
  it("store 55 °C: hot-water.store-cool names the store temperature and the 60 °C asked for", () => {
    const f = found(store({ type: "heat-pump", kw: 6 }, { storeTemperatureC: 55 }), "hot-water.store-cool");
    expect(f.map((x) => x.message)).toEqual(["cyl: store at 55 °C; legionella control asks for ≥ 60 °C storage (HSE ACoP L8 / HSG274 Part 2)"]);
  });
  it("store no warmer than the cold feed (30/30 °C): no reheat time, hot-water.no-reheat saying why", () => {
    const r = store({ type: "heat-pump", kw: 6 }, { storeTemperatureC: 30, coldWaterC: 30 });
    expect(r.hotWater).toEqual({ id: "cyl", reheatMinutes: null });
    const f = found(r, "hot-water.no-reheat");
    expect(f.map((x) => [x.severity, x.refs])).toEqual([["warning", ["cyl"]]]);
    expect(f[0]!.message).toBe("cyl: reheat time not computed (storeTemperatureC 30 must be above coldWaterC 30)");
  });
});
