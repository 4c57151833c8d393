/**
 * Which loads each mode sizes, seen where the network keeps them open: in hot-water mode only the
 * cylinder coil carries heat (the source's rated output), so a load always open beside the diverter
 * and a header's primary pass get none; in heating mode a cylinder served by a diverter is no load
 * (it would otherwise be a load with no return path); a header whose secondary draws more than the
 * primary brings mixes: T = (Qp·T_flow + (Qs − Qp)·T_return)/Qs (first-law mixing by flow).
 * Flows q = P/(ρ·cp·ΔT) with water at the 40 °C mean from the hand-calc WATER table (IAPWS-95).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { flowM3h, WATER } from "@/lib/hydraulics/testing/hand-calc";

const cu = (id: string, from: string, to: string, lengthM = 2) => ({ id, from, to, material: "copper", size: "22", lengthM });
const DESIGN = { flowTemperatureC: 45, returnTemperatureC: 35, maxFlowTemperatureC: 65, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 500 };
const PUMP = [[0, 60], [1, 50], [2, 0]];
const W40 = WATER[40];
const CYL = { volumeL: 150, coilKv: 3, coldWaterC: 10, storeTemperatureC: 60, coilWaterVolumeL: 0 };

function run(parts: unknown[], pipes: unknown[]) {
  const out = calculate({ format: "loopwright/schematic", version: 1, name: "modes", fluid: { kind: "water" }, design: DESIGN, parts, pipes });
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
type R = ReturnType<typeof run>;
const mode = (r: R, m: string) => r.modes.find((x) => x.mode === m)!;
const flow = (r: R, m: string, id: string) => mode(r, m).parts.find((p) => p.id === id)?.flowM3h ?? 0;
const codes = (r: R) => r.findings.map((f) => f.code);
// ρ·cp of the engine's water at 40 °C against the table: ±0.1 %
const near = (got: number | null, want: number) => expect(Math.abs(got! / want - 1)).toBeLessThan(1e-3);

describe("a towel-rail load always open beside a diverter (heat load / cylinder)", () => {
  const doc = () => run([
    { id: "hp", type: "heat-pump", props: { ratedOutputKw: 6, kv: 4, waterVolumeL: 10, pumpCurve: PUMP } },
    { id: "tf", type: "tee" }, { id: "tq", type: "tee" }, { id: "tr", type: "tee" },
    { id: "rt", type: "heat-load", props: { heatLoadW: 500, kv: 1, waterVolumeL: 2 } },
    { id: "dv", type: "diverter-valve", props: { kvs: 6, position: "a" } },
    { id: "hl", type: "heat-load", props: { heatLoadW: 2000, kv: 2, waterVolumeL: 10 } },
    { id: "cyl", type: "cylinder", props: { ...CYL, coilOutputKw: 3 } },
  ], [cu("a", "hp.flow", "tf.a"), cu("a1", "tf.b", "rt.flow"), cu("a2", "rt.return", "tq.b"), cu("a3", "tf.c", "dv.ab"), cu("e", "dv.a", "hl.flow"), cu("g", "hl.return", "tr.a"),
    cu("c1", "dv.b", "cyl.coilFlow"), cu("c2", "cyl.coilReturn", "tr.b"), cu("k", "tr.c", "tq.a"), cu("z", "tq.c", "hp.return")]);

  it("heating: towel rail 500 W and heat load 2 kW; the cylinder behind the diverter is no load (no load.no-return-path)", () => {
    const r = doc();
    near(flow(r, "heating", "rt"), flowM3h(500, 10, W40));
    near(flow(r, "heating", "hl"), flowM3h(2000, 10, W40));
    expect(flow(r, "heating", "cyl")).toBe(0);
    near(mode(r, "heating").heatSourceFlowM3h, flowM3h(2500, 10, W40));
    expect(codes(r)).not.toContain("load.no-return-path");
  });
  it("hot water: the coil takes the rated 6 kW, the open towel rail none", () => {
    const r = doc();
    near(flow(r, "hot-water", "cyl"), flowM3h(6000, 10, W40));
    expect(flow(r, "hot-water", "rt")).toBe(0);
    near(mode(r, "hot-water").heatSourceFlowM3h, flowM3h(6000, 10, W40));
  });
});

describe("header on the primary, diverter and cylinder on the secondary", () => {
  const doc = () => run([
    { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, kv: 4, waterVolumeL: 10, pumpCurve: PUMP } },
    { id: "h", type: "low-loss-header", props: { volumeL: 20 } },
    { id: "pu", type: "pump", props: { curve: PUMP } },
    { id: "dv", type: "diverter-valve", props: { kvs: 6, position: "a" } }, { id: "tr", type: "tee" },
    { id: "hl", type: "heat-load", props: { heatLoadW: 6000, kv: 2, waterVolumeL: 10 } },
    { id: "cyl", type: "cylinder", props: { ...CYL, coilOutputKw: 8 } },
  ], [cu("a", "hp.flow", "h.p1"), cu("b", "h.p2", "hp.return"), cu("c", "h.p3", "pu.in"), cu("d", "pu.out", "dv.ab"), cu("e", "dv.a", "hl.flow"), cu("g", "hl.return", "tr.a"),
    cu("c1", "dv.b", "cyl.coilFlow"), cu("c2", "cyl.coilReturn", "tr.b"), cu("k", "tr.c", "h.p4")]);

  it("heating: the primary carries the rated 5 kW, the secondary the 6 kW load → header.primary-low at (5·45 + 1·35)/6 = 43.3 °C", () => {
    const r = doc();
    near(flow(r, "heating", "hp"), flowM3h(5000, 10, W40));
    // the header's own result is its primary pass
    near(flow(r, "heating", "h"), flowM3h(5000, 10, W40));
    near(flow(r, "heating", "hl"), flowM3h(6000, 10, W40));
    const f = r.findings.filter((x) => x.code === "header.primary-low");
    expect(f.map((x) => x.refs)).toEqual([["h", "hp"]]);
    expect(f[0]!.message).toMatch(/^h: the secondary side draws 0\.521 m³\/h but the primary brings 0\.434 m³\/h in heating mode, .*about 43\.3 °C instead of 45 °C/);
  });
  it("hot water: the primary pass takes no load (heat source flow 0), the coil the rated 5 kW", () => {
    const r = doc();
    expect(mode(r, "hot-water").heatSourceFlowM3h!).toBeLessThan(1e-9);
    expect(flow(r, "hot-water", "h")).toBe(0);
    near(flow(r, "hot-water", "cyl"), flowM3h(5000, 10, W40));
    expect(codes(r)).not.toContain("header.primary-unconnected");
  });
});

describe("a header with nothing on its primary and no heat source drawn", () => {
  it("no primary pass is sized (0 W rated), so no header.primary-unconnected; the secondary load still gets its flow", () => {
    const r = run([
      { id: "h", type: "low-loss-header", props: { volumeL: 20 } },
      { id: "pu", type: "pump", props: { curve: PUMP } },
      { id: "hl", type: "heat-load", props: { heatLoadW: 3000, kv: 2, waterVolumeL: 10 } },
    ], [cu("c", "h.p3", "pu.in"), cu("d", "pu.out", "hl.flow"), cu("e", "hl.return", "h.p4")]);
    expect(codes(r)).not.toContain("header.primary-unconnected");
    near(flow(r, "heating", "hl"), flowM3h(3000, 10, W40));
  });
});
