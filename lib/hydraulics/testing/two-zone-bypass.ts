/**
 * Two radiator zones between manifolds, each behind a zone valve, and a differential bypass between
 * the manifolds' third outlets (bypass-verdict.test.ts, bypass-open-unknown.test.ts,
 * laws-bypass-cut.test.ts), with the hand
 * calculation of its zones: copper by Darcy–Weisbach and Colebrook, Kv drops by Δp = ρ/1000·(Q/Kv)²
 * (IEC 60534-1 in its Kv form), water at the 40 °C mean (IAPWS, references §1.1).
 */
import { copperDpKpa, flowM3h, kvDpKpa, WATER } from "./hand-calc";

export const W = WATER[40];
export type Curve = [number, number][];
export const STRONG: Curve = [[0, 60], [0.5, 55], [1, 40], [2, 0]];
export const WEAK: Curve = [[0, 9], [0.5, 8], [1, 5], [2, 0]];

/** hpKv: the heat pump's exchanger Kv, 5 unless given; null leaves it unstated (a typical value is assumed). */
export interface Opts { curve: Curve; valveKv: number; opening?: number | null; minFlow?: number; bypassKvs?: number; hpKv?: number | null }
export function twoZoneBypass(o: Opts) {
  const cu = (id: string, from: string, to: string, size: string, lengthM: number) => ({ id, from, to, material: "copper", size, lengthM });
  const rad = (id: string, heatLoadW: number) => ({ id, type: "radiator", props: { outputAtDt50W: 8000, heatLoadW, valveKv: o.valveKv, waterVolumeL: 8 } });
  return {
    format: "loopwright/schematic", version: 1, name: "bypass verdict", fluid: { kind: "water" },
    design: { flowTemperatureC: 45, returnTemperatureC: 35, coldFillPressureBar: 1.5, safetyValveBar: 3, staticHeightM: 5, maxVelocityMps: 1.5, targetGradientPaPerM: 1000 },
    parts: [
      { id: "hp", type: "heat-pump", props: { ratedOutputKw: 5, minFlowM3h: o.minFlow ?? 0, ...(o.hpKv === null ? {} : { kv: o.hpKv ?? 5 }), waterVolumeL: 2, pumpCurve: o.curve } },
      { id: "mf", type: "manifold", props: { outlets: 3 } },
      { id: "mr", type: "manifold", props: { outlets: 3 } },
      { id: "zv1", type: "zone-valve", props: { kvs: 4, open: true } },
      { id: "zv2", type: "zone-valve", props: { kvs: 4, open: true } },
      rad("r1", 1500),
      rad("r2", 1000),
      { id: "bp", type: "dp-bypass-valve", props: { kvs: o.bypassKvs ?? 2, openingKpa: o.opening ?? null } },
    ],
    pipes: [
      cu("fm", "hp.flow", "mf.common", "22", 3), cu("rm", "mr.common", "hp.return", "22", 3),
      cu("a0", "mf.p1", "zv1.a", "15", 1), cu("a1", "zv1.b", "r1.flow", "15", 4), cu("a2", "r1.return", "mr.p1", "15", 5),
      cu("b0", "mf.p2", "zv2.a", "15", 1), cu("b1", "zv2.b", "r2.flow", "15", 4), cu("b2", "r2.return", "mr.p2", "15", 5),
      cu("y1", "mf.p3", "bp.a", "15", 0.5), cu("y2", "bp.b", "mr.p3", "15", 0.5),
    ],
  };
}
/** Hand: a zone between the manifolds = 10 m Cu 15 + zone valve Kvs 4 + radiator valve. */
export const zoneDp = (q: number, valveKv: number) => copperDpKpa(q, "15", 10, W) + kvDpKpa(q, 4, W.rho) + kvDpKpa(q, valveKv, W.rho);
/** Outside the manifolds: heat pump Kv 5 + 6 m Cu 22. */
export const mains = (q: number) => kvDpKpa(q, 5, W.rho) + copperDpKpa(q, "22", 6, W);
/** Zones' Δp between the bypass ends at design flow: the larger of the two zones. */
export const designDp = (valveKv: number) => Math.max(zoneDp(flowM3h(1500, 10, W), valveKv), zoneDp(flowM3h(1000, 10, W), valveKv));
/** The margin written out: the larger of +10 % and +2 kPa (common practice). */
export const withMargin = (need: number) => Math.max(1.1 * need, need + 2);
