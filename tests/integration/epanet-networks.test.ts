/**
 * Looped and multi-branch networks: the engine's simulated scenario ("all zones
 * open": pump on its curve, radiators as Kv resistances, nothing forced) against
 * EPANET 2.2 (Rossman, L. A., Woo, H., Tryby, M., Shang, F., Janke, R., Haxton,
 * T. (2020), EPANET 2.2 User Manual, EPA/600/R-20/133, U.S. Environmental
 * Protection Agency; OWA-EPANET 2.2 source as WebAssembly through epanet-js).
 * epanet-compare.test.ts covers a series loop and one two-branch split; this
 * file covers a reverse-return layout, a direct-return layout with the index
 * circuit at the far end, and a bridged (non-series-parallel) mesh.
 *
 * Unlike epanet-compare, no flow is handed to EPANET: the whole closed loop is
 * built there, heat source included, and EPANET finds the operating point
 * itself. The mapping follows the contract (schematic-format.md): a tee is one
 * node; every other part port is its own node; a pipe joins two ports; the heat
 * source is its pump (return → flow) in series with its Kv; a radiator is its
 * valveKv (flow → return). EPANET needs a fixed-grade node, so a reservoir is
 * tied by a 1 m pipe to the expansion vessel's port — the engine's pressure
 * reference — and carries no flow in a closed loop.
 *
 * Conversions (as in epanet-compare.test.ts):
 * - pipes: Darcy–Weisbach, SI (LPS), catalogue inner diameter and roughness,
 *   length, ΣK of fittings from the engine's catalogue; kinematic viscosity
 *   relative to EPANET's reference 1.1e-5 ft²/s;
 * - Kv parts: TCV with K = 1.598874e-3·d⁴/Kv² (d mm), so K·ρv²/2 = (Q/Kv)²·ρ/1000 bar;
 * - EPANET's resistances use g = 32.2 ft/s² (9.81456 m/s²), so a head h (m) is
 *   Δp = ρ·9.81456·h and a pump head in kPa becomes kPa·1000/(ρ·9.81456) m;
 * - pump: the heat source's curve, points [m³/h, kPa] → [L/s, m]. With more
 *   than three points EPANET 2.2 treats a curve as CUSTOM, piecewise linear
 *   between points (hydcoeffs.c, pumpcoeff / curvecoeff) — the engine's rule
 *   (pumps/curve.ts). A three-point curve would be fitted as a power function
 *   instead, so every curve here has six points.
 *
 * Two comparisons per network:
 * 1. raw: EPANET with its own friction factor, Swamee–Jain (1976) for Re ≥ 4000
 *    (hydcoeffs.c, frictionFactor), against the engine's Colebrook–White. For
 *    copper at 1e4 ≤ Re ≤ 1e6 Swamee–Jain is within 0.9 % of Colebrook
 *    (references.md §3.1 grid scan); the deviation is measured per pipe below
 *    and must be < 1 %. Flows: a branch flow goes as √(Δp), and the deviation
 *    has the same sign and nearly the same size in every pipe (same material,
 *    similar Re), so it mostly cancels in the split; the pump curve is shallow
 *    there, so the total moves by less than half of it too → ≤ 0.5 % on every
 *    flow. Pipe Δp: f deviation (≤ 0.9 %) plus twice the flow deviation → 1.5 %.
 * 2. frozen friction factor (tight): EPANET is given, for every pipe, a
 *    1 µm-long pipe whose minor-loss K is f_CW·L/D + ΣK with f_CW = Colebrook
 *    at the engine's own simulated flow (computed here, not taken from the
 *    engine). The engine's solution is a fixed point of that network, so
 *    EPANET must reproduce every flow and pipe Δp to its convergence (accuracy
 *    1e-8) and the engine's (Σ|Δq|/Σ|q| < 1e-5, Newton, so the last step is far
 *    smaller) plus EPANET's rounding of 8/(gπ²) to 0.02517 (1.4e-4 on passive
 *    losses, ~7e-5 on flows): 5e-4 on flows and Δp. This proves topology,
 *    tees, Kv devices, pump curve and fluid properties agree exactly and that
 *    the friction formula is the only difference in the raw comparison.
 */
