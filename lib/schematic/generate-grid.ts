/**
 * Deterministic looped networks for the benchmark and solver stress tests: a
 * flow grid and a return grid of a × b junctions (manifolds with four
 * outlets: west, east, north, south, and one radiator), neighbours joined by
 * copper pipes, a radiator between each flow junction and its return twin. A
 * boiler with its own pump feeds the flow grid's first corner and takes the
 * return from the return grid's far corner (every radiator then sees a
 * similar path: a grid "reverse return"). Every grid cell is a loop, so the
 * solver's matrix is a 2-D mesh Laplacian — the hard case for fill-in,
 * unlike the near-tree buildings of generate-building.ts.
 *
 * Pure TypeScript: same target, same document.
 */
import type { Schematic } from "./schema";

/** Pipes of an a × b grid: two grids of 2ab − a − b, two radiator tails per node, supply, return, vessel leg. */
export const gridPipeCount = (a: number, b: number) => 2 * (2 * a * b - a - b) + 2 * a * b + 3;

/** The most nearly square grid whose pipe count is at or just above `targetPipes`. */
export function generateGridWithPipes(targetPipes: number): Schematic {
  let a = 2;
  while (gridPipeCount(a, a) < targetPipes) a++;
  const b = gridPipeCount(a, a - 1) >= targetPipes ? a - 1 : a;
  return generateGrid(a, b);
}

export function generateGrid(a: number, b: number): Schematic {
  if (!(a >= 2 && b >= 2)) throw new RangeError("a grid needs a ≥ 2 and b ≥ 2");
  const parts: Schematic["parts"] = [];
  const pipes: Schematic["pipes"] = [];
  const fit = { elbow: 0, bend: 0, teeRun: 1, teeBranch: 0, reducer: 0 };
  const loadW = 300;
  const qTotal = ((a * b * loadW) / (983.2 * 4185 * 20)) * 3600; // m³/h at 70/50 (ρ, cp at 60 °C)
  const head = 40; // kPa at the design flow: generous for a grid of 5 m runs
  parts.push({
    id: "boiler", type: "boiler", x: -300, y: 0, label: "Boiler with pump",
    props: { ratedOutputKw: Math.ceil((a * b * loadW * 1.2) / 1000), minFlowM3h: 0, kv: Math.max(1, Math.round(qTotal / Math.sqrt(0.2) * 100) / 100), waterVolumeL: 20, minSystemVolumeL: null,
      pumpCurve: [[0, head * 1.4], [qTotal * 0.5, head * 1.25], [qTotal, head], [qTotal * 1.5, head * 0.5], [qTotal * 2, 0]].map(([q, h]) => [Math.round(q! * 1000) / 1000, Math.round(h! * 10) / 10]) as [number, number][] },
  });
  parts.push({ id: "ev", type: "expansion-vessel", x: -300, y: 300, props: { volumeL: 200, prechargeBar: 1 } });
  const node = (g: "f" | "r", i: number, j: number) => `${g}${i}-${j}`;
  for (const g of ["f", "r"] as const) {
    for (let i = 0; i < a; i++) {
      for (let j = 0; j < b; j++) parts.push({ id: node(g, i, j), type: "manifold", x: i * 200 + (g === "r" ? 60 : 0), y: j * 200 + (g === "r" ? 60 : 0), props: { outlets: 4 } });
    }
  }
  const pipe = (id: string, from: string, to: string, size: string, lengthM: number, extra: Partial<Schematic["pipes"][number]> = {}) =>
    pipes.push({ id, from, to, material: "copper", size, lengthM, fittings: fit, ...extra });
  // ports: common = from the west/south feed, p1 east, p2 north, p3 south, p4 radiator
  for (const g of ["f", "r"] as const) {
    for (let i = 0; i < a; i++) {
      for (let j = 0; j < b; j++) {
        if (i + 1 < a) pipe(`${g}x${i}-${j}`, `${node(g, i, j)}.p1`, `${node(g, i + 1, j)}.common`, "54", 5);
        if (j + 1 < b) pipe(`${g}y${i}-${j}`, `${node(g, i, j)}.p2`, `${node(g, i, j + 1)}.p3`, "54", 5);
      }
    }
  }
  for (let i = 0; i < a; i++) {
    for (let j = 0; j < b; j++) {
      const rad = `rad${i}-${j}`;
      parts.push({ id: rad, type: "radiator", x: i * 200 + 30, y: j * 200 + 100,
        props: { outputAtDt50W: 500, exponentN: 1.3, roomTemperatureC: 20, heatLoadW: loadW, valveKv: 0.3, deltaTK: null, waterVolumeL: 3 } });
      pipe(`${rad}-f`, `${node("f", i, j)}.p4`, `${rad}.flow`, "15", 3);
      pipe(`${rad}-r`, `${rad}.return`, `${node("r", i, j)}.p4`, "15", 3);
    }
  }
  // supply into the flow grid's first corner (its free west port), return from the return grid's far corner (free east port)
  const bore = Math.ceil(Math.sqrt((4 * qTotal) / 3600 / (Math.PI * 1.0)) * 100) * 10;
  pipe("supply", "boiler.flow", `${node("f", 0, 0)}.common`, "DN50", 2, { material: "steel", innerDiameterMm: Math.max(53.1, bore) });
  pipe("return", `${node("r", a - 1, b - 1)}.p1`, "boiler.return", "DN50", 2, { material: "steel", innerDiameterMm: Math.max(53.1, bore) });
  pipe("ev-leg", `${node("r", 0, 0)}.common`, "ev.connection", "22", 1);
  return {
    format: "loopwright/schematic",
    version: 1,
    name: `Generated grid — ${a} × ${b} radiators, looped flow and return`,
    fluid: { kind: "water" },
    design: { flowTemperatureC: 70, returnTemperatureC: 50, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 300, fillTemperatureC: 10, maxFlowTemperatureC: null, hotWaterFlowTemperatureC: null, minOutdoorTemperatureC: null },
    parts,
    pipes,
    scenarios: [{ name: "all zones open", mode: "heating", valves: {} }],
  };
}
