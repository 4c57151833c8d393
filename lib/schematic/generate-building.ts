/**
 * Deterministic generator of large, physically plausible schematics, for the
 * benchmark and for solver stress tests. A multi-storey building: a plant room
 * (boiler, isolation valves, safety valve, pump, dp bypass, strainer, expansion
 * vessel sized after EN 12828) feeding one or more two-pipe risers through a
 * basement main; on every floor a tee off each riser → zone valve → flow
 * manifold with N outlets → N radiators → return manifold → tee on the return
 * riser. Pipes are sized for their design flow (smallest catalogue size within
 * 1 m/s and ~250 Pa/m; above DN50 a steel pipe with an inner-diameter
 * override) and the pump curve covers the index circuit with margin, so a
 * sound engine answers with few findings.
 *
 * Pure TypeScript: no randomness, no clock — same options, same document.
 */
import { pipeCatalogue, type PipeSize } from "@/lib/hydraulics/pipes/catalogue";
import type { Schematic } from "./schema";

export interface BuildingOptions {
  floors: number;
  radiatorsPerFloor: number;
  /** Risers (wings) fed from a basement main; each serves every floor. Default 1. */
  risers?: number;
  /** Storey height, m (riser segment length). */
  floorHeightM?: number;
  /** Mean radiator heat load, W; loads vary ±25 % in a fixed pattern. */
  radiatorLoadW?: number;
  flowTemperatureC?: number;
  returnTemperatureC?: number;
  /**
   * Extra isolation valves on radiator flow tails (each adds one part and one
   * pipe) — how generateBuildingWithPipes hits a pipe count exactly.
   */
  extraValves?: number;
  /**
   * Scenarios written into the document. Default: one, "all zones open" —
   * without it the engine would simulate "only <zone valve> open" for every
   * floor, which measures the scenario count rather than the solver.
   */
  scenarios?: Schematic["scenarios"];
}

const RHO = 983.2; // kg/m³, water at 60 °C (mean of 70/50, references.md §1.1): sizing only
const CP = 4185; // J/(kg·K), same
const MAX_V = 1.0; // m/s, sizing velocity and design.maxVelocityMps
const MAX_R = 250; // Pa/m, sizing gradient (UK practice 150–250 Pa/m, references.md §9)
const MAX_FLOORS = 20; // per riser in generateBuildingWithPipes: keeps static height ≤ 60 m

const round3 = (x: number) => Math.round(x * 1000) / 1000;

/** Design flow, m³/h, for a load in W at ΔT in K (Q = P / (ρ·cp·ΔT)). */
const flowM3h = (loadW: number, dtK: number) => (loadW / (RHO * CP * dtK)) * 3600;

interface Sized {
  material: "copper" | "steel";
  size: string;
  innerDiameterMm: number;
  override?: number;
}

const copper = pipeCatalogue.copper.filter((p) => Number(p.size) >= 15);
const steel = pipeCatalogue.steel;

/**
 * Smallest catalogue pipe with v ≤ MAX_V and an estimated gradient ≤ MAX_R; beyond
 * DN50 a steel pipe with a d_i override in 10 mm steps (velocity rule only).
 */
function sizeFor(q: number): Sized {
  const fits = (p: PipeSize) =>
    q / 3600 / ((Math.PI * (p.innerDiameterMm / 1000) ** 2) / 4) <= MAX_V && gradientPaPerM(q, p.innerDiameterMm) <= MAX_R;
  const cu = copper.find(fits);
  if (cu) return { material: "copper", size: cu.size, innerDiameterMm: cu.innerDiameterMm };
  const st = steel.find(fits);
  if (st) return { material: "steel", size: st.size, innerDiameterMm: st.innerDiameterMm };
  const dMm = Math.ceil(Math.sqrt((4 * q) / 3600 / (Math.PI * MAX_V)) * 100) * 10;
  return { material: "steel", size: "DN50", innerDiameterMm: dMm, override: dMm };
}

/** Rough friction gradient, Pa/m (Blasius f = 0.316·Re^-0.25, ν 0.5e-6): only to shape the pump curve. */
function gradientPaPerM(q: number, dMm: number): number {
  const d = dMm / 1000;
  const v = q / 3600 / ((Math.PI * d * d) / 4);
  const re = Math.max((v * d) / 0.5e-6, 1);
  const f = re < 2300 ? 64 / re : 0.316 * re ** -0.25;
  return (f / d) * ((RHO * v * v) / 2);
}

