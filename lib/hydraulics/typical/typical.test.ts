/**
 * Nothing unknown counts as zero: a part whose Kv or water content is left
 * empty is sized with the typical value its table row states (checked here by
 * hand from the row's published basis, not from the engine's numbers), the
 * numbers resting on it say so (restsOn), one finding lists the parts assumed,
 * and where no typical value is safe the head says it excludes the drop.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { fluidProperties } from "@/lib/hydraulics/fluids";
import { resultsSchema, type Results } from "@/lib/schematic/results";
import { smallSystem, type SmallSystem } from "@/lib/hydraulics/testing/small-system";
import { perTest } from "@/lib/hydraulics/testing/per-test";

function run(change: (d: SmallSystem) => void): Results {
  const d = smallSystem();
  change(d);
  const r = calculate(d);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return resultsSchema.parse(r.results);
}
const part = (d: SmallSystem, id: string) => d.parts.find((p) => p.id === id)!;
const heating = (r: Results) => r.modes.find((m) => m.mode === "heating")!;

describe("heat pump without a Kv (the small system: 3 kW heat pump, 1.5 kW of radiators)", () => {
  const sized = perTest(() => ({
    typical: run((d) => delete part(d, "hp").props!.kv),
    negligible: run((d) => (part(d, "hp").props!.kv = 1000)), // 1000 m³/h at 1 bar: < 1e-5 kPa here
  }));

  it("gets the assumption finding naming the heat pump", () => {
    const { typical } = sized();
    const f = typical.findings.find((x) => x.code === "input.assumed-values");
    expect(f?.severity).toBe("warning");
    expect(f?.refs).toContain("hp");
    expect(f?.message).toMatch(/hp Kv/);
    expect(typical.assumptions.find((a) => a.ref === "hp.kv")).toMatchObject({ part: "hp", field: "kv", kind: "resistance" });
  });

  it("its head includes the typical exchanger drop: 20 kPa at rated flow → 20·(1.5/3)² = 5 kPa at the design flow", () => {
    const { typical, negligible } = sized();
    // Table basis (common practice): the exchanger loses 20 kPa at the rated flow, the rated
    // output at the design ΔT. Same fluid and ΔT, so the flows scale with the heat and the
    // quadratic Kv law gives 20 kPa × (1500 W / 3000 W)² = 5 kPa at the design flow.
    const withHp = heating(typical).pump!.requiredHeadKpa!;
    const without = heating(negligible).pump!.requiredHeadKpa!;
    expect(withHp - without).toBeCloseTo(5, 4);
    const hpDrop = heating(typical).parts.find((p) => p.id === "hp")!.pressureDropKpa!;
    expect(hpDrop).toBeCloseTo(5, 6);
  });

  it("the numbers resting on it are marked, those that do not are not", () => {
    const { typical, negligible } = sized();
    const h = heating(typical);
    expect(h.pump!.restsOn).toContain("hp.kv");
    for (const c of h.circuits) expect(c.restsOn).toContain("hp.kv");
    expect(h.parts.find((p) => p.id === "hp")!.restsOn).toEqual(["hp.kv"]);
    expect(h.parts.find((p) => p.id === "r1")!.restsOn).toEqual([]);
    expect(typical.volume.restsOn).toEqual([]); // the heat pump's water content is given (2 L)
    expect(heating(negligible).pump!.restsOn).toEqual([]);
    expect(negligible.findings.map((f) => f.code)).not.toContain("input.assumed-values");
  });
});

describe("an isolation valve without a Kv: a full-bore ball valve, K = 3·fT (Crane TP-410)", () => {
  const valved = perTest(() => run((d) => {
    d.parts.push({ id: "iso", type: "isolation-valve", props: {} });
    d.pipes.find((p) => p.id === "p1")!.to = "iso.a";
    d.pipes.push({ id: "p1b", from: "iso.b", to: "tf.a", material: "copper", size: "22", lengthM: 0.2 });
  }));
  it("loses (q/Kv)² bar with Kv = 3600·A·√(200/K) at the 20.2 mm bore of its 22 mm pipes", () => {
    // Crane TP-410 Appendix A: ball valve K = 3·fT; fT of ¾" = 0.025 (the 22 mm copper bore is
    // nearest the ¾" Sch 40 bore). Kv from the definitions: Δp = K·ρv²/2 = (Q/Kv)² bar·ρ/1000.
    const kv = 3600 * ((Math.PI * 0.0202 ** 2) / 4) * Math.sqrt(200 / (3 * 0.025));
    const water = fluidProperties({ kind: "water" }, 42.5);
    const r = valved();
    const h = heating(r);
    const q = h.parts.find((p) => p.id === "iso")!.flowM3h!;
    expect(h.parts.find((p) => p.id === "iso")!.pressureDropKpa!).toBeCloseTo(100 * (q / kv) ** 2 * (water.densityKgM3 / 1000), 9);
    expect(r.assumptions.find((a) => a.ref === "iso.kv")!.value).toBeCloseTo(kv, 9);
  });
});

describe("water content left empty", () => {
  it("a radiator holds 3.5 L per kW of its ΔT 50 output (common practice): the volume includes it and says so", () => {
    const given = run(() => {});
    const empty = run((d) => delete part(d, "r1").props!.waterVolumeL);
    expect(empty.volume.systemL! - given.volume.systemL!).toBeCloseTo(3.5 * 3 - 6, 9); // r1: 3000 W at ΔT 50, in place of the 6 L it states
    expect(empty.volume.restsOn).toEqual(["r1.waterVolumeL"]);
    expect(empty.expansionVessel!.restsOn).toEqual(["r1.waterVolumeL"]);
  });

  it("a UFH loop's own pipe is counted: πd²/4 · loop length", () => {
    const given = run(() => {});
    const withLoop = run((d) => {
      d.parts.push({ id: "u1", type: "ufh-loop", props: { heatLoadW: 400, loopLengthM: 80, innerDiameterMm: 12 } });
    });
    expect(withLoop.volume.systemL! - given.volume.systemL!).toBeCloseTo((Math.PI / 4) * 0.012 ** 2 * 80 * 1000, 9);
  });
});

describe("a boiler without a Kv: no typical value is safe", () => {
  const boiler = perTest(() => run((d) => {
    const hp = part(d, "hp");
    hp.type = "boiler";
    delete hp.props!.kv;
  }));
  it("warns that the head required excludes its own drop, and assumes nothing", () => {
    const r = boiler();
    const f = r.findings.find((x) => x.code === "input.source-dp-excluded");
    expect(f).toMatchObject({ severity: "warning", refs: ["hp"] });
    expect(f!.message).toMatch(/excludes/);
    expect(r.assumptions.find((a) => a.part === "hp" && a.field === "kv")).toBeUndefined();
    expect(heating(r).parts.find((p) => p.id === "hp")!.pressureDropKpa).toBe(0);
  });
});

describe("a rating so small its flow is no flow", () => {
  // 1e-300 kW at 5 K is about 1.7e-301 m³/h, below the 1e-5 m³/h the engine counts as no flow: a Kv
  // "20 kPa at its flow" would be about 4e-301 and its resistance past any float (a NaN in every flow).
  const doc = (ratedOutputKw: number) => ({
    format: "loopwright/schematic", version: 1, fluid: { kind: "water" }, design: { flowTemperatureC: 35, returnTemperatureC: 30 },
    parts: [{ id: "hp", type: "heat-pump", props: { ratedOutputKw } }],
    pipes: [{ id: "p", from: "hp.flow", to: "hp.return", material: "copper", size: "15", lengthM: 1 }],
  });
  it("gets no Kv assumed from its flow, and sizes without an internal error", () => {
    const out = calculate(doc(1e-300));
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    resultsSchema.parse(out.results);
    expect(out.results.assumptions.map((a) => a.ref)).toEqual(["hp.waterVolumeL"]);
  });
  it("a real rating (5 kW) does get one", () => {
    const out = calculate(doc(5));
    if (!out.ok) throw new Error(JSON.stringify(out.issues));
    expect(out.results.assumptions.map((a) => a.ref)).toEqual(["hp.kv", "hp.waterVolumeL"]);
  });
});
