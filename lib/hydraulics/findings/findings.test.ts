/**
 * One test per finding code, each from a small document: the base system
 * (testing/small-system.ts) with one thing changed. Each asserts the code and
 * that `refs` names the schematic ids concerned.
 */
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { resultsSchema, type Finding } from "@/lib/schematic/results";
import { smallSystem, type SmallSystem } from "@/lib/hydraulics/testing/small-system";
import { perTest } from "@/lib/hydraulics/testing/per-test";

function findings(change: (d: SmallSystem) => void = () => {}): Finding[] {
  const doc = smallSystem();
  change(doc);
  const r = calculate(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  resultsSchema.parse(r.results);
  return r.results.findings;
}
const codes = (fs: Finding[]) => fs.map((f) => f.code);
const find = (fs: Finding[], code: string) => fs.find((f) => f.code === code);
const part = (d: SmallSystem, id: string) => d.parts.find((p) => p.id === id)!;
const pipe = (d: SmallSystem, id: string) => d.pipes.find((p) => p.id === id)!;
/** Put two zone valves in the radiator flow legs. */
const withZones = (d: SmallSystem) => {
  d.parts.push({ id: "zv1", type: "zone-valve", props: { kvs: 4 } }, { id: "zv2", type: "zone-valve", props: { kvs: 4 } });
  pipe(d, "p2").to = "zv1.a";
  pipe(d, "p3").to = "zv2.a";
  d.pipes.push(
    { id: "z1", from: "zv1.b", to: "r1.flow", material: "copper", size: "15", lengthM: 0.3 },
    { id: "z2", from: "zv2.b", to: "r2.flow", material: "copper", size: "15", lengthM: 0.3 },
  );
};
/** …and a dp-bypass across the heat pump's flow and return, through two more tees. */
const withBypass = (d: SmallSystem, openingKpa: number | null) => {
  withZones(d);
  d.parts.push({ id: "tb1", type: "tee" }, { id: "tb2", type: "tee" }, { id: "bp", type: "dp-bypass-valve", props: { kvs: 2, openingKpa } });
  pipe(d, "p1").to = "tb1.a";
  pipe(d, "p6a").from = "tb2.b";
  d.pipes.push(
    { id: "pb1", from: "tb1.b", to: "tf.a", material: "copper", size: "22", lengthM: 0.5 },
    { id: "pb2", from: "tr.c", to: "tb2.a", material: "copper", size: "22", lengthM: 0.5 },
    { id: "pb3", from: "tb1.c", to: "bp.a", material: "copper", size: "15", lengthM: 0.3 },
    { id: "pb4", from: "bp.b", to: "tb2.c", material: "copper", size: "15", lengthM: 0.3 },
  );
};

describe("findings", () => {
  const base = perTest(() => findings());

  it("the base system has only the plant-room warnings it deserves", () => {
    expect(base().filter((f) => f.severity === "error")).toEqual([]);
    expect(codes(base())).toEqual(expect.arrayContaining(["heat-source.no-strainer", "heat-source.no-isolation"]));
  });

  const cases: [string, (d: SmallSystem) => void, string[]][] = [
    ["part.unconnected", (d) => void d.parts.push({ id: "av", type: "air-vent" }), ["av"]],
    ["part.open-port", (d) => { d.parts.push({ id: "iv", type: "isolation-valve" }); d.pipes.push({ id: "px", from: "iv.a", to: "pump.in", material: "copper", size: "22", lengthM: 1 }); }, ["iv"]],
    ["port.two-pipes", (d) => void d.pipes.push({ id: "dup", from: "tf.b", to: "r1.flow", material: "copper", size: "15", lengthM: 3 }), ["dup"]],
    ["system.no-heat-source", (d) => { d.parts = d.parts.filter((p) => p.id !== "hp"); d.pipes = d.pipes.filter((p) => p.id !== "p1" && p.id !== "p7"); }, []],
    ["system.no-pump", (d) => { d.parts = d.parts.filter((p) => p.id !== "pump"); pipe(d, "p6c").to = "hp.return"; d.pipes = d.pipes.filter((p) => p.id !== "p7"); }, []],
    ["system.no-expansion-vessel", (d) => { d.parts = d.parts.filter((p) => p.id !== "ev"); d.pipes = d.pipes.filter((p) => p.id !== "pev"); }, []],
    ["system.no-safety-valve", (d) => { d.parts = d.parts.filter((p) => p.id !== "sv"); d.pipes = d.pipes.filter((p) => p.id !== "psv"); }, []],
    ["load.no-return-path", (d) => void (d.pipes = d.pipes.filter((p) => p.id !== "p5")), ["r2"]],
    ["pump.curve-short", (d) => void (part(d, "pump").props = { curve: [[0, 40], [0.1, 30], [0.2, 10]] }), ["pump"]],
    ["pump.curve-rising", (d) => void (part(d, "pump").props = { curve: [[0, 30], [0.5, 35], [1, 10]] }), ["pump"]],
    ["pump.head-low", (d) => void (part(d, "pump").props = { curve: [[0, 4], [0.5, 3], [1, 1]] }), ["pump"]],
    ["zones.can-all-shut", withZones, ["hp", "zv1", "zv2"]],
    ["heat-source.no-strainer", () => {}, ["hp"]],
    ["heat-source.no-isolation", () => {}, ["hp"]],
    ["pipe.velocity-high", (d) => void (pipe(d, "p1").size = "10"), ["p1"]],
    ["pipe.gradient-high", (d) => void (pipe(d, "p1").size = "10"), ["p1"]],
    ["heat-source.min-flow", (d) => void ((part(d, "hp").props!).minFlowM3h = 2), ["hp"]],
    ["system.volume-low", (d) => void ((part(d, "hp").props!).minSystemVolumeL = 500), ["hp"]],
    ["vessel.too-small", (d) => void (part(d, "ev").props = { volumeL: 1 }), ["ev"]],
    ["fluid.frost-protection", (d) => void (d.design.minOutdoorTemperatureC = -10), ["hp"]],
    ["input.pipe-length", (d) => void (pipe(d, "p3").lengthM = -2), ["p3"]],
    ["input.pipe-diameter", (d) => void (pipe(d, "p3").innerDiameterMm = 0), ["p3"]],
    ["input.pipe-size", (d) => void (pipe(d, "p3").size = "99"), ["p3"]],
    ["input.pipe-roughness", (d) => void Object.assign(pipe(d, "p3"), { innerDiameterMm: 5, roughnessMm: 6 }), ["p3"]],
    ["input.delta-t", (d) => { d.design.flowTemperatureC = 40; d.design.returnTemperatureC = 40; }, []],
    ["input.fill-pressure", (d) => void (d.design.coldFillPressureBar = 3.5), []],
    ["bypass.opening-low", (d) => withBypass(d, 1), ["bp"]],
    ["emitter.undersized", (d) => void ((part(d, "r1").props!).heatLoadW = 2000), ["r1"]],
    ["safety-valve.setting", (d) => void (part(d, "sv").props = { setBar: 2.5 }), ["sv"]],
    ["scenario.unknown-valve", (d) => void (d.scenarios = [{ name: "x", valves: { nope: false } }]), []],
  ];
  for (const [code, change, refs] of cases) {
    it(code, () => {
      const f = find(findings(change), code);
      expect(f, `no ${code}`).toBeDefined();
      expect(f!.message.length).toBeGreaterThan(10);
      expect(f!.refs).toEqual(expect.arrayContaining(refs));
    });
  }

  it("zones.can-all-shut is gone once a dp-bypass gives the heat source a path", () => {
    const fs = findings((d) => withBypass(d, null));
    expect(codes(fs)).not.toContain("zones.can-all-shut");
    expect(codes(fs)).not.toContain("bypass.not-across-zones");
  });

  it("bypass.not-across-zones when the bypass sits where no circuit passes", () => {
    const fs = findings((d) => {
      d.parts.push({ id: "bp", type: "dp-bypass-valve", props: { kvs: 2, openingKpa: null } });
      d.pipes.push({ id: "pb", from: "bp.a", to: "bp.b", material: "copper", size: "15", lengthM: 0.3 });
    });
    expect(find(fs, "bypass.not-across-zones")!.refs).toEqual(["bp"]);
  });

  it("scenarios.limited when there are more zone valves than per-zone scenarios", () => {
    const fs = findings((d) => {
      let from = "tf.b";
      for (let i = 0; i < 22; i++) {
        d.parts.push({ id: `zv${i}`, type: "zone-valve" });
        d.pipes.push({ id: `pz${i}`, from, to: `zv${i}.a`, material: "copper", size: "15", lengthM: 0.1 });
        from = `zv${i}.b`;
      }
      pipe(d, "p2").from = from;
      pipe(d, "p2").id = "p2";
    });
    expect(find(fs, "scenarios.limited")!.refs).toEqual(["zv20", "zv21"]);
  });
});
