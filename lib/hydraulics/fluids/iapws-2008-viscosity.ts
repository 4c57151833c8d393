/**
 * Viscosity of ordinary water, IAPWS R12-08 "Release on the IAPWS Formulation
 * 2008 for the Viscosity of Ordinary Water Substance" (Huber et al., J. Phys.
 * Chem. Ref. Data 38 (2009) 101): μ = μ*·μ̄0(T̄)·μ̄1(T̄, ρ̄)·μ̄2, eqs. (10)–(12),
 * coefficients Tables 1–2. The critical enhancement μ̄2 is taken as 1, which the
 * release allows outside the near-critical region (IAPWS R12-08 §2.8 / §3.1,
 * "industrial application"); for liquid water below 100 °C its effect is nil.
 */

const T_CRIT_K = 647.096;
const RHO_CRIT_KGM3 = 322.0;
const MU_STAR_PAS = 1e-6;
const H0 = [1.67752, 2.20462, 0.6366564, -0.241605] as const;
/** H[i][j], i = power of (1/T̄ − 1), j = power of (ρ̄ − 1). */
const H1: readonly (readonly number[])[] = [
  [5.20094e-1, 2.22531e-1, -2.81378e-1, 1.61913e-1, -3.25372e-2, 0, 0],
  [8.50895e-2, 9.99115e-1, -9.06851e-1, 2.57399e-1, 0, 0, 0],
  [-1.08374, 1.88797, -7.72479e-1, 0, 0, 0, 0],
  [-2.89555e-1, 1.26613, -4.89837e-1, 0, 6.98452e-2, 0, -4.35673e-3],
  [0, 0, -2.5704e-1, 0, 0, 8.72102e-3, 0],
  [0, 1.20573e-1, 0, 0, 0, 0, -5.93264e-4],
];

/**
 * Dynamic viscosity μ (Pa·s) of water at temperature `temperatureK` (K) and
 * density `densityKgM3` (kg/m³), IAPWS R12-08 eqs. (10)–(12) with μ̄2 = 1.
 * Validity (R12-08 §3.1): 253.15 K < T ≤ 1173.15 K for stable fluid states; this
 * engine uses it for liquid water 0–100 °C. Throws RangeError for non-positive
 * or non-finite arguments.
 */
export function iapws2008ViscosityPas(temperatureK: number, densityKgM3: number): number {
  if (!(temperatureK > 0) || !Number.isFinite(temperatureK)) {
    throw new RangeError(`temperatureK must be a positive finite number, got ${temperatureK}`);
  }
  if (!(densityKgM3 > 0) || !Number.isFinite(densityKgM3)) {
    throw new RangeError(`densityKgM3 must be a positive finite number, got ${densityKgM3}`);
  }
  const tBar = temperatureK / T_CRIT_K;
  const rhoBar = densityKgM3 / RHO_CRIT_KGM3;
  let den = 0;
  for (let i = 0; i < H0.length; i++) den += H0[i]! / tBar ** i;
  const mu0 = (100 * Math.sqrt(tBar)) / den;
  let sum = 0;
  for (let i = 0; i < H1.length; i++) {
    const row = H1[i]!;
    let inner = 0;
    for (let j = 0; j < row.length; j++) inner += row[j]! * (rhoBar - 1) ** j;
    sum += (1 / tBar - 1) ** i * inner;
  }
  const mu1 = Math.exp(rhoBar * sum);
  return MU_STAR_PAS * mu0 * mu1;
}