import { beforeAll, describe, expect, it } from "vitest";
import type { Workspace } from "epanet-js/slim";
import { FlowUnits, HeadLossType, LinkProperty, LinkType, NodeProperty, NodeType, Option, Project } from "epanet-js";
import { findPipeSize, type PipeMaterial } from "@/lib/hydraulics/pipes/catalogue";
import { sumFittingsK } from "@/lib/hydraulics/losses/fittings";
import type { Schematic } from "@/lib/schematic";
import { sized } from "./helpers/sized";
import { G_EPANET, loadEpanet, NU_REF_EPANET, swameeJain, TCV_REF_DIAMETER_MM } from "./helpers/epanet";

const FROZEN_LENGTH_M = 1e-6; // friction of the stand-in pipe: ~1e-7 of its K

let workspace: Workspace;
beforeAll(async () => {
  workspace = await loadEpanet();
});

/** Colebrook (1939) by fixed-point iteration on x = 1/√f (independent of the engine's solver). */
function colebrookWhite(re: number, relRough: number): number {
  let x = 7;
  for (let i = 0; i < 200; i++) {
    const next = -2 * Math.log10(relRough / 3.7 + (2.51 * x) / re);
    if (Math.abs(next - x) < 1e-14) return 1 / (next * next);
    x = next;
  }
  return 1 / (x * x);
}

interface PipeGeom {
  d: number; // inner diameter, mm
  eps: number; // roughness, mm
  length: number; // m
  sumK: number;
}

function geometry(doc: Schematic): Map<string, PipeGeom> {
  const out = new Map<string, PipeGeom>();
  for (const pipe of doc.pipes) {
    const row = findPipeSize(pipe.material as PipeMaterial, pipe.size)!;
    const d = pipe.innerDiameterMm ?? row.innerDiameterMm;
    out.set(pipe.id, { d, eps: pipe.roughnessMm ?? row.roughnessMm, length: pipe.lengthM, sumK: sumFittingsK(pipe.fittings ?? {}, d) });
  }
  return out;
}

const reynolds = (qM3h: number, dMm: number, nu: number) => (4 * Math.abs(qM3h)) / 3600 / (Math.PI * (dMm / 1000) * nu);

interface EpanetRun {
  /** link flow, m³/h (pipes by pipe id, loads and the heat source by part id) */
  flowM3h: Map<string, number>;
  /** pipe Δp from node heads, kPa, from → to */
  pipeDropKpa: Map<string, number>;
}

/**
 * The schematic as a closed EPANET 2.2 network. `frozenQ` (engine flows, m³/h):
 * replace each pipe's friction by a fixed K = f_CW(q)·L/D (comparison 2).
 */