/** Pipes the generator makes for a building (without extra valves). */
export function buildingPipeCount(floors: number, radiatorsPerFloor: number, risers = 1): number {
  // plant room (12: isolation valves, safety valve, pump, bypass, vessel, strainer); basement
  // main up to each riser tee, flow and return (2(R−1)); per riser: riser segments (2F), floor branches off the tees (2(F−1)),
  // zone valve→manifold (F), radiator tails (2NF).
  const perRiser = 2 * floors + 2 * (floors - 1) + floors + 2 * radiatorsPerFloor * floors;
  return 12 + 2 * (risers - 1) + risers * perRiser;
}

export function generateBuilding(options: BuildingOptions): Schematic {
  const F = Math.floor(options.floors);
  const N = Math.floor(options.radiatorsPerFloor);
  const R = Math.floor(options.risers ?? 1);
  if (!(F >= 1) || !(N >= 1) || N > 64 || !(R >= 1)) {
    throw new RangeError("floors ≥ 1, risers ≥ 1 and 1 ≤ radiatorsPerFloor ≤ 64");
  }
  const storeyM = options.floorHeightM ?? 3;
  const meanLoadW = options.radiatorLoadW ?? 800;
  const tf = options.flowTemperatureC ?? 70;
  const tr = options.returnTemperatureC ?? 50;
  const dt = tf - tr;
  let extra = Math.max(0, Math.floor(options.extraValves ?? 0));

  const parts: Schematic["parts"] = [];
  const pipes: Schematic["pipes"] = [];
  const fit = (f: Partial<Schematic["pipes"][number]["fittings"]> = {}) => ({
    elbow: 0, bend: 0, teeRun: 0, teeBranch: 0, reducer: 0, ...f,
  });
  const pipe = (id: string, from: string, to: string, q: number, lengthM: number, f = fit()) => {
    const s = sizeFor(q);
    pipes.push({
      id, from, to, material: s.material, size: s.size, lengthM, fittings: f,
      ...(s.override ? { innerDiameterMm: s.override } : {}),
    });
  };
  // Kv for a drop of dpKpa at q, within the schema's 0.1…1000 (very large plant: valves lose a little more)
  const kvFor = (q: number, dpKpa: number) => Math.min(1000, Math.max(0.1, Math.round((q / Math.sqrt(dpKpa / 100)) * 100) / 100));

  // Loads in a fixed ±25 % pattern so that circuits differ and balancing has work to do.
  const loadOf = (floor: number, i: number) => Math.round(meanLoadW * (0.75 + 0.125 * ((floor * 3 + i * 7) % 5)));
  const floorLoad: number[] = [];
  for (let k = 1; k <= F; k++) {
    let sum = 0;
    for (let i = 1; i <= N; i++) sum += loadOf(k, i);
    floorLoad.push(sum);
  }
  const riserW = floorLoad.reduce((a, b) => a + b, 0);
  const qRiserTotal = flowM3h(riserW, dt);
  const qTotal = qRiserTotal * R;
  // flow carried by a riser at floor k (floors k..F)
  const above = (k: number) => flowM3h(floorLoad.slice(k - 1).reduce((a, b) => a + b, 0), dt);

  // Canvas: basement main along the bottom, risers side by side, floor 1 lowest.
  const wingW = 600 + N * 100;
  const yOf = (k: number) => (F - k) * 300 + 100;
  const yBase = yOf(1) + 300;

  // Plant room, drawn left of the risers: flow along yBase, return along yBase + 200.
  const kvBig = (dpKpa: number) => kvFor(qTotal, dpKpa);
  parts.push({
    id: "boiler", type: "boiler", x: 0, y: yBase + 100, label: "Boiler",
    props: { ratedOutputKw: Math.ceil((riserW * R * 1.1) / 1000), minFlowM3h: 0, kv: kvBig(20), waterVolumeL: 20, minSystemVolumeL: null, pumpCurve: null },
  });
  parts.push({ id: "iso-f", type: "isolation-valve", x: 100, y: yBase, label: "Isolation valve, boiler flow", props: { kv: kvBig(0.5), open: true } });
  parts.push({ id: "t-sv", type: "tee", x: 200, y: yBase, label: "Tee, safety valve", props: {} });
  parts.push({ id: "t-bpf", type: "tee", x: 400, y: yBase, label: "Tee, bypass flow", props: {} });
  parts.push({ id: "bp", type: "dp-bypass-valve", x: 400, y: yBase + 100, label: "Differential-pressure bypass", props: { kvs: kvFor(qTotal * 0.2, 10), openingKpa: null } });
  parts.push({ id: "t-bpr", type: "tee", x: 400, y: yBase + 200, label: "Tee, bypass return", props: {} });
  parts.push({ id: "t-ev", type: "tee", x: 300, y: yBase + 200, label: "Tee, expansion vessel", props: {} });
  parts.push({ id: "str", type: "strainer", x: 200, y: yBase + 200, label: "Strainer", props: { kv: kvBig(3) } });
  parts.push({ id: "iso-r", type: "isolation-valve", x: 100, y: yBase + 200, label: "Isolation valve, boiler return", props: { kv: kvBig(0.5), open: true } });

  // Pump curve through an estimate of the index circuit (farthest riser, top floor) with margin.
  let indexPa = 0;
  for (let j = 1; j <= R; j++) indexPa += 2 * gradientPaPerM(qRiserTotal * (R - j + 1), sizeFor(qRiserTotal * (R - j + 1)).innerDiameterMm) * 10;
  for (let k = 1; k <= F; k++) indexPa += 2 * gradientPaPerM(above(k), sizeFor(above(k)).innerDiameterMm) * storeyM;
  const headKpa = 24 + (indexPa * 1.3) / 1000 + 5 + 25; // boiler 20 + valves 4, fittings ×1.3, zone valve 5, floor + radiator 25
  const h = Math.ceil(headKpa * 1.15);
  parts.push({
    id: "pump", type: "pump", x: 300, y: yBase, label: "Circulating pump",
    props: { curve: [[0, Math.round(h * 1.35)], [round3(qTotal), h], [round3(qTotal * 1.6), Math.round(h * 0.45)]] as [number, number][] },
  });
  pipe("plant-f1", "boiler.flow", "iso-f.a", qTotal, 1.5, fit({ elbow: 2 }));
  pipe("plant-f2", "iso-f.b", "t-sv.a", qTotal, 0.5);
  pipe("plant-f3", "t-sv.b", "pump.in", qTotal, 0.8, fit({ teeRun: 1 }));
  pipe("plant-f4", "pump.out", "t-bpf.a", qTotal, 0.8);
  pipe("bp-f", "t-bpf.c", "bp.a", qTotal * 0.2, 0.5, fit({ teeBranch: 1 }));
  pipe("bp-r", "bp.b", "t-bpr.c", qTotal * 0.2, 0.5, fit({ teeBranch: 1 }));
  pipe("plant-r1", "t-bpr.b", "t-ev.a", qTotal, 0.8, fit({ teeRun: 1 }));
  pipe("plant-r2", "t-ev.b", "str.a", qTotal, 0.5, fit({ teeRun: 1 }));
  pipe("plant-r3", "str.b", "iso-r.a", qTotal, 0.5);
  pipe("plant-r4", "iso-r.b", "boiler.return", qTotal, 1.5, fit({ elbow: 2 }));
  pipe("ev-leg", "t-ev.c", "ev.connection", 0.5, 1, fit({ teeBranch: 1 }));
  pipe("sv-leg", "t-sv.c", "sv.connection", 0.5, 0.3, fit({ teeBranch: 1 }));

  // Basement main: tees m{j} (flow) and n{j} (return) feed risers 1…R−1; riser R hangs off their ends.
  for (let j = 1; j < R; j++) {
    const x = 600 + (j - 1) * wingW;
    parts.push({ id: `m${j}`, type: "tee", x, y: yBase, label: `Main flow tee, riser ${j}`, props: {} });
    parts.push({ id: `n${j}`, type: "tee", x: x + 60, y: yBase + 200, label: `Main return tee, riser ${j}`, props: {} });
    const q = qRiserTotal * (R - j + 1); // flow arriving at tee j
    pipe(`main-f${j}`, j === 1 ? "t-bpf.b" : `m${j - 1}.b`, `m${j}.a`, q, j === 1 ? 2 : 10, fit({ elbow: j === 1 ? 2 : 0, teeRun: 1 }));
    pipe(`main-r${j}`, `n${j}.a`, j === 1 ? "t-bpr.a" : `n${j - 1}.b`, q, j === 1 ? 2 : 10, fit({ elbow: j === 1 ? 2 : 0, teeRun: 1 }));
  }

  for (let j = 1; j <= R; j++) {
    const pre = R === 1 ? "" : `w${j}-`; // ids stay short for the one-riser building
    const x0 = 600 + (j - 1) * wingW;
    const feedF = R === 1 ? "t-bpf.b" : j < R ? `m${j}.c` : `m${R - 1}.b`;
    const feedR = R === 1 ? "t-bpr.a" : j < R ? `n${j}.c` : `n${R - 1}.b`;
    for (let k = 1; k <= F; k++) {
      const y = yOf(k);
      const top = k === F;
      const qFloor = flowM3h(floorLoad[k - 1]!, dt);
      const zv = `${pre}zv${k}`, mf = `${pre}mf${k}`, mr = `${pre}mr${k}`;
      const rf = `${pre}rf${k}`, rr = `${pre}rr${k}`;
      // riser: previous point → this floor's tee, or straight into the top floor's zone valve
      const prevFlow = k === 1 ? feedF : `${pre}rf${k - 1}.b`;
      const prevRet = k === 1 ? feedR : `${pre}rr${k - 1}.b`;
      if (!top) {
        parts.push({ id: rf, type: "tee", x: x0, y, label: `Riser ${j} flow tee, floor ${k}`, props: {} });
        parts.push({ id: rr, type: "tee", x: x0 + 60, y: y + 200, label: `Riser ${j} return tee, floor ${k}`, props: {} });
      }
      const first = k === 1;
      pipe(`${pre}riser-f${k}`, prevFlow, top ? `${zv}.a` : `${rf}.a`, above(k), first ? 2 : storeyM, fit({ elbow: first ? 2 : 0, teeRun: 1 }));
      pipe(`${pre}riser-r${k}`, top ? `${mr}.common` : `${rr}.a`, prevRet, above(k), first ? 2 : storeyM, fit({ elbow: first ? 2 : 0, teeRun: 1 }));
      if (!top) {
        pipe(`${pre}branch-f${k}`, `${rf}.c`, `${zv}.a`, qFloor, 2, fit({ teeBranch: 1, elbow: 1 }));
        pipe(`${pre}branch-r${k}`, `${mr}.common`, `${rr}.c`, qFloor, 2, fit({ teeBranch: 1, elbow: 1 }));
      }
      parts.push({ id: zv, type: "zone-valve", x: x0 + 100, y, label: `Zone valve, riser ${j} floor ${k}`, props: { kvs: kvFor(qFloor, 5), open: true } });
      parts.push({ id: mf, type: "manifold", x: x0 + 200, y: y + 60, label: `Flow manifold, riser ${j} floor ${k}`, props: { outlets: N } });
      parts.push({ id: mr, type: "manifold", x: x0 + 200, y: y + 200, label: `Return manifold, riser ${j} floor ${k}`, props: { outlets: N } });
      pipe(`${pre}zv-mf${k}`, `${zv}.b`, `${mf}.common`, qFloor, 1, fit({ elbow: 1 }));
      for (let i = 1; i <= N; i++) {
        const load = loadOf(k, i);
        const q = flowM3h(load, dt);
        const rad = `${pre}rad${k}-${i}`;
        const lengthM = 3 + 2 * i; // radiators further along the floor get longer tails
        const xr = x0 + 200 + i * 100;
        parts.push({
          id: rad, type: "radiator", x: xr, y: y + 130, label: `Radiator ${j}.${k}.${i}`,
          // ΔT50 rating ≥ load / 0.7: covers the load at 70/50/20 (factor 0.748, EN 442 n = 1.3)
          props: { outputAtDt50W: Math.ceil(load / 0.7 / 50) * 50, exponentN: 1.3, roomTemperatureC: 20, heatLoadW: load, valveKv: 0.5, deltaTK: null, waterVolumeL: Math.round(load / 100) },
        });
        if (extra > 0) {
          extra--;
          const iv = `${pre}iv${k}-${i}`;
          parts.push({ id: iv, type: "isolation-valve", x: xr, y: y + 95, label: `Isolation valve ${j}.${k}.${i}`, props: { kv: 3, open: true } });
          pipe(`${rad}-f`, `${mf}.p${i}`, `${iv}.a`, q, lengthM - 0.5, fit({ elbow: 2 }));
          pipe(`${rad}-fv`, `${iv}.b`, `${rad}.flow`, q, 0.5);
        } else {
          pipe(`${rad}-f`, `${mf}.p${i}`, `${rad}.flow`, q, lengthM, fit({ elbow: 2 }));
        }
        pipe(`${rad}-r`, `${rad}.return`, `${mr}.p${i}`, q, lengthM, fit({ elbow: 2 }));
      }
    }
  }
  // Safety valve, vessel and fill after EN 12828 Annex D (references.md §8.1), sized on the
  // water content drawn here with e = 2.5 % (≥ 2.24 % for 10 → 70 °C) and 20 % spare.
  const staticM = F * storeyM;
  const p0 = Math.round((staticM / 10 + 0.2) * 10) / 10;
  const svBar = Math.min(16, Math.ceil(p0 + 2.5));
  const pe = svBar <= 5 ? svBar - 0.5 : 0.9 * svBar;
  let systemL = 20;
  for (const p of pipes) {
    const d = p.innerDiameterMm ?? pipeCatalogue[p.material].find((c) => c.size === p.size)!.innerDiameterMm;
    systemL += ((Math.PI * d * d) / 4 / 1000) * p.lengthM;
  }
  for (const p of parts) if (p.type === "radiator") systemL += (p.props as { waterVolumeL: number }).waterVolumeL;
  const reserveL = Math.max(0.005 * systemL, 3);
  const vesselL = Math.ceil((((0.025 * systemL + reserveL) * (pe + 1)) / (pe - p0)) * 1.2 / 10) * 10;
  const minFill = ((p0 + 1) * vesselL) / (vesselL - reserveL) - 1;
  const fillBar = Math.ceil(Math.max(p0 + 0.3, minFill + 0.05) * 10) / 10;
  parts.push({ id: "ev", type: "expansion-vessel", x: 300, y: yBase + 300, label: `Expansion vessel ${vesselL} L`, props: { volumeL: vesselL, prechargeBar: p0 } });
  parts.push({ id: "sv", type: "safety-valve", x: 200, y: yBase - 100, label: `Safety valve ${svBar} bar`, props: { setBar: svBar } });

  return {
    format: "loopwright/schematic",
    version: 1,
    name: `Generated building — ${R} riser${R > 1 ? "s" : ""} × ${F} floors × ${N} radiators`,
    fluid: { kind: "water" },
    design: {
      flowTemperatureC: tf, returnTemperatureC: tr, coldFillPressureBar: fillBar,
      safetyValveBar: svBar, staticHeightM: staticM,
      maxVelocityMps: MAX_V, targetGradientPaPerM: 300, fillTemperatureC: 10, maxFlowTemperatureC: null,
      hotWaterFlowTemperatureC: null, minOutdoorTemperatureC: null,
    },
    parts,
    pipes,
    scenarios: options.scenarios ?? [{ name: "all zones open", mode: "heating", valves: {} }],
  };
}

