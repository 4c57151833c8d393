/**
 * A low-loss header between a primary loop (heat pump with its own pump) and a secondary loop
 * (pump → one radiator, expansion vessel on the primary return): mode-header.test.ts works it out
 * by hand, laws-header-cut.test.ts checks its primary pass is cut at design.
 */
export const CURVE: [number, number][] = [[0, 50], [1, 40], [2, 0]];

/** hpKv: the heat pump's exchanger Kv, 5 unless given; null leaves it unstated (a typical value is assumed). */
export interface Opts { ratedW: number; loadW: number; hpKv?: number | null; valveKv?: number }
export function headerDoc(o: Opts) {
  const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
  return {
    format: "loopwright/schematic", version: 1, name: "header", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 1000 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: o.ratedW / 1000, ...(o.hpKv === null ? {} : { kv: o.hpKv ?? 5 }), waterVolumeL: 2, pumpCurve: CURVE } },
      { id: "llh", type: "low-loss-header", props: { volumeL: 2 } },
      { id: "pump", type: "pump", props: { curve: CURVE } },
      { id: "r1", type: "radiator", props: { outputAtDt50W: 20000, heatLoadW: o.loadW, valveKv: o.valveKv ?? 1, waterVolumeL: 8 } },
      { id: "t", type: "tee" },
      { id: "ev", type: "expansion-vessel", props: { volumeL: 12 } },
    ],
    pipes: [
      cu("pf", "hp.flow", "llh.p1", 3), cu("pr", "llh.p2", "t.a", 2), cu("pr2", "t.b", "hp.return", 1),
      { ...cu("v", "t.c", "ev.connection", 0.5), size: "15" },
      cu("sf", "llh.p3", "pump.in", 3), cu("s1", "pump.out", "r1.flow", 2), cu("s2", "r1.return", "llh.p4", 5),
    ],
    scenarios: [{ name: "run", mode: "heating", valves: {} }],
  };
}
