/**
 * A schematic as an EPANET 2.2 input file (.inp), node for node and link for
 * link of the engine's own network model (lib/hydraulics/network/model.ts), so
 * the benchmark times both solvers on the same network. The mapping of the
 * EPANET cross-check tests (tests/integration/epanet-networks.test.ts,
 * /work/shared/design/setup-notes.md): pipes as Darcy–Weisbach pipes (LPS, mm),
 * Kv parts as TCVs with K = 1.598874e-3·d⁴/Kv² (d = 25 mm), a pump on its curve
 * converted to L/s and m with EPANET's g, a heat source with its own pump as a
 * pump and its Kv in series, the expansion vessel's node tied to a reservoir by
 * a 1 m × 25 mm pipe (the pressure reference). For the heating scenario "all
 * zones open": diverters to their heating side, the dp bypass shut (as the
 * engine simulates it without a recommended opening).
 */
import { fluidProperties, type FluidSpec } from "@/lib/hydraulics/fluids";
import { sumFittingsK } from "@/lib/hydraulics/losses/fittings";
import { buildModel } from "@/lib/hydraulics/network/model";
import { findPipeSize } from "@/lib/hydraulics/pipes/catalogue";
import type { Part, Schematic } from "@/lib/schematic/schema";

const G_EPANET = 32.2 * 0.3048; // m/s², EPANET's g
const NU_REF_EPANET = 1.1e-5 * 0.3048 ** 2; // m²/s, EPANET's reference viscosity
const TCV_D_MM = 25;
const tcvK = (kv: number | null) => (kv === null ? 0 : (1.598874e-3 * TCV_D_MM ** 4) / kv ** 2);

function kvOf(part: Part): number | null {
  const p = part.props as Record<string, unknown>;
  for (const k of ["kv", "kvs", "valveKv", "coilKv"]) if (typeof p[k] === "number") return p[k] as number;
  return null;
}

export function toInp(doc: Schematic): { inp: string; links: number; nodes: number } {
  const model = buildModel(doc);
  const meanC = (doc.design.flowTemperatureC + doc.design.returnTemperatureC) / 2;
  const fluid = fluidProperties(doc.fluid as FluidSpec, meanC);
  const head = (kpa: number) => (kpa * 1000) / (fluid.densityKgM3 * G_EPANET);
  const junctions: string[] = [];
  const pipes: string[] = [];
  const valves: string[] = [];
  const pumps: string[] = [];
  const curves: string[] = [];
  for (let n = 0; n < model.nodeCount; n++) junctions.push(`n${n}\t0\t0`);
  const pipe = (id: string, a: string, b: string, lengthM: number, dMm: number, epsMm: number, k: number) =>
    pipes.push(`${id}\t${a}\t${b}\t${Math.max(lengthM, 1e-3)}\t${dMm}\t${Math.max(epsMm, 1e-6)}\t${k}\tOpen`);
  const tcv = (id: string, a: string, b: string, kv: number | null) => valves.push(`${id}\t${a}\t${b}\t${TCV_D_MM}\tTCV\t${tcvK(kv)}\t0`);
  const pump = (id: string, a: string, b: string, curve: [number, number][]) => {
    curves.push(...curve.map(([q, h]) => `${id}c\t${q / 3.6}\t${head(h)}`));
    pumps.push(`${id}\t${a}\t${b}\tHEAD ${id}c`);
  };
  model.links.forEach((l, k) => {
    const a = `n${l.from}`;
    const b = `n${l.to}`;
    if (l.role === "pipe") {
      const p = doc.pipes[l.index]!;
      const row = findPipeSize(p.material, p.size);
      const d = p.innerDiameterMm ?? row!.innerDiameterMm;
      return pipe(`l${k}`, a, b, p.lengthM, d, p.roughnessMm ?? row!.roughnessMm, sumFittingsK(p.fittings, d));
    }
    const part = doc.parts[l.index]!;
    switch (l.role) {
      case "heat-source": {
        const curve = (part.props as { pumpCurve?: [number, number][] | null }).pumpCurve;
        if (!curve) return tcv(`l${k}`, a, b, kvOf(part));
        junctions.push(`m${k}\t0\t0`);
        pump(`l${k}p`, a, `m${k}`, curve);
        return tcv(`l${k}`, `m${k}`, b, kvOf(part));
      }
      case "pump":
        return pump(`l${k}`, a, b, (part.props as { curve: [number, number][] }).curve);
      case "load":
        if (part.type === "ufh-loop") return pipe(`l${k}`, a, b, part.props.loopLengthM, part.props.innerDiameterMm, 0.007, 0);
        return tcv(`l${k}`, a, b, kvOf(part));
      case "link":
        if ((part.props as { open?: boolean }).open === false) return;
        return tcv(`l${k}`, a, b, kvOf(part));
      case "diverter-a":
      case "diverter-b":
        if ((l.role === "diverter-a" ? "a" : "b") !== ((part.props as { position?: string }).position ?? "a")) return;
        return tcv(`l${k}`, a, b, kvOf(part));
      case "header-top":
      case "header-bottom":
      case "header-primary":
        return tcv(`l${k}`, a, b, null);
      default:
        return; // dp bypass (shut), header secondary pass (shut when simulating)
    }
  });
  const fixed = [...model.fixed.keys()].filter((n) => model.fixed[n]);
  const reservoirs = fixed.map((n) => `R${n}\t200`);
  fixed.forEach((n) => pipe(`tie${n}`, `R${n}`, `n${n}`, 1, 25, 0.0015, 0));
  const inp = [
    "[TITLE]", doc.name,
    "[JUNCTIONS]", ...junctions,
    "[RESERVOIRS]", ...reservoirs,
    "[PIPES]", ...pipes,
    "[PUMPS]", ...pumps,
    "[VALVES]", ...valves,
    "[CURVES]", ...curves,
    "[OPTIONS]", "Units LPS", "Headloss D-W", `Viscosity ${fluid.kinematicViscosityM2s / NU_REF_EPANET}`, "Accuracy 0.00001", "Trials 50", "Unbalanced CONTINUE 10",
    "[TIMES]", "Duration 0",
    "[REPORT]", "Status No", "Summary No",
    "[END]",
  ].join("\n");
  return { inp, links: pipes.length + pumps.length + valves.length, nodes: junctions.length + reservoirs.length };
}
