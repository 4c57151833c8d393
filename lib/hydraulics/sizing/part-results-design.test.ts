/**
 * Per-part flow and drop in the design results and in a scenario (sizing/part-results.ts): in design a
 * part's drop is its own law at the design flow — Kv devices Δp = (q/Kv)² bar (EN 60534 / VDI 2173
 * Kv definition, references §5), a radiator its valve, a pump its curve head as a negative drop, a
 * header none — and a valve drawn shut has no flow and no stated drop; in a scenario the drop is the
 * solved head difference. Expected values are hand calculations (testing/hand-calc.ts).
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { curveHeadKpa, flowM3h, kvDpKpa, WATER } from "@/lib/hydraulics/testing/hand-calc";
import { SERIES_PUMP_CURVE, smallSystem, type SmallSystem } from "@/lib/hydraulics/testing/small-system";

/** Water at the small system's 42.5 °C mean, references §1.1, linearly between 40 and 45 °C. */
const W = { rho: (WATER[40].rho + WATER[45].rho) / 2, cp: (WATER[40].cp + WATER[45].cp) / 2, nu: (WATER[40].nu + WATER[45].nu) / 2 };
/** The small system's design flows: 1000 W and 500 W at ΔT 5 K, q = P/(ρ·cp·ΔT). */
const Q_R1 = flowM3h(1000, 5, W);
const Q_R2 = flowM3h(500, 5, W);

type Results = Extract<ReturnType<typeof calculate>, { ok: true }>["results"];
function results(d: object): Results {
  const out = calculate(d);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
const partOf = (rows: readonly { id: string }[], id: string) => rows.find((p) => p.id === id) as { id: string; flowM3h: number | null; pressureDropKpa: number | null; restsOn: string[] };

/**
 * The small system with a strainer (no Kv typed: a typical Kv is assumed) on the heat pump's flow and
 * an isolation valve drawn shut on the expansion vessel's leg, and one scenario of it.
 */
function withValves(): SmallSystem {
  const d = smallSystem();
  d.parts.push({ id: "st", type: "strainer", props: {} }, { id: "iv", type: "isolation-valve", props: { kv: 10, open: false } });
  const p1 = d.pipes.find((p) => p.id === "p1")!;
  p1.from = "st.b";
  d.pipes.push({ id: "p0", from: "hp.flow", to: "st.a", material: "copper", size: "22", lengthM: 1 });
  const pev = d.pipes.find((p) => p.id === "pev")!;
  pev.to = "iv.a";
  d.pipes.push({ id: "pev2", from: "iv.b", to: "ev.connection", material: "copper", size: "15", lengthM: 0.5 });
  d.scenarios = [{ name: "as drawn", mode: "heating", valves: {} }];
  return d;
}

describe("design: each part's drop is its own law at the design flow", () => {
  it("pump, radiators and heat pump", () => {
    const r = results(smallSystem());
    const parts = r.modes.find((m) => m.mode === "heating")!.parts;
    const pump = partOf(parts, "pump");
    expect(pump.flowM3h! / (Q_R1 + Q_R2)).toBeCloseTo(1, 3);
    // a pump's drop is minus its head at its flow: between (0, 40) and (0.5, 35) kPa, at ≈ 0.26 m³/h 40 − 0.26/0.5·5 ≈ 37.4 kPa
    expect(pump.pressureDropKpa! / -curveHeadKpa(SERIES_PUMP_CURVE, pump.flowM3h!)).toBeCloseTo(1, 6);
    expect(pump.pressureDropKpa!).toBeLessThan(-35);
    // r1: valve Kv 1 at its own flow: 100·(0.172/1)²·ρ/1000 ≈ 2.9 kPa
    const r1 = partOf(parts, "r1");
    expect(r1.flowM3h! / Q_R1).toBeCloseTo(1, 3);
    expect(r1.pressureDropKpa! / kvDpKpa(r1.flowM3h!, 1, W.rho)).toBeCloseTo(1, 3);
    // the heat pump: Kv 4 at the whole flow
    const hp = partOf(parts, "hp");
    expect(hp.pressureDropKpa! / kvDpKpa(hp.flowM3h!, 4, W.rho)).toBeCloseTo(1, 3);
    // typed Kv values rest on no assumption
    for (const p of [pump, r1, hp]) expect(p.restsOn).toEqual([]);
  });

  it("a valve drawn shut: no flow, no stated drop, and a note naming it; an assumed Kv is named", () => {
    const r = results(withValves());
    const parts = r.modes.find((m) => m.mode === "heating")!.parts;
    const iv = partOf(parts, "iv");
    expect(iv.flowM3h).toBe(0);
    expect(iv.pressureDropKpa).toBeNull();
    const shut = r.findings.filter((f) => f.code === "valve.shut");
    expect(shut).toHaveLength(1);
    expect(shut[0]!.severity).toBe("info");
    expect(shut[0]!.refs).toEqual(["iv"]);
    expect(shut[0]!.message).toBe("iv is drawn shut: no flow and no pressure drop through it at design");
    // the strainer's drop rests on its assumed Kv
    const st = partOf(parts, "st");
    expect(st.restsOn).toEqual(["st.kv"]);
    expect(st.flowM3h! / (Q_R1 + Q_R2)).toBeCloseTo(1, 3);
    expect(st.pressureDropKpa!).toBeGreaterThan(0);
  });
});

describe("scenario: the drop is the solved head difference", () => {
  it("the shut valve on the vessel leg shows the (near-zero) difference across it, not null; flows as solved", () => {
    const r = results(withValves());
    const s = r.scenarios!.find((x) => x.name === "as drawn")!;
    const iv = partOf(s.parts, "iv");
    expect(iv.pressureDropKpa).toBeTypeOf("number");
    expect(Math.abs(iv.pressureDropKpa!)).toBeLessThan(1e-3); // a dead leg: no flow, so hardly any difference
    expect(iv.flowM3h).toBe(0);
    // the pump's drop is minus its head at the solved flow (a converged solution, to 1e-4)
    const pump = partOf(s.parts, "pump");
    expect(pump.pressureDropKpa! / -curveHeadKpa(SERIES_PUMP_CURVE, pump.flowM3h!)).toBeCloseTo(1, 4);
    // a scenario's part rows carry no assumption list of their own
    expect(partOf(s.parts, "hp").restsOn).toEqual([]);
    expect(partOf(s.parts, "st").restsOn).toEqual(["st.kv"]);
    expect(r.findings.filter((f) => f.code === "valve.shut")).toHaveLength(1);
  });
});
