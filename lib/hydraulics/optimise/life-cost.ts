/**
 * Life-cost of pumping: the electrical energy a pump draws to give its
 * required head at its design flow, over the years of the comparison.
 *
 * Hydraulic power P_h = Q·Δp (W, with Q in m³/s and Δp in Pa) and electrical
 * power P_el = Q·Δp/η with η the pump's wire-to-water efficiency — the
 * defining relations of pump power and efficiency (Çengel & Cimbala, Fluid
 * Mechanics: Fundamentals and Applications, ch. 14 "Turbomachinery", water
 * horsepower ρ·g·V̇·H and η = water power / shaft power; equation numbers
 * from memory). With Q in m³/h and Δp in kPa, P_el[kW] = (Q/3600)·Δp/η.
 * Energy over the life: E = P_el · hoursPerYear · years (kWh); cost E·price.
 *
 * The pump is taken to be speed-controlled to its required head (the index
 * circuit's Δp) at the design flow for every running hour — an upper-bound
 * style simplification of part-load running, stated as an assumption.
 */

export interface LifeCostInputs {
  years: number;
  pricePerKwh: number;
  pumpEfficiency: number;
  hoursPerYear: number;
}

/**
 * Defaults — ASSUMPTIONS, not published values: 15 years of comparison, a
 * price of 0.30 per kWh (same currency as the pipe prices), a small
 * circulator's wire-to-water efficiency of 25 %, 4,000 running hours a year
 * (a heating season). The user should replace each with their own figure.
 */
export const LIFE_COST_ASSUMPTIONS: LifeCostInputs = { years: 15, pricePerKwh: 0.3, pumpEfficiency: 0.25, hoursPerYear: 4000 };

/** Electrical power, kW, to give headKpa at flowM3h: P_el = Q·Δp/η. */
export function pumpElectricalKw(flowM3h: number, headKpa: number, efficiency: number): number {
  if (!(efficiency > 0 && efficiency <= 1)) throw new RangeError(`pumpEfficiency must be in (0, 1], got ${efficiency}`);
  return ((flowM3h / 3600) * headKpa) / efficiency;
}

/** Cost of the energy over the life per kPa of head at flowM3h (linear in the head). */
export function energyCostPerKpa(flowM3h: number, life: LifeCostInputs): number {
  return pumpElectricalKw(flowM3h, 1, life.pumpEfficiency) * life.hoursPerYear * life.years * life.pricePerKwh;
}