function runEpanet(doc: Schematic, rho: number, nu: number, frozenQ?: Map<string, number>): EpanetRun {
  const p = new Project(workspace as never);
  p.init("networks.rpt", "", FlowUnits.LPS, HeadLossType.DW);
  p.setOption(Option.SpViscos, nu / NU_REF_EPANET);
  p.setOption(Option.Accuracy, 1e-8); // the API floor; the .inp parser would clamp to 1e-5
  p.setOption(Option.Trials, 500);
  const nodeOf = new Map<string, string>(); // "part.port" → EPANET node id
  const addJunction = (id: string) => p.addNode(id, NodeType.Junction);
  let vesselNode: string | null = null;
  for (const part of doc.parts) {
    switch (part.type) {
      case "tee":
        addJunction(part.id);
        for (const port of ["a", "b", "c"]) nodeOf.set(`${part.id}.${port}`, part.id);
        break;
      case "heat-pump":
      case "radiator":
        for (const port of ["flow", "return"]) {
          addJunction(`${part.id}.${port}`);
          nodeOf.set(`${part.id}.${port}`, `${part.id}.${port}`);
        }
        break;
      case "expansion-vessel":
        vesselNode = `${part.id}.connection`;
        addJunction(vesselNode);
        nodeOf.set(vesselNode, vesselNode);
        break;
      default:
        throw new Error(`no EPANET mapping for part type ${part.type}`);
    }
  }
  const addTcv = (id: string, from: string, to: string, kv: number) => {
    const i = p.addLink(id, LinkType.TCV, from, to);
    p.setLinkValue(i, LinkProperty.Diameter, TCV_REF_DIAMETER_MM);
    p.setLinkValue(i, LinkProperty.InitSetting, (1.598874e-3 * TCV_REF_DIAMETER_MM ** 4) / kv ** 2);
  };
  for (const part of doc.parts) {
    if (part.type === "heat-pump") {
      const curve = part.props.pumpCurve!;
      p.addCurve(`${part.id}-curve`);
      const c = p.getCurveIndex(`${part.id}-curve`);
      p.setCurve(
        c,
        curve.map(([q]) => q / 3.6),
        curve.map(([, h]) => (h * 1000) / (rho * G_EPANET)),
      );
      const mid = `${part.id}.mid`;
      addJunction(mid);
      const pump = p.addLink(`${part.id}.pump`, LinkType.Pump, `${part.id}.return`, mid);
      p.setLinkValue(pump, LinkProperty.PumpHCurve, c);
      addTcv(part.id, mid, `${part.id}.flow`, part.props.kv!);
    } else if (part.type === "radiator") {
      addTcv(part.id, `${part.id}.flow`, `${part.id}.return`, part.props.valveKv!);
    }
  }
  const geom = geometry(doc);
  for (const pipe of doc.pipes) {
    const g = geom.get(pipe.id)!;
    const i = p.addLink(pipe.id, LinkType.Pipe, nodeOf.get(pipe.from)!, nodeOf.get(pipe.to)!);
    p.setLinkValue(i, LinkProperty.Diameter, g.d);
    const q = frozenQ?.get(pipe.id) ?? 0;
    if (frozenQ && Math.abs(q) > 0) {
      const f = colebrookWhite(reynolds(q, g.d, nu), g.eps / g.d);
      p.setLinkValue(i, LinkProperty.Length, FROZEN_LENGTH_M);
      p.setLinkValue(i, LinkProperty.Roughness, g.eps); // EPANET rejects 0; irrelevant over 1 µm
      p.setLinkValue(i, LinkProperty.MinorLoss, (f * g.length) / (g.d / 1000) + g.sumK);
    } else {
      p.setLinkValue(i, LinkProperty.Length, g.length);
      p.setLinkValue(i, LinkProperty.Roughness, g.eps); // mm for D-W in SI
      if (g.sumK > 0) p.setLinkValue(i, LinkProperty.MinorLoss, g.sumK); // EPANET 2.2 rejects an explicit 0
    }
  }
  const r = p.addNode("R", NodeType.Reservoir);
  p.setNodeValue(r, NodeProperty.Elevation, 200);
  const tie = p.addLink("tie", LinkType.Pipe, "R", vesselNode!);
  p.setLinkValue(tie, LinkProperty.Length, 1);
  p.setLinkValue(tie, LinkProperty.Diameter, 25);
  p.setLinkValue(tie, LinkProperty.Roughness, 0.0015);
  p.solveH();
  const out: EpanetRun = { flowM3h: new Map(), pipeDropKpa: new Map() };
  const head = (node: string) => p.getNodeValue(p.getNodeIndex(node), NodeProperty.Head);
  for (const pipe of doc.pipes) {
    out.flowM3h.set(pipe.id, p.getLinkValue(p.getLinkIndex(pipe.id), LinkProperty.Flow) * 3.6);
    const dh = head(nodeOf.get(pipe.from)!) - head(nodeOf.get(pipe.to)!);
    out.pipeDropKpa.set(pipe.id, (rho * G_EPANET * dh) / 1000);
  }
  for (const part of doc.parts) {
    if (part.type === "radiator" || part.type === "heat-pump") {
      out.flowM3h.set(part.id, p.getLinkValue(p.getLinkIndex(part.id), LinkProperty.Flow) * 3.6);
    }
  }
  out.flowM3h.set("tie", p.getLinkValue(tie, LinkProperty.Flow) * 3.6);
  p.close();
  return out;
}

