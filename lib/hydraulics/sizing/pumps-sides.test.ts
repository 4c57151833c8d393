/**
 * Pump duties per side (sizing/pumps.ts, circuits.ts): a low-loss header splits the network
 * into a primary side (the heat pump's own pump, the header as its load) and a secondary side
 * (a pump part, two radiators). Each side has its own duty, verdict, index circuit and the
 * assumed values its circuits rest on; a side driven by a heat source with its own pump and a
 * pump part in series has the pump part as the duty's root and the two heads added.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { curveHeadKpa } from "@/lib/hydraulics/testing/hand-calc";

type Curve = [number, number][];
const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
const design = { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 500 };

function results(parts: unknown[], pipes: unknown[]) {
  const out = calculate({ format: "loopwright/schematic", version: 1, name: "pump sides", fluid: { kind: "water" }, design, parts, pipes });
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  const mode = out.results.modes.find((m) => m.mode === "heating")!;
  return { r: out.results, mode, duty: (id: string) => mode.pumps.find((p) => p.id === id)! };
}

/** hp (own pump) → header primary, iv (Kv assumed) back; header secondary → pu → ra (valve Kv assumed) / rb → header. */
function buffered(secondaryCurve: Curve) {
  return results(
    [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 8, kv: 2, waterVolumeL: 2, pumpCurve: [[0, 40], [1, 30], [2, 0]] } },
      { id: "llh", type: "low-loss-header", props: {} },
      { id: "iv", type: "isolation-valve", props: { kv: null } },
      { id: "pu", type: "pump", props: { curve: secondaryCurve } },
      { id: "t1", type: "tee" }, { id: "t2", type: "tee" },
      { id: "ra", type: "radiator", props: { outputAtDt50W: 6000, heatLoadW: 2000, waterVolumeL: 5 } },
      { id: "rb", type: "radiator", props: { outputAtDt50W: 6000, heatLoadW: 1000, valveKv: 1, waterVolumeL: 5 } },
    ],
    [
      cu("a", "hp.flow", "llh.p1", 2), cu("b", "llh.p2", "iv.a", 2), cu("b2", "iv.b", "hp.return", 1),
      cu("c", "llh.p3", "pu.in", 1), cu("d", "pu.out", "t1.a", 2), cu("e", "t1.b", "ra.flow", 2), cu("f", "ra.return", "t2.a", 2),
      cu("g", "t1.c", "rb.flow", 2), cu("h", "rb.return", "t2.b", 2), cu("i", "t2.c", "llh.p4", 1),
    ],
  );
}

describe("a low-loss header: one duty per side", () => {
  it("two duties, the heat pump's on the primary and the pump part's on the secondary, each with its own pumps", () => {
    const { mode } = buffered([[0, 20], [1, 20], [2, 0]]);
    expect(mode.pumps.map((p) => [p.id, p.pumpIds])).toEqual([["hp", ["hp"]], ["pu", ["pu"]]]);
    // each side's need is its own index circuit's drop: the header's on the primary, ra's on the secondary
    const drop = (load: string) => mode.circuits.find((c) => c.load === load)!.pressureDropKpa;
    expect(mode.pumps.map((p) => p.requiredHeadKpa)).toEqual([drop("llh"), drop("ra")]);
    expect(mode.circuits.filter((c) => c.index).map((c) => c.load)).toEqual(["llh", "ra"]);
  });

  it("each duty rests on the assumed values of its own side's circuits only", () => {
    const { r, duty } = buffered([[0, 20], [1, 20], [2, 0]]);
    expect(r.assumptions.map((a) => a.ref).sort()).toEqual(["iv.kv", "ra.valveKv"]);
    expect(duty("hp").restsOn).toEqual(["iv.kv"]);
    expect(duty("pu").restsOn).toEqual(["ra.valveKv"]);
  });

  it("a secondary pump too weak (0.5 kPa flat): head-low names it and the secondary's index load, not the primary's", () => {
    const { r, duty } = buffered([[0, 0.5], [1, 0.5], [2, 0]]);
    expect(duty("pu").ok).toBe(false);
    expect(duty("hp").ok).toBe(true);
    const low = r.findings.filter((f) => f.code === "pump.head-low");
    expect(low.map((f) => f.refs)).toEqual([["pu", "ra"]]);
    expect(low[0]!.message).toContain(`needs ${duty("pu").requiredHeadKpa!.toFixed(1)} kPa`);
    expect(low[0]!.message).toContain("the curve gives 0.5 kPa");
  });
});

