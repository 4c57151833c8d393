/**
 * IAPWS-IF97 region 1 (compressed/sub-cooled liquid water): dimensionless Gibbs
 * free energy γ(π, τ), eq. (7) of the IAPWS Revised Release on the IAPWS
 * Industrial Formulation 1997 (IAPWS R7-97, 2012), coefficients Table 2,
 * properties Table 3. Validity 273.15 K ≤ T ≤ 623.15 K, ps(T) ≤ p ≤ 100 MPa.
 * Deviation from IAPWS-95 in the 0–100 °C liquid range is far below the
 * accuracy a heating design needs (|Δv/v| < 1e-5 typ.).
 */

const R_KJ_KGK = 0.461526; // specific gas constant of water, IF97 eq. (1)
const P_STAR_MPA = 16.53;
const T_STAR_K = 1386;

const I = [0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29, 30, 31, 32] as const;
const J = [-2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1, 3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6, -29, -31, -38, -39, -40, -41] as const;
const N = [
  0.14632971213167, -0.84548187169114, -0.3756360367204e1, 0.33855169168385e1, -0.95791963387872,
  0.15772038513228, -0.16616417199501e-1, 0.81214629983568e-3, 0.28319080123804e-3, -0.60706301565874e-3,
  -0.18990068218419e-1, -0.32529748770505e-1, -0.21841717175414e-1, -0.5283835796993e-4, -0.47184321073267e-3,
  -0.30001780793026e-3, 0.47661393906987e-4, -0.44141845330846e-5, -0.72694996297594e-15, -0.31679644845054e-4,
  -0.28270797985312e-5, -0.85205128120103e-9, -0.22425281908e-5, -0.65171222895601e-6, -0.14341729937924e-12,
  -0.40516996860117e-6, -0.12734301741641e-8, -0.17424871230634e-9, -0.68762131295531e-18, 0.14478307828521e-19,
  0.26335781662795e-22, -0.11947622640071e-22, 0.18228094581404e-23, -0.93537087292458e-25,
] as const;

export interface If97Region1State {
  /** Specific volume v = (R·T/p)·π·γπ, m³/kg. */
  specificVolumeM3Kg: number;
  /** Density ρ = 1/v, kg/m³. */
  densityKgM3: number;
  /** Isobaric heat capacity cp = −R·τ²·γττ, J/(kg·K). */
  specificHeatJkgK: number;
  /** Specific enthalpy h = R·T·τ·γτ, J/kg. */
  enthalpyJkg: number;
}

/**
 * Region-1 properties at temperature `temperatureK` (K) and pressure `pressureMpa` (MPa).
 * Throws RangeError outside 273.15–623.15 K or 0 < p ≤ 100 MPa. (Metastable liquid a
 * fraction of a kelvin above saturation, e.g. 100 °C at 1 atm, is evaluated as is.)
 */
export function if97Region1(temperatureK: number, pressureMpa: number): If97Region1State {
  if (!(temperatureK >= 273.15 && temperatureK <= 623.15)) {
    throw new RangeError(`temperatureK ${temperatureK} outside IAPWS-IF97 region 1 (273.15–623.15 K)`);
  }
  if (!(pressureMpa > 0 && pressureMpa <= 100)) {
    throw new RangeError(`pressureMpa ${pressureMpa} outside IAPWS-IF97 region 1 (0–100 MPa)`);
  }
  const pi = pressureMpa / P_STAR_MPA;
  const tau = T_STAR_K / temperatureK;
  const a = 7.1 - pi;
  const b = tau - 1.222;
  let gPi = 0;
  let gTau = 0;
  let gTauTau = 0;
  for (let k = 0; k < N.length; k++) {
    const n = N[k]!;
    const i = I[k]!;
    const j = J[k]!;
    gPi += -n * i * a ** (i - 1) * b ** j;
    gTau += n * a ** i * j * b ** (j - 1);
    gTauTau += n * a ** i * j * (j - 1) * b ** (j - 2);
  }
  const rJ = R_KJ_KGK * 1000;
  const v = ((rJ * temperatureK) / (pressureMpa * 1e6)) * pi * gPi;
  return {
    specificVolumeM3Kg: v,
    densityKgM3: 1 / v,
    specificHeatJkgK: -rJ * tau * tau * gTauTau,
    enthalpyJkg: rJ * temperatureK * tau * gTau,
  };
}
