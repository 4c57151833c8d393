/**
 * Heat carried by a flow, defining equation (first law, steady flow):
 *   Φ = ṁ·cp·ΔT,  ṁ = ρ·V̇  ⇒  V̇ = Φ/(ρ·cp·ΔT).
 */

export interface FlowForHeatInput {
  /** Heat Φ, W (≥ 0). */
  powerW: number;
  /** Temperature difference flow − return, K (> 0). */
  deltaTK: number;
  /** Density ρ, kg/m³ (> 0), at the temperature where the flow is metered/taken. */
  densityKgM3: number;
  /** Specific heat cp, J/(kg·K) (> 0). */
  specificHeatJkgK: number;
}

function check(i: FlowForHeatInput): void {
  if (!(i.powerW >= 0) || !Number.isFinite(i.powerW)) throw new RangeError(`powerW must be ≥ 0, got ${i.powerW}`);
  for (const k of ["deltaTK", "densityKgM3", "specificHeatJkgK"] as const) {
    if (!(i[k] > 0) || !Number.isFinite(i[k])) throw new RangeError(`${k} must be > 0, got ${i[k]}`);
  }
}

/** Mass flow ṁ = Φ/(cp·ΔT), kg/s. 1 kW, 10 K, cp 4190 → 0.0238663 kg/s. */
export function massFlowForHeat(input: FlowForHeatInput): number {
  check(input);
  return input.powerW / (input.specificHeatJkgK * input.deltaTK);
}

/** Volume flow V̇ = Φ/(ρ·cp·ΔT), m³/s. 10 kW, 5 K, IAPWS 37.5 °C → 0.4819 L/s. */
export function flowForHeat(input: FlowForHeatInput): number {
  return massFlowForHeat(input) / input.densityKgM3;
}

/** Heat Φ = ρ·V̇·cp·ΔT (W) carried by volume flow flowM3s (m³/s) cooled by deltaTK (K). */
export function heatForFlowW(flowM3s: number, deltaTK: number, densityKgM3: number, specificHeatJkgK: number): number {
  for (const [k, v] of Object.entries({ flowM3s, deltaTK, densityKgM3, specificHeatJkgK })) {
    if (!Number.isFinite(v)) throw new RangeError(`${k} must be finite, got ${v}`);
  }
  return densityKgM3 * flowM3s * specificHeatJkgK * deltaTK;
}

/** The citation shown with design-flow workings. */
export const HEAT_BALANCE_SOURCE = "steady-flow energy balance Φ = ρ·V̇·cp·ΔT (first law of thermodynamics)";