describe("a side with a pump but no load", () => {
  it("a pump circulating only through the header's secondary pass drives no circuit: no duty for it", () => {
    const { mode } = results(
      [
        { id: "hp", type: "heat-pump", props: { ratedOutputKw: 8, kv: 2, waterVolumeL: 2, pumpCurve: [[0, 40], [1, 30], [2, 0]] } },
        { id: "llh", type: "low-loss-header", props: {} },
        { id: "pu", type: "pump", props: { curve: [[0, 10], [1, 8], [2, 0]] } },
      ],
      [cu("a", "hp.flow", "llh.p1", 2), cu("b", "llh.p2", "hp.return", 2), cu("c", "llh.p3", "pu.in", 1), cu("d", "pu.out", "llh.p4", 1)],
    );
    expect(mode.circuits.map((c) => c.load)).toEqual(["llh"]);
    expect(mode.pumps.map((p) => p.id)).toEqual(["hp"]);
  });
});

describe("the root of a side", () => {
  const hpCurve: Curve = [[0, 30], [1, 20], [2, 0]];
  const puCurve: Curve = [[0, 10], [1, 8], [2, 0]];
  /** hp (own pump, listed first) → hl → pu → hp: one side, two pumps in series. */
  const series = () =>
    results(
      [
        { id: "hp", type: "heat-pump", props: { ratedOutputKw: 6, kv: 2, waterVolumeL: 2, pumpCurve: hpCurve } },
        { id: "hl", type: "heat-load", props: { heatLoadW: 3000, kv: 1, waterVolumeL: 1 } },
        { id: "pu", type: "pump", props: { curve: puCurve } },
      ],
      [cu("f", "hp.flow", "hl.flow", 2), cu("r", "hl.return", "pu.in", 2), cu("r2", "pu.out", "hp.return", 1)],
    );

  it("a heat source's own pump and a pump part in series: the pump part is the duty's root, the heads add", () => {
    const { mode } = series();
    expect(mode.pumps).toHaveLength(1);
    const d = mode.pump!;
    expect(d.id).toBe("pu");
    expect(d.pumpIds).toEqual(["hp", "pu"]);
    // curves read by straight lines at the design flow (both carry it): H_hp(q) + H_pu(q)
    const q = d.designFlowM3h!;
    expect(d.availableHeadKpa!).toBeCloseTo(curveHeadKpa(hpCurve, q) + curveHeadKpa(puCurve, q), 9);
    expect(mode.circuits[0]!.pump).toBe("pu");
    expect(mode.circuits[0]!.path).toEqual(["r2", "hp", "f", "hl", "r"]);
  });

  it("a boiler with its own pump drives the side: its curve gives the head, and it leads each circuit's path", () => {
    const curve: Curve = [[0, 40], [1, 30], [2, 0]];
    const { mode } = results(
      [
        { id: "bo", type: "boiler", props: { ratedOutputKw: 8, kv: 2, waterVolumeL: 2, pumpCurve: curve } },
        { id: "hl", type: "heat-load", props: { heatLoadW: 3000, kv: 1, waterVolumeL: 1 } },
      ],
      [cu("f", "bo.flow", "hl.flow", 2), cu("r", "hl.return", "bo.return", 2)],
    );
    const d = mode.pump!;
    expect(d.id).toBe("bo");
    expect(d.availableHeadKpa!).toBeCloseTo(curveHeadKpa(curve, d.designFlowM3h!), 9);
    expect(mode.circuits.map((c) => [c.pump, c.path])).toEqual([["bo", ["bo", "f", "hl", "r"]]]);
  });
});
