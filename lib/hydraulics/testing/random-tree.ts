/**
 * Random two-pipe trees for the optimiser's tests: a heat pump (its own pump
 * curve, or a separate pump), a flow tree of tees out to 1–3 radiators, a
 * return tree back (the mirror of the flow tree — direct return — or another
 * random tree over the radiators, which makes the circuit sets cross, as a
 * reverse return does), isolation valves splitting some runs in two. Copper,
 * three sizes offered ("15", "22", "28") at random prices; loads small enough
 * that 15 mm stays within 1 m/s everywhere, so every pipe has exactly those
 * three candidates. The builder records each radiator's path (pipes and
 * valves), so a test can evaluate any choice of sizes on its own.
 */

export interface TreeCase {
  doc: Record<string, unknown> & { pipes: { id: string; size: string; lengthM: number }[] };
  /** per radiator: the pipes from the heat source's flow to it and from it back, the Kv devices on the way */
  circuits: { rad: string; loadW: number; valveKv: number; pipes: string[]; valves: string[] }[];
  /** Kv of each isolation valve, by id */
  valveKv: Record<string, number>;
  prices: Record<string, number>;
  /** heat pump Kv, pump curve, and whether a separate pump part drives the loop */
  hpKv: number;
  curve: [number, number][];
  pumpPart: boolean;
}

export const TREE_SIZES = ["15", "22", "28"] as const;

export function randomTree(r: () => number, maxPipes = 12, shape: { radiators?: number; direct?: boolean } = {}): TreeCase {
  // radiators: 1–3, as many as 2·(2L − 1) pipes (flow and return trees) leave room for
  const most = Math.max(1, Math.min(3, Math.floor((maxPipes / 2 + 1) / 2)));
  const L = Math.min(most, shape.radiators ?? 1 + Math.floor(r() * most));
  const pumpPart = 2 * (2 * L - 1) < maxPipes && r() < 0.3;
  const parts: Record<string, unknown>[] = [];
  const pipes: TreeCase["doc"]["pipes"] = [];
  let budget = maxPipes - 2 * (2 * L - 1) - (pumpPart ? 1 : 0);
  let n = 0;
  const kvOf: Record<string, number> = {};
  // one run between two ports: a pipe, or pipe – isolation valve – pipe while the budget lasts
  const run = (from: string, to: string): { pipes: string[]; valves: string[] } => {
    const pipe = (a: string, b: string) => {
      const id = `p${++n}`;
      pipes.push({ id, from: a, to: b, material: "copper", size: TREE_SIZES[Math.floor(r() * 3)]!, lengthM: Math.round((0.5 + r() * 14) * 10) / 10 } as never);
      return id;
    };
    if (budget > 0 && r() < 0.35) {
      budget--;
      const v = `v${n + 1}`;
      const kv = Math.round((2 + r() * 6) * 10) / 10;
      kvOf[v] = kv;
      parts.push({ id: v, type: "isolation-valve", props: { kv, open: true } });
      return { pipes: [pipe(from, `${v}.a`), pipe(`${v}.b`, to)], valves: [v] };
    }
    return { pipes: [pipe(from, to)], valves: [] };
  };
  const paths = Array.from({ length: L }, () => ({ pipes: [] as string[], valves: [] as string[] }));
  const add = (leaves: number[], seg: { pipes: string[]; valves: string[] }) => {
    for (const i of leaves) {
      paths[i]!.pipes.push(...seg.pipes);
      paths[i]!.valves.push(...seg.valves);
    }
  };
  const split = (leaves: number[]): [number[], number[]] => {
    const cut = 1 + Math.floor(r() * (leaves.length - 1));
    return [leaves.slice(0, cut), leaves.slice(cut)];
  };
  let tee = 0;
  const shapes = new Map<string, [number[], number[]]>();
  const flow = (leaves: number[], from: string) => {
    if (leaves.length === 1) return add(leaves, run(from, `rad${leaves[0]}.flow`));
    const t = `tf${++tee}`;
    parts.push({ id: t, type: "tee" });
    add(leaves, run(from, `${t}.a`));
    const [a, b] = split(leaves);
    shapes.set(leaves.join(","), [a, b]);
    flow(a, `${t}.b`);
    flow(b, `${t}.c`);
  };
  const direct = shape.direct ?? r() < 0.5;
  const back = (leaves: number[], to: string) => {
    if (leaves.length === 1) return add(leaves, run(`rad${leaves[0]}.return`, to));
    const t = `tr${++tee}`;
    parts.push({ id: t, type: "tee" });
    add(leaves, run(`${t}.a`, to));
    const [a, b] = direct ? shapes.get(leaves.join(","))! : split(leaves);
    back(a, `${t}.b`);
    back(b, `${t}.c`);
  };
  const leaves = [...Array(L).keys()];
  const curveHead = 2 + r() * 38;
  const curve: [number, number][] = [[0, curveHead], [0.5, curveHead * 0.9], [1, curveHead * 0.6], [1.5, curveHead * 0.2]];
  const hpKv = Math.round((2 + r() * 6) * 10) / 10;
  parts.push({ id: "hp", type: "heat-pump", props: { ratedOutputKw: 8, minFlowM3h: 0, kv: hpKv, waterVolumeL: 2, pumpCurve: pumpPart ? null : curve } });
  let root = "hp.flow";
  let rootSeg = { pipes: [] as string[], valves: [] as string[] };
  if (pumpPart) {
    parts.push({ id: "pump", type: "pump", props: { curve } });
    rootSeg = { pipes: [`p${n + 1}`], valves: [] };
    pipes.push({ id: `p${++n}`, from: "hp.flow", to: "pump.in", material: "copper", size: TREE_SIZES[Math.floor(r() * 3)]!, lengthM: Math.round((0.5 + r() * 3) * 10) / 10 } as never);
    root = "pump.out";
  }
  flow(leaves, root);
  // not direct: the return picks the radiators up in reverse (a reverse return), or in a random order
  const order = direct ? [...leaves] : [...leaves].reverse();
  if (!direct && r() < 0.5) {
    for (let i = order.length - 1; i > 0; i--) {
      const j = Math.floor(r() * (i + 1));
      [order[i], order[j]] = [order[j]!, order[i]!];
    }
  }
  back(order, "hp.return");
  const circuits = leaves.map((i) => {
    const loadW = Math.round(300 + r() * 1600);
    const valveKv = Math.round((0.4 + r() * 2.6) * 100) / 100;
    parts.push({ id: `rad${i}`, type: "radiator", props: { outputAtDt50W: 4000, exponentN: 1.3, roomTemperatureC: 20, heatLoadW: loadW, valveKv } });
    return { rad: `rad${i}`, loadW, valveKv, pipes: [...rootSeg.pipes, ...paths[i]!.pipes], valves: paths[i]!.valves };
  });
  const prices = Object.fromEntries(TREE_SIZES.map((s) => [s, Math.round((1 + r() * 49) * 100) / 100]));
  const doc = {
    format: "loopwright/schematic",
    version: 1,
    name: "random tree",
    fluid: { kind: "water" },
    design: { flowTemperatureC: 50, returnTemperatureC: 40, coldFillPressureBar: 1.2, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1, targetGradientPaPerM: 300 },
    parts,
    pipes,
  };
  return { doc, circuits, valveKv: kvOf, prices, hpKv, curve, pumpPart };
}