interface Check {
  what: string;
  engine: number;
  epanet: number;
  deviation: number;
  tolerance: number;
}

interface Compared {
  engineFlow: Map<string, number>;
  epFlow: Map<string, number>;
  checks: Check[];
  maxDev: Record<string, number>;
}

/**
 * Simulate the "all zones open" scenario, run EPANET raw and frozen, and list
 * every flow and pipe-Δp comparison with its tolerance (see the header).
 */
function compareNetwork(schematic: unknown, label: string): Compared {
  const { doc, results } = sized(schematic);
  const sc = results.scenarios.find((s) => s.name === "all zones open");
  expect(sc, "the engine runs the default scenario").toBeDefined();
  expect(sc!.converged).toBe(true);
  const rho = results.fluid.densityKgM3!;
  const nu = results.fluid.kinematicViscosityM2s!;
  const engineFlow = new Map<string, number>();
  const engineDrop = new Map<string, number>();
  for (const x of sc!.pipes) {
    engineFlow.set(x.id, x.flowM3h!);
    engineDrop.set(x.id, x.pressureDropKpa!);
  }
  for (const e of sc!.emitters) engineFlow.set(e.id, e.flowM3h!);
  engineFlow.set("hp", sc!.heatSourceFlowM3h!);
  const geom = geometry(doc);
  // Every flowing pipe is turbulent well above Dunlop's / the engine's
  // transition zones (which differ: cubic 2000–4000 vs linear 2300–4000), and
  // Swamee–Jain stays within 1 % of Colebrook there.
  const flowing = doc.pipes.filter((x) => Math.abs(engineFlow.get(x.id)!) > 1e-6).map((x) => x.id);
  let sjDev = 0;
  for (const id of flowing) {
    const g = geom.get(id)!;
    const re = reynolds(engineFlow.get(id)!, g.d, nu);
    expect(re, `${id} Re`).toBeGreaterThan(1e4);
    sjDev = Math.max(sjDev, Math.abs(swameeJain(re, g.eps / g.d) / colebrookWhite(re, g.eps / g.d) - 1));
  }
  expect(sjDev).toBeLessThan(0.01);

  const raw = runEpanet(doc, rho, nu);
  const frozen = runEpanet(doc, rho, nu, engineFlow);
  // a closed loop: nothing leaves through the reservoir tie
  expect(Math.abs(raw.flowM3h.get("tie")!)).toBeLessThan(1e-6);
  expect(Math.abs(frozen.flowM3h.get("tie")!)).toBeLessThan(1e-6);

  const checks: Check[] = [];
  const add = (what: string, engine: number, epanet: number, tolerance: number) =>
    checks.push({ what, engine, epanet, deviation: engine / epanet - 1, tolerance });
  const flowIds = [...flowing, ...sc!.emitters.map((e) => e.id), "hp"];
  for (const id of flowIds) {
    add(`${id} flow raw`, engineFlow.get(id)!, raw.flowM3h.get(id)!, 0.005);
    add(`${id} flow frozen-f`, engineFlow.get(id)!, frozen.flowM3h.get(id)!, 5e-4);
  }
  for (const id of flowing) {
    add(`${id} Δp raw`, engineDrop.get(id)!, raw.pipeDropKpa.get(id)!, 0.015);
    add(`${id} Δp frozen-f`, engineDrop.get(id)!, frozen.pipeDropKpa.get(id)!, 5e-4);
  }
  const maxDev: Record<string, number> = {};
  for (const c of checks) {
    const key = c.what.replace(/^\S+ /, "");
    maxDev[key] = Math.max(maxDev[key] ?? 0, Math.abs(c.deviation));
  }
  console.log(
    `${label}: heat-source flow engine ${engineFlow.get("hp")!.toFixed(4)} / EPANET ${raw.flowM3h.get("hp")!.toFixed(4)} m³/h; ` +
      `max |SJ/CW − 1| ${(sjDev * 100).toFixed(3)} %\n  ` +
      Object.entries(maxDev)
        .map(([k, v]) => `max ${k}: ${(v * 100).toFixed(4)} %`)
        .join("; ") +
      "\n  " +
      checks
        .filter((c) => c.what.endsWith("raw"))
        .map((c) => `${c.what}: engine ${c.engine.toFixed(4)}, EPANET ${c.epanet.toFixed(4)} (${(c.deviation * 100).toFixed(3)} %)`)
        .join("\n  "),
  );
  return { engineFlow, epFlow: raw.flowM3h, checks, maxDev };
}

