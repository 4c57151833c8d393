/** Workings of the circuits table: design flow, circuit Δp, Δp to absorb, balancing Kv. */
import { fluidSource, type FluidSpec } from "@/lib/hydraulics/fluids";
import { HEAT_BALANCE_SOURCE } from "@/lib/hydraulics/flow";
import { KV_SOURCE } from "@/lib/hydraulics/losses/kv";
import type { Circuit, ModeResult, Part, Results, Schematic } from "@/lib/schematic";
import { modeOf } from "../overlay/results-mode";
import { assumedLines, f, type Working, type WorkingLine } from "./working-base";

const designDeltaT = (doc: Schematic) => doc.design.flowTemperatureC - doc.design.returnTemperatureC;

/** The heat a load's design flow carries, and where that figure comes from. */
function loadHeat(doc: Schematic, results: Results, part: Part): { w: number | null; what: string } {
  const p = part.props as Record<string, unknown>;
  if (part.type === "buffer-vessel" || part.type === "low-loss-header") {
    const w = doc.parts.reduce((s, x) => s + (x.type === "heat-pump" || x.type === "boiler" ? x.props.ratedOutputKw * 1000 : 0), 0);
    return { w, what: "heat source's rated output (primary pass)" };
  }
  if (part.type === "cylinder") return { w: part.props.coilOutputKw * 1000, what: "coil output" };
  if (part.type === "radiator" && part.props.heatLoadW === null) {
    return { w: results.emitters.find((e) => e.id === part.id)?.outputAtDesignW ?? null, what: "output at design (no heat load given)" };
  }
  return { w: typeof p.heatLoadW === "number" ? p.heatLoadW : null, what: "heat load" };
}

/** q = P/(ρ·cp·ΔT), with the fluid's properties at the mean temperature and their source. */
export function designFlowWorking(doc: Schematic, results: Results, partId: string, mode: ModeResult | null = modeOf(results)): Working | null {
  const part = doc.parts.find((p) => p.id === partId);
  if (!part) return null;
  const own = (part.props as { deltaTK?: number | null }).deltaTK;
  const dT = own ?? designDeltaT(doc);
  const { w, what } = loadHeat(doc, results, part);
  const { densityKgM3: rho, specificHeatJkgK: cp } = results.fluid;
  const flow = mode?.parts.find((p) => p.id === partId)?.flowM3h ?? null;
  const computed = w !== null && rho && cp && dT > 0 ? (w / (rho * cp * dT)) * 3600 : null;
  const fluid = doc.fluid.kind === "water" ? "water" : `${doc.fluid.kind} ${doc.fluid.percentByVolume} % vol`;
  return {
    title: `Design flow of ${part.label ?? part.id}`,
    formula: "q = P / (ρ · cp · ΔT)",
    inputs: [
      { label: `${what} P`, value: `${f(w, 0)} W` },
      { label: `density ρ (${fluid})`, value: `${f(rho, 2)} kg/m³` },
      { label: "specific heat cp", value: `${f(cp, 1)} J/(kg·K)` },
      { label: own ? "the load's own ΔT" : "ΔT = flow − return", value: `${f(dT, 1)} K` },
      { label: "fluid properties at", value: `${f(results.fluid.temperatureC, 1)} °C (mean of flow and return)` },
    ],
    steps: [{ label: "q = P/(ρ·cp·ΔT)", value: `${computed === null ? "—" : (computed / 3600).toExponential(4)} m³/s` }],
    result: `${f(flow, 4)} m³/h`,
    value: flow,
    source: `${HEAT_BALANCE_SOURCE}; fluid properties: ${fluidSource(doc.fluid as FluidSpec)}`,
    figures: { powerW: w ?? NaN, densityKgM3: rho ?? NaN, specificHeatJkgK: cp ?? NaN, deltaTK: dT },
  };
}

/** The drop of each element along the circuit's path, from the pipe and part results. */
export function pathDrops(mode: ModeResult, c: Circuit): { id: string; dpKpa: number }[] {
  const pipes = new Map(mode.pipes.map((p) => [p.id, p]));
  const parts = new Map(mode.parts.map((p) => [p.id, p]));
  // A pump in series on the path (its result is its head: a negative drop) is not a loss here:
  // its head counts in the side's available head (lib/hydraulics/sizing/pumps.ts), as the engine
  // reckons it. A heat source with a pump loses through its own resistance like any part.
  const pumps = new Set(mode.pumps.flatMap((p) => p.pumpIds));
  const isPumpHead = (id: string) => pumps.has(id) && (parts.get(id)?.pressureDropKpa ?? 0) < 0;
  return c.path.filter((id) => !isPumpHead(id)).map((id) => {
    const pipe = pipes.get(id);
    if (pipe) return { id, dpKpa: Math.abs(pipe.pressureDropKpa ?? 0) };
    const dp = parts.get(id)?.pressureDropKpa ?? 0;
    return { id, dpKpa: dp < 0 ? dp : Math.abs(dp) };
  });
}

