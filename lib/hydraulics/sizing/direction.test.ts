/**
 * Parts piped the wrong way round (direction.ts), each on both sides: the drawing with one part
 * reversed gets one error naming that part (and no other part), the same drawing the right way
 * round gets none. The expected part is the one the test reversed (where the sides tie or a bypass
 * joins them and no load can be told, the heat source, as direction.ts documents); the one design flow checked by
 * number is q = P/(ρ·cp·ΔT) (defining equation, water at the 40 °C mean from IAPWS-95 via
 * testing/hand-calc.ts).
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { calculate } from "@/lib/hydraulics/calculate";
import { flowM3h, WATER } from "@/lib/hydraulics/testing/hand-calc";
import { repeatedFindings } from "@/lib/hydraulics/testing/repeated-findings";
import { oneLoadLoop, reversed } from "@/lib/hydraulics/testing/reversed";
import { fixedBypass, SERIES_PUMP_CURVE, smallSystem, withPumpInSeries } from "@/lib/hydraulics/testing/small-system";
import type { Results } from "@/lib/schematic/results";

const CODES = ["heat-source.reversed", "pump.reversed", "load.reversed"];
function results(doc: unknown): Results {
  const r = calculate(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.results;
}
const direction = (doc: unknown) => results(doc).findings.filter((f) => CODES.includes(f.code));
/** "code [refs]" of every direction finding. */
const named = (doc: unknown) => direction(doc).map((f) => `${f.code} [${f.refs.join(", ")}]`);
const cu = (id: string, from: string, to: string) => ({ id, from, to, material: "copper", size: "22", lengthM: 2 });
const LOOP_CURVE = [[0, 30], [1, 20], [2, 0]];

/** The one-load loop with a 40 L buffer: hp.flow ─ buf.p1, buf.p2 ─ pu ─ hp.return; buf.p3 ─ ps ─ hl ─ buf.p4. */
function bufferLoop() {
  const d = oneLoadLoop();
  d.parts.push({ id: "buf", type: "buffer-vessel", props: { volumeL: 40 } } as never, { id: "ps", type: "pump", props: { curve: LOOP_CURVE } } as never);
  d.pipes = [cu("f", "hp.flow", "buf.p1"), cu("r", "buf.p2", "pu.in"), cu("r2", "pu.out", "hp.return"), cu("s1", "buf.p3", "ps.in"), cu("s2", "ps.out", "hl.flow"), cu("s3", "hl.return", "buf.p4")];
  return d;
}

/**
 * bufferLoop with hp and pu reversed, and two heat loads l2, l3 each with one port on a primary
 * side and the other on the secondary: `from`, their flow ports on the primary sides (returns to
 * the secondary return); `to`, their return ports on the primary sides (flows from the secondary flow).
 */
function crossLoads(end: "from" | "to") {
  const d = reversed(reversed(bufferLoop(), "hp"), "pu");
  const load = (id: string) => ({ id, type: "heat-load", props: { heatLoadW: 1000, kv: 1, waterVolumeL: 1 } });
  d.parts.push(...(["t1", "t2", "t3", "t4"].map((id) => ({ id, type: "tee" })) as never[]), load("l2") as never, load("l3") as never);
  // reversed: f runs hp.return ─ buf.p1, r buf.p2 ─ pu.out
  const [a, b] = end === "from" ? [["t1.c", "l2.flow"], ["t2.c", "l3.flow"]] : [["l2.return", "t1.c"], ["l3.return", "t2.c"]];
  const [c, dd] = end === "from" ? [["l2.return", "t3.c"], ["l3.return", "t4.c"]] : [["t3.c", "l2.flow"], ["t4.c", "l3.flow"]];
  const other = end === "from" ? "s3" : "s2";
  const [oa, ob] = end === "from" ? ["hl.return", "buf.p4"] : ["ps.out", "hl.flow"];
  d.pipes = d.pipes.filter((p) => !["f", "r", other].includes(p.id));
  d.pipes.push(cu("f", "hp.return", "t1.a"), cu("fb", "t1.b", "buf.p1"), cu("x1", a![0]!, a![1]!), cu("r", "buf.p2", "t2.a"), cu("rb", "t2.b", "pu.out"), cu("x2", b![0]!, b![1]!),
    cu(other, oa, "t3.a"), cu(`${other}b`, "t3.b", "t4.a"), cu(`${other}c`, "t4.b", ob), cu("x3", c![0]!, c![1]!), cu("x4", dd![0]!, dd![1]!));
  return d;
}

/** fixedBypass with its heat source's pump drawn as a part in series: tb ─p4─ pu ─p5─ hp.return. */
function bypassWithPump() {
  const d = fixedBypass();
  d.parts[0]!.props = { ...d.parts[0]!.props, pumpCurve: null };
  d.parts.push({ id: "pu", type: "pump", props: { curve: [[0, 30], [1, 22], [2, 8], [3, 0]] } });
  d.pipes = d.pipes.filter((p) => p.id !== "p4");
  d.pipes.push(cu("p4", "tb.b", "pu.in"), cu("p5", "pu.out", "hp.return"));
  return d;
}