const expectWithin = (checks: Check[]) => {
  for (const c of checks) {
    expect(Math.abs(c.deviation), `${c.what}: engine ${c.engine}, EPANET ${c.epanet}`).toBeLessThan(c.tolerance);
  }
};

const design = { flowTemperatureC: 55, returnTemperatureC: 45, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5 };
// [m³/h, kPa], six points → EPANET CUSTOM curve (piecewise linear, as the engine)
const pumpCurve = [
  [0, 75],
  [0.6, 72],
  [1.2, 64],
  [1.8, 50],
  [2.4, 30],
  [3, 5],
];
const hp = (x: number, y: number) => ({
  id: "hp",
  type: "heat-pump",
  x,
  y,
  props: { ratedOutputKw: 8, minFlowM3h: 0, kv: 4, waterVolumeL: 2, pumpCurve },
});
const rad = (id: string, x: number, valveKv: number) => ({
  id,
  type: "radiator",
  x,
  y: 100,
  props: { outputAtDt50W: 2500, exponentN: 1.3, roomTemperatureC: 20, heatLoadW: 1500, valveKv },
});
const tee = (id: string, x: number, y: number) => ({ id, type: "tee", x, y });
const vessel = [
  { id: "tev", type: "tee", x: 20, y: 300 },
  { id: "ev", type: "expansion-vessel", x: 20, y: 400, props: { volumeL: 12, prechargeBar: 1 } },
];
const cu = (id: string, from: string, to: string, size: string, lengthM: number, fittings: Record<string, number> = {}) => ({
  id,
  from,
  to,
  material: "copper",
  size,
  lengthM,
  fittings,
});

// --- Network 1: reverse return (first in, last out), 4 radiators ----------
// Flow main hp → tf1 → tf2 → tf3 → rad4; return main starts at rad1 and picks
// up rad2, rad3, rad4 (tr2, tr3, tr4) on its way back. Main segments of
// different lengths and sizes, radiator valves preset differently, so the
// split is materially unequal.
const reverseReturn = {
  format: "loopwright/schematic",
  version: 1,
  name: "EPANET cross-check — reverse return, 4 radiators",
  fluid: { kind: "water" },
  design,
  parts: [
    hp(0, 200),
    tee("tf1", 100, 50),
    tee("tf2", 200, 50),
    tee("tf3", 300, 50),
    rad("rad1", 100, 0.7),
    rad("rad2", 200, 1.0),
    rad("rad3", 300, 1.3),
    rad("rad4", 400, 0.9),
    tee("tr2", 200, 150),
    tee("tr3", 300, 150),
    tee("tr4", 400, 150),
    ...vessel,
  ],
  pipes: [
    cu("f0", "hp.flow", "tf1.a", "28", 4, { elbow: 2 }),
    cu("f1", "tf1.c", "tf2.a", "28", 5, { teeRun: 1 }),
    cu("f2", "tf2.c", "tf3.a", "22", 7, { teeRun: 1 }),
    cu("f3", "tf3.c", "rad4.flow", "22", 3, { elbow: 1 }),
    cu("b1", "tf1.b", "rad1.flow", "15", 2, { teeBranch: 1, elbow: 2 }),
    cu("b2", "tf2.b", "rad2.flow", "15", 1.5, { teeBranch: 1 }),
    cu("b3", "tf3.b", "rad3.flow", "15", 2.5, { teeBranch: 1, elbow: 1 }),
    cu("r1", "rad1.return", "tr2.a", "22", 6, { elbow: 2 }),
    cu("c2", "rad2.return", "tr2.b", "15", 1.5, { elbow: 1 }),
    cu("r2", "tr2.c", "tr3.a", "22", 8),
    cu("c3", "rad3.return", "tr3.b", "15", 2, { elbow: 1 }),
    cu("r3", "tr3.c", "tr4.a", "28", 4),
    cu("c4", "rad4.return", "tr4.b", "15", 1, { elbow: 1 }),
    cu("r4", "tr4.c", "tev.a", "28", 12, { elbow: 4 }),
    cu("r5", "tev.b", "hp.return", "28", 1),
    cu("pev", "tev.c", "ev.connection", "15", 0.5),
  ],
};