function circuitOf(results: Results, load: string, mode: ModeResult | null) {
  const m = mode ?? modeOf(results);
  const c = m?.circuits.find((x) => x.load === load);
  return m && c ? { m, c } : null;
}

/** Δp of a circuit = the sum of its elements' drops, pump to load and back. */
export function circuitDpWorking(doc: Schematic, results: Results, load: string, mode?: ModeResult | null): Working | null {
  const x = circuitOf(results, load, mode ?? null);
  if (!x || x.c.pressureDropKpa === null) return null;
  const drops = pathDrops(x.m, x.c);
  const sum = drops.reduce((s, d) => s + d.dpKpa, 0);
  const inputs: WorkingLine[] = drops.filter((d) => d.dpKpa !== 0).map((d) => ({ label: d.id, value: `${f(d.dpKpa, 3)} kPa` }));
  return {
    title: `Pressure drop of the circuit through ${load}`,
    formula: "Δp_circuit = Σ Δp of the pipes and parts on its path (in series), pump outlet → load → pump inlet",
    inputs: inputs.length ? inputs : [{ label: "elements", value: "none with a drop" }],
    steps: [{ label: `sum of ${drops.length} elements`, value: `${f(sum, 3)} kPa` }, { label: "index circuit", value: x.c.index ? "yes (the largest drop of its pump)" : "no" }],
    result: `${f(x.c.pressureDropKpa, 3)} kPa`,
    value: x.c.pressureDropKpa,
    source: "Elements in series add their pressure drops (each pipe by Darcy–Weisbach, each part by its Kv: IEC 60534-1)",
    assumed: assumedLines(results, x.c.restsOn),
    figures: { sumKpa: sum },
  };
}

function indexOf(m: ModeResult, c: Circuit): Circuit | undefined {
  return m.circuits.find((o) => o.index && o.pump === c.pump);
}

/** The excess a non-index circuit must absorb: Δp_index − Δp_circuit. */
export function excessWorking(doc: Schematic, results: Results, load: string, mode?: ModeResult | null): Working | null {
  const x = circuitOf(results, load, mode ?? null);
  if (!x || x.c.excessKpa === null) return null;
  const idx = indexOf(x.m, x.c);
  return {
    title: `Pressure to absorb in the circuit through ${load}`,
    formula: "Δp to absorb = Δp of the index circuit − Δp of this circuit (same pump)",
    inputs: [
      { label: `index circuit (${idx?.load ?? "—"}) Δp`, value: `${f(idx?.pressureDropKpa, 3)} kPa` },
      { label: "this circuit's Δp", value: `${f(x.c.pressureDropKpa, 3)} kPa` },
    ],
    result: `${f(x.c.excessKpa, 3)} kPa`,
    value: x.c.excessKpa,
    source: "Circuits of one pump see the same pump head: each must lose as much as the index circuit at its design flow",
    assumed: assumedLines(results, x.c.restsOn),
    figures: { indexKpa: idx?.pressureDropKpa ?? NaN, circuitKpa: x.c.pressureDropKpa ?? NaN },
  };
}

/** The balancing-valve preset that absorbs the excess at the load's design flow. */
export function balancingKvWorking(doc: Schematic, results: Results, load: string, mode?: ModeResult | null): Working | null {
  const x = circuitOf(results, load, mode ?? null);
  if (!x || x.c.balancingKv === null || x.c.excessKpa === null) return null;
  const q = x.m.parts.find((p) => p.id === load)?.flowM3h ?? null;
  const rho = results.fluid.densityKgM3;
  return {
    title: `Balancing Kv for the circuit through ${load}`,
    formula: "Kv = q · √((ρ/1000) / (Δp / 100 kPa))",
    inputs: [
      { label: "design flow q", value: `${f(q, 4)} m³/h` },
      { label: "Δp to absorb", value: `${f(x.c.excessKpa, 3)} kPa` },
      { label: "density ρ", value: `${f(rho, 2)} kg/m³` },
    ],
    result: f(x.c.balancingKv, 2),
    value: x.c.balancingKv,
    source: KV_SOURCE,
    assumed: assumedLines(results, x.c.restsOn),
    figures: { flowM3h: q ?? NaN, excessKpa: x.c.excessKpa, densityKgM3: rho ?? NaN },
  };
}