/** The small system with a pump pz on r2's branch (p3 split around it). */
function zonePump() {
  const d = smallSystem();
  d.parts.push({ id: "pz", type: "pump", props: { curve: SERIES_PUMP_CURVE.map(([q, h]) => [q, h]) } });
  d.pipes = d.pipes.filter((p) => p.id !== "p3");
  d.pipes.push({ ...cu("p3", "tf.c", "pz.in"), size: "15" }, { ...cu("p3b", "pz.out", "r2.flow"), size: "15" });
  return d;
}

const demo = (name: string) => JSON.parse(readFileSync(path.resolve(__dirname, "../../../db/seeds/data", name), "utf8"));

describe("a heat source piped the wrong way round", () => {
  it.each(["heat-pump", "boiler"])("a %s among two radiators is named, an error that says what to do; the right way round, nothing", (type) => {
    const doc = smallSystem();
    doc.parts[0]!.type = type;
    expect(named(doc)).toEqual([]);
    const [f, ...rest] = direction(reversed(doc, "hp"));
    expect(rest).toEqual([]);
    expect(f).toMatchObject({ severity: "error", code: "heat-source.reversed", refs: ["hp"] });
    expect(f!.message).toMatch(/^hp: piped the wrong way round/);
    expect(f!.message).toMatch(/Swap the pipes at its flow and return/);
    expect(f!.message).toMatch(/manufacturer's instructions/);
    // no pump of its own (the small system's pump is a part): nothing said about one
    expect(f!.message).toMatch(/can overheat, short-cycle or trip: check the connections/);
  });

  it("behind a fixed bypass the sides do not say: its design flow, entering by its flow port, names it", () => {
    expect(named(fixedBypass())).toEqual([]);
    const r = results(reversed(fixedBypass(), "hp"));
    const f = r.findings.filter((x) => CODES.includes(x.code));
    expect(f.map((x) => x.refs)).toEqual([["hp"]]);
    expect(f[0]!.message).toMatch(/design flow \(\d\.\d{3} m³\/h in heating mode\) enters by its flow port/);
    expect(f[0]!.message).toMatch(/its own pump pushes against the circuit/);
    // its head is given the other way (design.ts): the flows settle, the duty is the turned-round one
    expect(r.findings.map((x) => x.code)).not.toContain("design.not-converged");
    expect(r.modes[0]!.pump!.requiredHeadKpa).toBeGreaterThan(0);
  });

  it("in a one-load loop with a pump, the pump sides with the load: the heat source is named", () => {
    expect(named(oneLoadLoop())).toEqual([]);
    expect(named(reversed(oneLoadLoop(), "hp"))).toEqual(["heat-source.reversed [hp]"]);
  });

  it("reversed together with the small system's pump: both are named (the heat source by its sides, the pump by its design flow)", () => {
    expect(named(reversed(reversed(smallSystem(), "hp"), "pump"))).toEqual(["heat-source.reversed [hp]", "pump.reversed [pump]"]);
  });

  it("before a buffer's primary, where the heat source and the buffer tie, its design flow names it", () => {
    expect(named(bufferLoop())).toEqual([]);
    expect(named(reversed(bufferLoop(), "hp"))).toEqual(["heat-source.reversed [hp]"]);
  });

  it("behind a fixed bypass, a pump in series: a radiator drawn backwards passes both backwards; no load can be told, the heat source alone is named", () => {
    expect(named(bypassWithPump())).toEqual([]);
    expect(named(reversed(bypassWithPump(), "rad"))).toEqual(["heat-source.reversed [hp]"]);
    expect(named(reversed(reversed(bypassWithPump(), "hp"), "pu"))).toEqual(["heat-source.reversed [hp]"]);
  });

  it("with its primary pump before a buffer, both reversed: the pump sides with it, no load joins their sides, the heat source is named", () => {
    expect(named(reversed(reversed(bufferLoop(), "hp"), "pu"))).toEqual(["heat-source.reversed [hp]"]);
  });

  it.each(["from", "to"] as const)("a load whose %s port alone sits on one of the tied heat source's sides is not the one reversed", (end) => {
    // hp and pu reversed before a buffer, and two loads whose one port each is on a primary side
    // (their other port on the secondary): the primary sides still tie, no load joins them both
    expect(named(crossLoads(end))).toEqual(["heat-source.reversed [hp]"]);
  });
});

describe("a pump drawn backwards", () => {
  it("its design flow runs from its outlet to its inlet: named with that flow, the loop's load at q = P/(ρ·cp·ΔT)", () => {
    const [f, ...rest] = direction(reversed(oneLoadLoop(), "pu"));
    expect(rest).toEqual([]);
    expect(f).toMatchObject({ severity: "error", code: "pump.reversed", refs: ["pu"] });
    const q = Number(/design flow \((\d+\.\d+) m³\/h in heating mode\) runs from its outlet to its inlet/.exec(f!.message)![1]);
    // 3 kW at 10 K: hand value; ±0.001 covers the message's three decimals
    expect(q).toBeCloseTo(flowM3h(3000, 10, WATER[40]), 3);
    expect(f!.message).toMatch(/manufacturer's instructions/);
  });

  it("the small system's pump, and either of two pumps in series, is the one named", () => {
    expect(named(reversed(smallSystem(), "pump"))).toEqual(["pump.reversed [pump]"]);
    expect(named(withPumpInSeries())).toEqual([]);
    expect(named(reversed(withPumpInSeries(), "pump2"))).toEqual(["pump.reversed [pump2]"]);
    expect(named(reversed(withPumpInSeries(), "pump"))).toEqual(["pump.reversed [pump]"]);
  });

  it("a zone pump on one radiator's branch, not the pump that drives its side, is named", () => {
    expect(named(zonePump())).toEqual([]);
    expect(named(reversed(zonePump(), "pz"))).toEqual(["pump.reversed [pz]"]);
  });

  it("two pumps drawn side by side (in parallel, pump.not-in-series) are not called backwards", () => {
    const d = smallSystem();
    d.parts.push({ id: "tp1", type: "tee" }, { id: "tp2", type: "tee" }, { id: "pump2", type: "pump", props: { curve: SERIES_PUMP_CURVE.map(([q, h]) => [q, h]) } });
    const cu = (id: string, from: string, to: string) => ({ id, from, to, material: "copper", size: "22", lengthM: 0.3 });
    d.pipes = d.pipes.filter((p) => p.id !== "p6c" && p.id !== "p7");
    d.pipes.push(cu("p6c", "ts.b", "tp1.a"), cu("q1", "tp1.b", "pump.in"), cu("q2", "pump.out", "tp2.a"), cu("q3", "tp1.c", "pump2.in"), cu("q4", "pump2.out", "tp2.b"), cu("p7", "tp2.c", "hp.return"));
    expect(results(d).findings.map((f) => f.code)).toContain("pump.not-in-series");
    expect(named(d)).toEqual([]);
  });
});

describe("a load piped the wrong way round", () => {
  it.each([
    ["radiator", {}, ["flow", "return"], /Thermostatic radiator valves/],
    ["ufh-loop", { heatLoadW: 1000 }, ["flow", "return"], /flow bar and its return bar/],
    ["fan-coil", { heatLoadW: 1000 }, ["flow", "return"], /not a design until it is fixed\.$/],
    ["heat-load", { heatLoadW: 1000 }, ["flow", "return"], /not a design until it is fixed\.$/],
    ["cylinder", { coilOutputKw: 1 }, ["coilFlow", "coilReturn"], /loses its counterflow/],
  ] as const)("a %s in place of r1 is named alone; the right way round, nothing", (type, props, [flow, ret], note) => {
    const doc = smallSystem();
    const r1 = doc.parts.find((p) => p.id === "r1")!;
    if (type !== "radiator") Object.assign(r1, { type, props });
    for (const p of doc.pipes) for (const end of ["from", "to"] as const) p[end] = ({ "r1.flow": `r1.${flow}`, "r1.return": `r1.${ret}` } as Record<string, string>)[p[end]] ?? p[end];
    expect(named(doc)).toEqual([]);
    const [f, ...rest] = direction(reversed(doc, "r1"));
    expect(rest).toEqual([]);
    expect(f).toMatchObject({ severity: "error", code: "load.reversed", refs: ["r1"] });
    expect(f!.message).toMatch(/^r1: piped the wrong way round — its flow port is on the return side/);
    expect(f!.message).toMatch(note);
  });

  it("in a one-load loop the heat source and the pump, both passed backwards, agree: the load is named", () => {
    expect(named(reversed(oneLoadLoop(), "hl"))).toEqual(["load.reversed [hl]"]);
  });

  it("a cylinder coil on a buffered primary circuit is named, once, though both modes size it", () => {
    const r = results(reversed(demo("millbrook-hall.json"), "cyl"));
    expect(r.findings.filter((f) => CODES.includes(f.code)).map((f) => f.refs)).toEqual([["cyl"]]);
    expect(repeatedFindings(r.findings)).toEqual([]);
  });
});

describe("said once, whatever the mode", () => {
  it("a primary pump passed backwards in heating and hot-water mode is one finding with no mode", () => {
    const r = results(reversed(demo("millbrook-hall.json"), "pp"));
    expect(r.modes.map((m) => m.mode)).toEqual(["heating", "hot-water"]);
    const f = r.findings.filter((x) => CODES.includes(x.code));
    expect(f.map((x) => x.refs)).toEqual([["pp"]]);
    expect(f[0]!.mode).toBeUndefined();
    expect(repeatedFindings(r.findings)).toEqual([]);
  });

  it("a heat pump with its own pump, backwards among nine radiators and a cylinder, is one finding", () => {
    const r = results(reversed(demo("orchard-end-bypass-only.json"), "hp"));
    expect(r.findings.filter((x) => CODES.includes(x.code)).map((x) => x.refs)).toEqual([["hp"]]);
    expect(repeatedFindings(r.findings)).toEqual([]);
  });
});
