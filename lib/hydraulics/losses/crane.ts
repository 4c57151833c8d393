/**
 * Crane TP-410 friction factor "fT" (clean commercial steel, flow in the zone of
 * complete turbulence) used by the K = n·fT method — Crane Co., Technical Paper
 * No. 410 "Flow of Fluids through Valves, Fittings, and Pipe" (1976 and later
 * eds.), Appendix A, "K factor table" sheet 1 (p. A-26), table of fT by nominal size.
 */
import { fullyRoughFrictionFactor } from "../friction/colebrook";

/** Crane table: nominal size, Schedule 40 inner diameter (mm, ASME B36.10), fT. */
export const CRANE_FT_TABLE: readonly { nominal: string; sch40InnerDiameterMm: number; fT: number }[] = [
  { nominal: '1/2"', sch40InnerDiameterMm: 15.8, fT: 0.027 },
  { nominal: '3/4"', sch40InnerDiameterMm: 20.93, fT: 0.025 },
  { nominal: '1"', sch40InnerDiameterMm: 26.64, fT: 0.023 },
  { nominal: '1-1/4"', sch40InnerDiameterMm: 35.05, fT: 0.022 },
  { nominal: '1-1/2"', sch40InnerDiameterMm: 40.89, fT: 0.021 },
  { nominal: '2"', sch40InnerDiameterMm: 52.5, fT: 0.019 },
  { nominal: '2-1/2"', sch40InnerDiameterMm: 62.71, fT: 0.018 },
  { nominal: '3"', sch40InnerDiameterMm: 77.93, fT: 0.018 },
  { nominal: '4"', sch40InnerDiameterMm: 102.26, fT: 0.017 },
  { nominal: '5"', sch40InnerDiameterMm: 128.19, fT: 0.016 },
  { nominal: '6"', sch40InnerDiameterMm: 154.05, fT: 0.015 },
  { nominal: '8"', sch40InnerDiameterMm: 202.72, fT: 0.014 },
  { nominal: '10"', sch40InnerDiameterMm: 254.51, fT: 0.014 },
  { nominal: '12"', sch40InnerDiameterMm: 303.23, fT: 0.013 },
  { nominal: '16"', sch40InnerDiameterMm: 381.0, fT: 0.013 },
  { nominal: '18"', sch40InnerDiameterMm: 428.65, fT: 0.012 },
  { nominal: '24"', sch40InnerDiameterMm: 574.65, fT: 0.012 },
];

/** Roughness of clean commercial steel on which Crane's fT is based, mm. */
export const CRANE_STEEL_ROUGHNESS_MM = 0.045;

/**
 * Crane fT for a pipe of inner diameter `innerDiameterMm` (mm).
 * Rule: for d ≥ the ½" Sch 40 bore (15.8 mm), the tabulated fT of the nominal
 * size whose Sch 40 bore is nearest (in ratio) — reproduces Crane's table exactly.
 * Below ½" Crane tabulates nothing; there fT = max(0.027, fully-rough Colebrook
 * limit 0.25/[log10((ε/D)/3.7)]² with ε = 0.045 mm) — continuous near 13.6 mm and
 * rising for small bores as the formula does (e.g. 8.8 mm → 0.0306).
 */
export function craneFt(innerDiameterMm: number): number {
  if (!(innerDiameterMm > 0) || !Number.isFinite(innerDiameterMm)) {
    throw new RangeError(`innerDiameterMm must be > 0, got ${innerDiameterMm}`);
  }
  const first = CRANE_FT_TABLE[0]!;
  if (innerDiameterMm < first.sch40InnerDiameterMm) {
    return Math.max(first.fT, fullyRoughFrictionFactor(CRANE_STEEL_ROUGHNESS_MM / innerDiameterMm));
  }
  // nearest in ratio: |ln(d/D)| compared as max(d/D, D/d), the same order without a logarithm
  // (this runs for every fitting of every pipe)
  const apart = (bore: number) => Math.max(innerDiameterMm / bore, bore / innerDiameterMm);
  let best = first;
  for (const r of CRANE_FT_TABLE) if (apart(r.sch40InnerDiameterMm) < apart(best.sch40InnerDiameterMm)) best = r;
  return best.fT;
}

/** The citation shown with fitting K values. */
export const CRANE_SOURCE = "Crane Co., Technical Paper No. 410, Appendix A (K = n·fT)";
