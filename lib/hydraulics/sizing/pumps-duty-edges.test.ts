/**
 * Pump duty at and around its limits (sizing/pumps.ts), on a heat pump (Kv 2, no pump of its
 * own) feeding two heat loads in parallel, driven by pump parts on the return:
 * - ok when the curve's head at the design flow is at least the index circuit's drop (≥: exactly
 *   equal is enough), with no surplus, no speed and no finding at that point;
 * - `pump.head-low` names the pump and the index load only, with both numbers; a pump that falls
 *   short has no surplus and no speed (affinity laws only slow a pump that is too big);
 * - a pump past the end of its curve makes the head of the side unknown, even when another pump
 *   in series is on its curve;
 * - `pump.oversized` only beyond the 25 % margin (common practice, pumps/affinity.ts): exactly 25 %
 *   is not beyond; its message gives the surplus as a percentage of the need and the settings.
 * Flat curves give the same head at every flow, so the head available is the number drawn.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";

type Curve = [number, number][];
const flat = (h: number): Curve => [[0, h], [1, h], [2, 0]];

/** hp → t1 → h1 (3 kW, Kv 1) / h2 (1 kW, Kv 1) → t2 → pumps in series → hp. */
function doc(pumps: Curve[], opts: { h1Length?: number } = {}) {
  const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
  const chain = ["t2.c", ...pumps.flatMap((_, i) => [`pu${i + 1}.in`, `pu${i + 1}.out`]), "hp.return"];
  const pipes = [
    cu("a", "hp.flow", "t1.a", 2), cu("b", "t1.b", "h1.flow", opts.h1Length ?? 3), cu("c", "h1.return", "t2.a", 3),
    cu("d", "t1.c", "h2.flow", 1), cu("e", "h2.return", "t2.b", 1),
  ];
  for (let i = 0; i < chain.length; i += 2) pipes.push(cu(`r${i / 2}`, chain[i]!, chain[i + 1]!, 1));
  return {
    format: "loopwright/schematic", version: 1, name: "pump duty edges", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 500 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 6, minFlowM3h: 0, kv: 2, waterVolumeL: 2, pumpCurve: null } },
      { id: "t1", type: "tee" }, { id: "t2", type: "tee" },
      { id: "h1", type: "heat-load", props: { heatLoadW: 3000, kv: 1, waterVolumeL: 1 } },
      { id: "h2", type: "heat-load", props: { heatLoadW: 1000, kv: 1, waterVolumeL: 1 } },
      ...pumps.map((curve, i) => ({ id: `pu${i + 1}`, type: "pump", props: { curve } })),
    ],
    pipes,
  };
}
function run(d: ReturnType<typeof doc>) {
  const out = calculate(d);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  const r = out.results;
  const mode = r.modes.find((m) => m.mode === "heating")!;
  const of = (code: string) => r.findings.filter((f) => f.code === code);
  return { r, mode, duty: mode.pump!, of };
}
/** The head the side needs, as the engine reports it (pump-verdict.test.ts checks it by hand). */
const need = (opts: { h1Length?: number } = {}) => run(doc([flat(100)], opts)).duty.requiredHeadKpa!;

describe("pump verdict exactly at the need", () => {
  it("a curve giving exactly the head required is ok (≥), with no surplus, no speed and no finding", () => {
    const req = need();
    const { duty, of } = run(doc([flat(req)]));
    expect(duty.requiredHeadKpa).toBe(req);
    expect(duty.availableHeadKpa).toBe(req);
    expect(duty.ok).toBe(true);
    expect(duty.surplusKpa).toBe(0);
    // nothing to slow down: the pump meets the duty at full speed
    expect(duty.speedFraction).toBeNull();
    expect(of("pump.head-low")).toEqual([]);
    expect(of("pump.oversized")).toEqual([]);
  });
});

describe("a pump that falls short", () => {
  it("pump.head-low names the pump and the index load (h1, the larger load) only, with both heads", () => {
    const req = need();
    const { duty, of, mode } = run(doc([flat(0.9 * req)]));
    expect(mode.circuits.filter((c) => c.index).map((c) => c.load)).toEqual(["h1"]);
    expect(duty.ok).toBe(false);
    const low = of("pump.head-low");
    expect(low.map((f) => [f.severity, f.refs])).toEqual([["error", ["pu1", "h1"]]]);
    expect(low[0]!.message).toContain(`needs ${req.toFixed(1)} kPa`);
    expect(low[0]!.message).toContain(`${duty.designFlowM3h!.toFixed(3)} m³/h in heating mode`);
    expect(low[0]!.message).toContain(`the curve gives ${(0.9 * req).toFixed(1)} kPa`);
  });

  it("has no surplus and no speed, and is not called oversized", () => {
    const { duty, of } = run(doc([flat(0.9 * need())]));
    expect(duty.surplusKpa).toBeNull();
    expect(duty.speedFraction).toBeNull();
    expect(of("pump.oversized")).toEqual([]);
  });
});