describe("reverse return vs EPANET 2.2 (Rossman et al. 2020, US EPA)", () => {
  it("splits the simulated flow between 4 radiators and loses the same Δp per pipe as EPANET", () => {
    const { engineFlow, epFlow, checks } = compareNetwork(reverseReturn, "reverse return");
    const ids = ["rad1", "rad2", "rad3", "rad4"];
    const eng = ids.map((id) => engineFlow.get(id)!);
    const ep = ids.map((id) => epFlow.get(id)!);
    // the split is materially unequal (EPANET 2.2): an "equal split" bug would be ≥ 10 % off somewhere
    expect(Math.max(...ep) / Math.min(...ep)).toBeGreaterThan(1.25);
    const mean = ep.reduce((a, b) => a + b, 0) / 4;
    expect(Math.max(...ep.map((q) => Math.abs(q / mean - 1)))).toBeGreaterThan(0.1);
    // continuity at the heat source (engine): radiator flows add up
    expect(eng.reduce((a, b) => a + b, 0)).toBeCloseTo(engineFlow.get("hp")!, 6);
    expectWithin(checks);
  });
});

// --- Network 2: direct return, 4 branches of unequal length ----------------
// Flow and return mains both run out from the heat source; the far branch
// (rad4) has the longest circuit — the index circuit. Equal radiator valves:
// the split comes from the mains alone, falling from near to far.
const directReturn = {
  format: "loopwright/schematic",
  version: 1,
  name: "EPANET cross-check — direct return, 4 branches",
  fluid: { kind: "water" },
  design,
  parts: [
    hp(0, 200),
    tee("tf1", 100, 50),
    tee("tf2", 200, 50),
    tee("tf3", 300, 50),
    rad("rad1", 100, 1.0),
    rad("rad2", 200, 1.0),
    rad("rad3", 300, 1.0),
    rad("rad4", 400, 1.0),
    tee("tr1", 100, 150),
    tee("tr2", 200, 150),
    tee("tr3", 300, 150),
    ...vessel,
  ],
  pipes: [
    cu("f0", "hp.flow", "tf1.a", "28", 3, { elbow: 2 }),
    cu("f1", "tf1.c", "tf2.a", "22", 6, { teeRun: 1 }),
    cu("f2", "tf2.c", "tf3.a", "22", 8, { teeRun: 1 }),
    cu("f3", "tf3.c", "rad4.flow", "15", 10, { elbow: 2 }),
    cu("b1f", "tf1.b", "rad1.flow", "15", 1, { teeBranch: 1 }),
    cu("b2f", "tf2.b", "rad2.flow", "15", 3, { teeBranch: 1, elbow: 1 }),
    cu("b3f", "tf3.b", "rad3.flow", "15", 2, { teeBranch: 1 }),
    cu("b1r", "rad1.return", "tr1.b", "15", 1),
    cu("b2r", "rad2.return", "tr2.b", "15", 3, { elbow: 1 }),
    cu("b3r", "rad3.return", "tr3.b", "15", 2),
    cu("r3", "rad4.return", "tr3.a", "15", 10, { elbow: 2 }),
    cu("r2", "tr3.c", "tr2.a", "22", 8, { teeRun: 1 }),
    cu("r1", "tr2.c", "tr1.a", "22", 6, { teeRun: 1 }),
    cu("r0", "tr1.c", "tev.a", "28", 3, { elbow: 2 }),
    cu("r00", "tev.b", "hp.return", "28", 1),
    cu("pev", "tev.c", "ev.connection", "15", 0.5),
  ],
};

