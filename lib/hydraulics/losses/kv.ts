/**
 * Flow coefficient Kv (IEC 60534-1; VDI/VDE 2173): the flow in m³/h of water
 * (5–40 °C, ρ0 = 1000 kg/m³) that passes with a pressure loss of 1 bar.
 * Defining equation: Kv = Q·√((ρ/ρ0)/(Δp/Δp0)), Δp0 = 1 bar = 1e5 Pa.
 */

const DP0_PA = 1e5;
const RHO0_KGM3 = 1000;
/** Kv/Cv = 0.2271247 (m³/h per US gpm) / √0.0689476 (bar per psi) = 0.864978. */
export const KV_PER_CV = 0.2271247 / Math.sqrt(0.0689476);

function finite(name: string, x: number): void {
  if (!Number.isFinite(x)) throw new RangeError(`${name} must be finite, got ${x}`);
}
function positive(name: string, x: number): void {
  if (!(x > 0) || !Number.isFinite(x)) throw new RangeError(`${name} must be > 0 and finite, got ${x}`);
}

/**
 * Pressure loss Δp (Pa) at flow `flowM3h` (m³/h) through a device of coefficient
 * `kv` (m³/h at 1 bar) for a fluid of density `densityKgM3`:
 *   Δp = 1e5·(Q/Kv)²·(ρ/1000), signed like Q. Q 0.5 m³/h, Kv 2.5 → 4.0 kPa.
 */
export function kvPressureDropPa(flowM3h: number, kv: number, densityKgM3: number): number {
  finite("flowM3h", flowM3h);
  positive("kv", kv);
  positive("densityKgM3", densityKgM3);
  const r = flowM3h / kv;
  return Math.sign(r) * DP0_PA * r * r * (densityKgM3 / RHO0_KGM3);
}

/**
 * The Kv (m³/h) that loses `dpPa` (Pa, > 0) at `flowM3h` (m³/h, sign ignored):
 *   Kv = |Q|·√((ρ/1000)/(Δp/1e5)). 0.6 m³/h at 10 kPa → 1.897.
 */
export function kvForPressureDrop(flowM3h: number, dpPa: number, densityKgM3: number): number {
  finite("flowM3h", flowM3h);
  positive("dpPa", dpPa);
  positive("densityKgM3", densityKgM3);
  return Math.abs(flowM3h) * Math.sqrt(densityKgM3 / RHO0_KGM3 / (dpPa / DP0_PA));
}

/** d(Δp)/dQ of kvPressureDropPa in Pa per (m³/h): 2e5·|Q|·(ρ/1000)/Kv². */
export function kvDpDerivativePaPerM3h(flowM3h: number, kv: number, densityKgM3: number): number {
  finite("flowM3h", flowM3h);
  positive("kv", kv);
  positive("densityKgM3", densityKgM3);
  return (2 * DP0_PA * Math.abs(flowM3h) * (densityKgM3 / RHO0_KGM3)) / (kv * kv);
}

/** Cv (US gpm at 1 psi, 60 °F water) → Kv: Kv = 0.86498·Cv. */
export const cvToKv = (cv: number): number => cv * KV_PER_CV;
/** Kv → Cv: Cv = 1.1561·Kv. */
export const kvToCv = (kv: number): number => kv / KV_PER_CV;

/**
 * The Kv (m³/h) of a fitting with loss coefficient K (velocity heads, Δp = K·ρv²/2)
 * in a bore of innerDiameterMm (mm): from the Kv definition above with v = Q/A,
 *   Kv = 3600·A·√(2·1e5/(1000·K)) = 3600·A·√(200/K),  A = πd²/4 in m² —
 * independent of the fluid's density (both laws scale with ρ). K 0.075 in 20.2 mm → 59.6.
 */
export function kvForLossCoefficient(k: number, innerDiameterMm: number): number {
  positive("k", k);
  positive("innerDiameterMm", innerDiameterMm);
  const areaM2 = (Math.PI * (innerDiameterMm / 1000) ** 2) / 4;
  return 3600 * areaM2 * Math.sqrt((2 * DP0_PA) / (RHO0_KGM3 * k));
}

/** The citation shown with Kv workings. */
export const KV_SOURCE = "IEC 60534-1 flow coefficient: Kv = Q·√((ρ/1000)/(Δp/1 bar)), Q in m³/h";

/**
 * The one Kv of devices in series (same flow through each, so their Δp add):
 * from Δp = 1e5·(Q/Kv)²·ρ/1000 for each, 1/Kv² = Σ 1/Kvᵢ² (IEC 60534-1 definition
 * of Kv applied to each device). Kv 1.0 and Kv 1.0 in series → 0.7071.
 */
export function kvInSeries(...kvs: number[]): number {
  if (kvs.length === 0) throw new RangeError("kvInSeries needs at least one Kv");
  let sum = 0;
  kvs.forEach((kv, i) => { positive(`kvs[${i}]`, kv); sum += 1 / (kv * kv); });
  return 1 / Math.sqrt(sum);
}
