/**
 * A small, hand-checkable system for tests: heat pump → flow tee → two
 * radiators in parallel → return tee → tee with expansion vessel and safety
 * valve → pump → heat pump. Copper pipes, no fittings. Tests mutate a copy.
 *
 *   hp.flow ─p1─ tf ─p2─ r1 ─p4─ tr ─p6a─ te ─p6b─ ts ─p6c─ pump ─p7─ hp.return
 *                  └p3─ r2 ─p5─┘        └pev─ ev    └psv─ sv
 */
export function smallSystem() {
  const pipe = (id: string, from: string, to: string, size: string, lengthM: number) => ({
    id,
    from,
    to,
    material: "copper",
    size,
    lengthM,
  });
  return {
    format: "loopwright/schematic",
    version: 1,
    name: "small test system",
    fluid: { kind: "water" },
    design: {
      flowTemperatureC: 45,
      returnTemperatureC: 40,
      coldFillPressureBar: 1.2,
      safetyValveBar: 3,
      staticHeightM: 5,
      maxVelocityMps: 1,
      targetGradientPaPerM: 300,
      minOutdoorTemperatureC: 5,
    },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 3, minFlowM3h: 0.1, kv: 4, waterVolumeL: 2 } },
      { id: "pump", type: "pump", props: { curve: SERIES_PUMP_CURVE.map(([q, h]) => [q, h]) } },
      { id: "tf", type: "tee" },
      { id: "tr", type: "tee" },
      { id: "te", type: "tee" },
      { id: "ts", type: "tee" },
      { id: "r1", type: "radiator", props: { outputAtDt50W: 3000, heatLoadW: 1000, valveKv: 1, waterVolumeL: 6 } },
      { id: "r2", type: "radiator", props: { outputAtDt50W: 1500, heatLoadW: 500, valveKv: 1, waterVolumeL: 3 } },
      { id: "ev", type: "expansion-vessel", props: { volumeL: 8 } },
      { id: "sv", type: "safety-valve", props: { setBar: 3 } },
    ] as { id: string; type: string; props?: Record<string, unknown> }[],
    pipes: [
      pipe("p1", "hp.flow", "tf.a", "22", 5),
      pipe("p2", "tf.b", "r1.flow", "15", 3),
      pipe("p3", "tf.c", "r2.flow", "15", 8),
      pipe("p4", "r1.return", "tr.a", "15", 3),
      pipe("p5", "r2.return", "tr.b", "15", 8),
      pipe("p6a", "tr.c", "te.a", "22", 2),
      pipe("p6b", "te.b", "ts.a", "22", 0.5),
      pipe("p6c", "ts.b", "pump.in", "22", 0.5),
      pipe("p7", "pump.out", "hp.return", "22", 5),
      pipe("pev", "te.c", "ev.connection", "15", 0.5),
      pipe("psv", "ts.c", "sv.connection", "15", 0.3),
    ] as { id: string; from: string; to: string; material: string; size: string; lengthM: number; [k: string]: unknown }[],
    scenarios: undefined as unknown,
  };
}

export type SmallSystem = ReturnType<typeof smallSystem>;

/** The small system's pump curve, which a second pump in series repeats. */
export const SERIES_PUMP_CURVE: [number, number][] = [[0, 40], [0.5, 35], [1, 25], [1.5, 10]];

/** The small system with a second, identical pump in series after the first (p7 split around it). */
export function withPumpInSeries(): SmallSystem {
  const d = smallSystem();
  d.parts.push({ id: "pump2", type: "pump", props: { curve: SERIES_PUMP_CURVE.map(([q, h]) => [q, h]) } });
  d.pipes = d.pipes.filter((p) => p.id !== "p7");
  d.pipes.push({ id: "p7", from: "pump.out", to: "pump2.in", material: "copper", size: "22", lengthM: 2.5 },
    { id: "p8", from: "pump2.out", to: "hp.return", material: "copper", size: "22", lengthM: 2.5 });
  return d;
}

/**
 * The small system's design conditions at 45/35 °C around one radiator with a fixed bypass beside it:
 * hp.flow ─p1─ ta ─p2─ rad ─p3─ tb ─p4─ hp.return, and ta ─x1─ bv (Kv 0.5) ─x2─ tb. The heat
 * source's own pump is on a loop through the bypass, so its head is a fixed point (sizing/design.ts).
 */
export function fixedBypass() {
  const part = (id: string, type: string, props: Record<string, unknown> = {}) => ({ id, type, props });
  const cu = (id: string, from: string, to: string, lengthM: number) => ({ id, from, to, material: "copper", size: "22", lengthM });
  return {
    ...smallSystem(),
    design: { ...smallSystem().design, flowTemperatureC: 45, returnTemperatureC: 35 },
    parts: [
      part("hp", "heat-pump", { ratedOutputKw: 5, minFlowM3h: 0, kv: 4, waterVolumeL: 2, pumpCurve: [[0, 30], [1, 22], [2, 8], [3, 0]] }),
      part("ta", "tee"),
      part("tb", "tee"),
      part("rad", "radiator", { outputAtDt50W: 8000, heatLoadW: 2000, valveKv: 1.5, waterVolumeL: 10 }),
      part("bv", "balancing-valve", { kv: 0.5 }),
    ],
    pipes: [cu("p1", "hp.flow", "ta.a", 2), cu("p2", "ta.b", "rad.flow", 5), cu("p3", "rad.return", "tb.a", 5), cu("p4", "tb.b", "hp.return", 2), cu("x1", "ta.c", "bv.a", 0.5), cu("x2", "bv.b", "tb.c", 0.5)],
  };
}