describe("direct return vs EPANET 2.2 (Rossman et al. 2020, US EPA)", () => {
  it("gives the near branches more flow than the far (index) branch, as EPANET does", () => {
    const { engineFlow, epFlow, checks } = compareNetwork(directReturn, "direct return");
    const ids = ["rad1", "rad2", "rad3", "rad4"];
    const eng = ids.map((id) => engineFlow.get(id)!);
    const ep = ids.map((id) => epFlow.get(id)!);
    // EPANET 2.2: strictly falling from near to far, and far from equal
    for (let i = 1; i < 4; i++) expect(ep[i]!).toBeLessThan(ep[i - 1]!);
    expect(ep[0]! / ep[3]!).toBeGreaterThan(1.25);
    for (let i = 1; i < 4; i++) expect(eng[i]!).toBeLessThan(eng[i - 1]!);
    expectWithin(checks);
  });
});

// --- Network 3: a bridged mesh (not series-parallel) ------------------------
// Two legs from tee ts to tee tt, each through two radiators in series
// (A then C; B then D), with a cross pipe between their midpoints X and Y:
// a Wheatstone bridge. Kv_A/Kv_C ≠ Kv_B/Kv_D, so the bridge carries flow
// X → Y; no reduction to series and parallel pieces solves it.
const mesh = {
  format: "loopwright/schematic",
  version: 1,
  name: "EPANET cross-check — bridged mesh",
  fluid: { kind: "water" },
  design,
  parts: [
    hp(0, 200),
    tee("ts", 100, 100),
    rad("radA", 200, 1.4),
    rad("radB", 200, 0.6),
    tee("tx", 300, 50),
    tee("ty", 300, 150),
    rad("radC", 400, 0.6),
    rad("radD", 400, 1.4),
    tee("tt", 500, 100),
    ...vessel,
  ],
  pipes: [
    cu("p0", "hp.flow", "ts.a", "28", 4, { elbow: 2 }),
    cu("pa1", "ts.b", "radA.flow", "15", 2, { teeBranch: 1 }),
    cu("pa2", "radA.return", "tx.a", "15", 3),
    cu("pb1", "ts.c", "radB.flow", "15", 2.5, { teeBranch: 1 }),
    cu("pb2", "radB.return", "ty.a", "15", 2),
    cu("bridge", "tx.c", "ty.c", "15", 4, { elbow: 2, teeBranch: 2 }),
    cu("pc1", "tx.b", "radC.flow", "15", 2),
    cu("pc2", "radC.return", "tt.a", "15", 3),
    cu("pd1", "ty.b", "radD.flow", "15", 3),
    cu("pd2", "radD.return", "tt.b", "15", 2.5),
    cu("p1", "tt.c", "tev.a", "28", 6, { elbow: 2, teeBranch: 1 }),
    cu("p2", "tev.b", "hp.return", "28", 1),
    cu("pev", "tev.c", "ev.connection", "15", 0.5),
  ],
};

describe("bridged mesh vs EPANET 2.2 (Rossman et al. 2020, US EPA)", () => {
  it("carries the same cross-connection flow, in the same direction, as EPANET", () => {
    const { engineFlow, epFlow, checks } = compareNetwork(mesh, "bridged mesh");
    const total = epFlow.get("hp")!;
    const bridge = epFlow.get("bridge")!;
    // EPANET 2.2: the bridge carries a material share of the total, X → Y (positive = drawn direction)
    expect(bridge / total).toBeGreaterThan(0.1);
    expect(engineFlow.get("bridge")! / total).toBeGreaterThan(0.1);
    // continuity at X and Y in the engine
    expect(engineFlow.get("radA")! - engineFlow.get("bridge")! - engineFlow.get("radC")!).toBeCloseTo(0, 6);
    expect(engineFlow.get("radB")! + engineFlow.get("bridge")! - engineFlow.get("radD")!).toBeCloseTo(0, 6);
    expectWithin(checks);
  });
});