/**
 * A building with exactly `targetPipes` pipes (≥ 17): radiators per floor grow
 * with the size (≈ √target / 5, 4…48), floors up to 20 per riser, as many
 * risers as needed, and isolation valves on radiator tails make up the
 * remainder. Falls back to fewer radiators per floor when the remainder does
 * not fit.
 */
export function generateBuildingWithPipes(targetPipes: number, options: Partial<BuildingOptions> = {}): Schematic {
  const target = Math.floor(targetPipes);
  if (!(target >= 17)) throw new RangeError("targetPipes must be at least 17");
  const n0 = options.radiatorsPerFloor ?? Math.min(48, Math.max(4, Math.round(Math.sqrt(target) / 5)));
  for (let n = n0; n >= 1; n--) {
    for (let risers = 1; risers <= target; risers++) {
      let floors = 0;
      while (floors < MAX_FLOORS && buildingPipeCount(floors + 1, n, risers) <= target) floors++;
      if (floors === 0) break;
      const extraValves = target - buildingPipeCount(floors, n, risers);
      if (floors < MAX_FLOORS || extraValves <= floors * n * risers) {
        if (extraValves <= floors * n * risers) {
          return generateBuilding({ ...options, floors, radiatorsPerFloor: n, risers, extraValves });
        }
        break; // fewer than MAX_FLOORS floors and still too much left: try fewer radiators
      }
    }
  }
  throw new RangeError(`cannot build exactly ${target} pipes`);
}
