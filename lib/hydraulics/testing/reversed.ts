/**
 * Drawings piped the wrong way round, for the direction checks (sizing/direction.ts): a copy of a
 * document with one part's two through ports swapped at every pipe end (flow ↔ return, in ↔ out,
 * coil flow ↔ coil return), and the smallest loop there is — one heat source, one load, a pump.
 */
import { partRegistry } from "@/lib/schematic/parts";
import type { PartType } from "@/lib/schematic/schema";

type Doc = { parts: { id: string; type: string }[]; pipes: { from: string; to: string }[] };

/** A copy of `doc` with part `id` piped the other way round (its registry's through ports swapped). */
export function reversed<T extends Doc>(doc: T, id: string): T {
  const copy = structuredClone(doc);
  const part = copy.parts.find((p) => p.id === id);
  const through = part && partRegistry[part.type as PartType].through;
  if (!through) throw new Error(`reversed: ${id} is no part with a flow direction`);
  const [a, b] = through.map((port) => `${id}.${port}`);
  for (const pipe of copy.pipes) {
    for (const end of ["from", "to"] as const) {
      if (pipe[end] === a) pipe[end] = b!;
      else if (pipe[end] === b) pipe[end] = a!;
    }
  }
  return copy;
}

/**
 * hp.flow ─f─ hl.flow, hl.return ─r─ (pu.in, pu.out ─r2─) hp.return at 45/35 °C: a 3 kW heat load,
 * Copper 22, 2 m a pipe. `ownPump`: the heat pump's own curve drives it, no pump part.
 */
export function oneLoadLoop(ownPump = false) {
  const cu = (id: string, from: string, to: string) => ({ id, from, to, material: "copper", size: "22", lengthM: 2 });
  const curve = [[0, 30], [1, 20], [2, 0]];
  return {
    format: "loopwright/schematic", version: 1, name: "one-load loop", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 500 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, minFlowM3h: 0, kv: 2, waterVolumeL: 2, pumpCurve: ownPump ? curve : null } },
      { id: "hl", type: "heat-load", props: { heatLoadW: 3000, kv: 1, waterVolumeL: 1 } },
      ...(ownPump ? [] : [{ id: "pu", type: "pump", props: { curve } }]),
    ],
    pipes: ownPump
      ? [cu("f", "hp.flow", "hl.flow"), cu("r", "hl.return", "hp.return")]
      : [cu("f", "hp.flow", "hl.flow"), cu("r", "hl.return", "pu.in"), cu("r2", "pu.out", "hp.return")],
  };
}
