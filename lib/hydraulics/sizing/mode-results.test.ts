/**
 * A mode's own results, on the small test system (testing/small-system.ts: heat pump →
 * two radiators in parallel → pump → back; 45/40 °C):
 * - circuit.no-pump when nothing drives a circuit, naming its loads and the mode;
 * - the heat source flow: the sum over every heat source, which by continuity is the sum of
 *   the loads' design flows Q = Φ/(ρ·cp·ΔT) when two sources share the system in parallel;
 * - pipe.no-flow names exactly the pipes without flow (the dead legs to vessel and valve);
 * - a pump whose curve cannot be read (flows not increasing) adds no head, and the
 *   calculation still answers.
 * Water at 42.5 °C, the mean of 45/40 °C: ρ and cp taken between the IAPWS values at 40 and
 * 45 °C (references §1.1); linear interpolation is good to 0.01 % over 5 K.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { flowM3h, WATER } from "@/lib/hydraulics/testing/hand-calc";
import { smallSystem, type SmallSystem } from "@/lib/hydraulics/testing/small-system";

const W42 = { rho: (WATER[40].rho + WATER[45].rho) / 2, cp: (WATER[40].cp + WATER[45].cp) / 2 };

function results(d: SmallSystem) {
  const out = calculate(d);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.results;
}
/** The small system with the pump taken out (its two pipes joined into one). */
function withoutPump(): SmallSystem {
  const d = smallSystem();
  d.parts = d.parts.filter((p) => p.id !== "pump");
  d.pipes = d.pipes.filter((p) => p.id !== "p6c" && p.id !== "p7");
  d.pipes.push({ id: "p7", from: "ts.b", to: "hp.return", material: "copper", size: "22", lengthM: 5.5 });
  return d;
}
/** The small system with a boiler beside the heat pump: both take return water and feed the flow tee. */
function twoSources(): SmallSystem {
  const d = smallSystem();
  d.parts.push(
    { id: "bo", type: "boiler", props: { ratedOutputKw: 3, kv: 4, waterVolumeL: 1 } },
    { id: "sr", type: "tee" },
    { id: "sf", type: "tee" },
  );
  d.pipes = d.pipes.filter((p) => p.id !== "p7" && p.id !== "p1");
  const cu = (id: string, from: string, to: string) => ({ id, from, to, material: "copper", size: "22", lengthM: 2 });
  d.pipes.push(cu("p7", "pump.out", "sr.a"), cu("p7a", "sr.b", "hp.return"), cu("p7b", "sr.c", "bo.return"), cu("p1a", "hp.flow", "sf.a"), cu("p1b", "bo.flow", "sf.b"), cu("p1", "sf.c", "tf.a"));
  return d;
}

describe("circuit.no-pump: nothing drives the circuit", () => {
  it("without the pump (the heat pump has none of its own): a warning naming both radiators and the mode", () => {
    const f = results(withoutPump()).findings.filter((x) => x.code === "circuit.no-pump");
    expect(f).toHaveLength(1);
    expect(f[0]!.severity).toBe("warning");
    expect([...f[0]!.refs].sort()).toEqual(["r1", "r2"]);
    expect(f[0]!.message).toMatch(/no pump drives the circuit of (r1, r2|r2, r1) in heating mode/);
  });

  it("with the pump: no such warning", () => {
    expect(results(smallSystem()).findings.filter((x) => x.code === "circuit.no-pump")).toEqual([]);
  });
});

describe("heat source flow of a mode", () => {
  it("two sources in parallel: their flows add up to the loads' 1000 + 500 W at ΔT 5 K", () => {
    const m = results(twoSources()).modes[0]!;
    const total = flowM3h(1500, 5, W42);
    // ±0.1 %: the mean-temperature water properties (interpolated, above) against the engine's
    expect(Math.abs(m.heatSourceFlowM3h! / total - 1)).toBeLessThan(1e-3);
    // the split is shared, not all through one source (else a sum that kept only one would pass)
    const hpFlow = m.parts.find((p) => p.id === "hp")!.flowM3h!;
    const boFlow = m.parts.find((p) => p.id === "bo")!.flowM3h!;
    expect(Math.min(Math.abs(hpFlow), Math.abs(boFlow))).toBeGreaterThan(0.2 * total);
  });
});

describe("pipes without flow", () => {
  it("the small system: only the legs to the expansion vessel and the safety valve (pev, psv) carry no water", () => {
    const f = results(smallSystem()).findings.filter((x) => x.code === "pipe.no-flow");
    expect(f).toHaveLength(1);
    expect([...f[0]!.refs].sort()).toEqual(["pev", "psv"]);
    expect(f[0]!.message).toMatch(/^2 pipes carry no water/);
  });
});

describe("a pump whose curve cannot be read", () => {
  it("flows not increasing (1 → 1 m³/h): the pump adds no head when simulated and the calculation answers", () => {
    const d = smallSystem();
    d.parts = d.parts.map((p) => (p.id === "pump" ? { ...p, props: { curve: [[0, 40], [1, 30], [1, 10]] } } : p));
    const r = results(d);
    expect(r.findings.some((f) => f.code === "pump.curve-invalid" && f.refs.includes("pump"))).toBe(true);
    expect(r.scenarios[0]!.heatSourceFlowM3h).toBe(0);
  });
});
