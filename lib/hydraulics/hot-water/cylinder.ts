import { waterDensityKgM3, waterSpecificHeatJkgK } from "../fluids/water";

export interface CylinderReheatInput {
  /** Stored water volume V, L (> 0). */
  volumeL: number;
  /** Cold mains temperature, °C. */
  coldWaterC: number;
  /** Store set temperature, °C (> coldWaterC). */
  storeTemperatureC: number;
  /** Coil (heat-exchanger) output P, kW (> 0). */
  coilOutputKw: number;
  /** Defaults: IAPWS water at the mean of cold and store temperature. */
  densityKgM3?: number;
  specificHeatJkgK?: number;
}

/**
 * Time (minutes) to heat a full store of cold water to its set temperature:
 *   t = V·ρ·cp·(θ_store − θ_cold) / P   (energy balance, Q = m·cp·ΔT)
 * Ignores standing losses and the fall of coil output as the store warms (the
 * coil's rated output is usually given at a store of 10–15 °C, e.g. EN 12897
 * test conditions), so the real time is longer: treat as a lower bound.
 * Throws RangeError naming the field for bad inputs.
 */
export function cylinderReheatMinutes(input: CylinderReheatInput): number {
  const { volumeL, coldWaterC, storeTemperatureC, coilOutputKw } = input;
  if (!(volumeL > 0) || !Number.isFinite(volumeL)) throw new RangeError(`volumeL must be > 0, got ${volumeL}`);
  if (!(coilOutputKw > 0) || !Number.isFinite(coilOutputKw)) throw new RangeError(`coilOutputKw must be > 0, got ${coilOutputKw}`);
  if (!Number.isFinite(coldWaterC)) throw new RangeError(`coldWaterC must be finite, got ${coldWaterC}`);
  if (!(storeTemperatureC > coldWaterC) || !Number.isFinite(storeTemperatureC)) {
    throw new RangeError(`storeTemperatureC ${storeTemperatureC} must be above coldWaterC ${coldWaterC}`);
  }
  const meanC = (coldWaterC + storeTemperatureC) / 2;
  const rho = input.densityKgM3 ?? waterDensityKgM3(meanC);
  const cp = input.specificHeatJkgK ?? waterSpecificHeatJkgK(meanC);
  if (!(rho > 0)) throw new RangeError(`densityKgM3 must be > 0, got ${rho}`);
  if (!(cp > 0)) throw new RangeError(`specificHeatJkgK must be > 0, got ${cp}`);
  const energyJ = (volumeL / 1000) * rho * cp * (storeTemperatureC - coldWaterC);
  return energyJ / (coilOutputKw * 1000) / 60;
}

/** The citation shown with the reheat working. */
export const REHEAT_SOURCE =
  "energy balance Q = m·cp·ΔT delivered at the coil output (a lower bound: standing losses and the coil's fall in output as the store warms are ignored)";