describe("a pump past the end of its curve, in series with one on its curve", () => {
  const short: Curve = [[0, 50], [0.1, 40], [0.2, 30]]; // ends at 0.2 m³/h, below the 0.35 m³/h design flow
  for (const order of [[short, flat(200)], [flat(200), short]] as Curve[][]) {
    const shortId = order[0] === short ? "pu1" : "pu2";
    it(`${shortId} short: the side's head is unknown (null), not ok, no head-low, curve-short naming ${shortId} and its flow`, () => {
      const { duty, of } = run(doc(order));
      expect(duty.availableHeadKpa).toBeNull();
      expect(duty.ok).toBe(false);
      expect(duty.surplusKpa).toBeNull();
      expect(of("pump.head-low")).toEqual([]);
      const f = of("pump.curve-short");
      expect(f.map((x) => x.refs)).toEqual([[shortId]]);
      expect(f[0]!.message).toContain(`${shortId}: design flow ${duty.designFlowM3h!.toFixed(3)} m³/h in heating mode is beyond the end of its curve`);
    });
  }
});

describe("pump.oversized: beyond the 25 % margin only", () => {
  it("twice the need: surplus = need, 100 %, the 25 % margin and both settings in the message", () => {
    const req = need();
    const { duty, of } = run(doc([flat(2 * req)]));
    expect(duty.surplusKpa).toBe(req); // 2·req − req
    const f = of("pump.oversized");
    expect(f.map((x) => x.refs)).toEqual([["pu1"]]);
    expect(f[0]!.message).toContain(`gives ${(2 * req).toFixed(1)} kPa at ${duty.designFlowM3h!.toFixed(3)} m³/h in heating mode, ${req.toFixed(1)} kPa (100 %) more than the ${req.toFixed(1)} kPa needed`);
    expect(f[0]!.message).toMatch(/more than the 25 % margin; run it at about \d+ % speed of the curve drawn \(affinity laws\), or set /);
    expect(f[0]!.message).toMatch(new RegExp(`, or set ${req.toFixed(1).replace(".", "\\.")} kPa in a constant-pressure mode$`));
  });

  it("a curve so high that even slowed to the last point drawn it gives too much: no speed, only the constant-pressure setting", () => {
    const req = need();
    // n ≥ Q/Q_max = 0.35/2 and n²·H ≥ 0.0306·100·req > req: no speed on the curve drawn meets the duty (affinity laws)
    const { duty, of } = run(doc([[[0, 100 * req], [1, 100 * req], [2, 100 * req]]]));
    expect(duty.speedFraction).toBeNull();
    const msg = of("pump.oversized")[0]!.message;
    expect(msg).not.toMatch(/speed|null/);
    expect(msg).toMatch(new RegExp(`margin; set ${req.toFixed(1).replace(".", "\\.")} kPa in a constant-pressure mode$`));
  });

  it("exactly 25 % above the need is not beyond the margin; 2 % more is", () => {
    // a document whose need times 1.25 is exact in floating point, so available − need = 0.25·need exactly
    let req = NaN;
    let opts = {};
    for (let i = 0; i < 40; i++) {
      opts = { h1Length: 3 + i * 0.01 };
      req = need(opts);
      if (req + 0.25 * req - req === 0.25 * req) break;
    }
    expect(req + 0.25 * req - req).toBe(0.25 * req);
    const at = run(doc([flat(req + 0.25 * req)], opts));
    expect(at.duty.requiredHeadKpa).toBe(req);
    expect(at.duty.surplusKpa).toBe(0.25 * req);
    expect(at.of("pump.oversized")).toEqual([]);
    expect(run(doc([flat(1.27 * req)], opts)).of("pump.oversized").map((f) => f.refs)).toEqual([["pu1"]]);
    expect(run(doc([flat(1.23 * req)], opts)).of("pump.oversized")).toEqual([]);
  });
});
