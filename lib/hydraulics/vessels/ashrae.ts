/**
 * Expansion tank sizing, ASHRAE Handbook—HVAC Systems and Equipment, chapter
 * "Hydronic Heating and Cooling" (ch. 13 in the 2016/2020 eds.; references.md §8.2):
 *   diaphragm tank:        V_t = V_s·[(v2/v1 − 1) − 3αΔt] / (1 − P1/P2)
 *   closed plain-steel:    V_t = V_s·[(v2/v1 − 1) − 3αΔt] / (P_a/P1 − P_a/P2)
 * P absolute (any one unit); α linear expansion of the piping per K (steel
 * 11.7e-6, copper 17.1e-6); no water reserve (≠ EN 12828).
 */

/** Linear expansion coefficients per ASHRAE, 1/K (6.5e-6 and 9.5e-6 per °F). */
export const ASHRAE_ALPHA_PER_K = { steel: 6.5e-6 * 1.8, copper: 9.5e-6 * 1.8 } as const;

export interface AshraeTankInput {
  /** System volume V_s, L (any volume unit works; the tank comes out in the same). */
  systemVolumeL: number;
  /** v2/v1 − 1 of the water between fill and maximum temperature. */
  expansionFraction: number;
  /** α of the piping, 1/K. */
  linearExpansionPerK: number;
  /** t2 − t1, K. */
  deltaTK: number;
  /** P1, absolute pressure at fill (lower), bar abs. */
  fillPressureAbsBar: number;
  /** P2, absolute pressure at maximum temperature, bar abs. */
  maxPressureAbsBar: number;
}

function netExpansion(i: AshraeTankInput): number {
  for (const k of ["systemVolumeL", "fillPressureAbsBar", "maxPressureAbsBar"] as const) {
    if (!(i[k] > 0) || !Number.isFinite(i[k])) throw new RangeError(`${k} must be > 0, got ${i[k]}`);
  }
  for (const k of ["expansionFraction", "linearExpansionPerK", "deltaTK"] as const) {
    if (!Number.isFinite(i[k])) throw new RangeError(`${k} must be finite, got ${i[k]}`);
  }
  if (!(i.maxPressureAbsBar > i.fillPressureAbsBar)) {
    throw new RangeError(`maxPressureAbsBar ${i.maxPressureAbsBar} must exceed fillPressureAbsBar ${i.fillPressureAbsBar}`);
  }
  return i.expansionFraction - 3 * i.linearExpansionPerK * i.deltaTK;
}

/** Diaphragm (bladder) tank volume, same unit as systemVolumeL. Example C: 1000 gal → 97.9 gal. */
export function ashraeDiaphragmTank(input: AshraeTankInput): number {
  const net = netExpansion(input);
  return (input.systemVolumeL * net) / (1 - input.fillPressureAbsBar / input.maxPressureAbsBar);
}

/** Closed plain-steel tank (air in contact with water), atmospheric pressure atmosphereAbsBar at fill. Example C: 177.9 gal. */
export function ashraePlainTank(input: AshraeTankInput & { atmosphereAbsBar: number }): number {
  const net = netExpansion(input);
  if (!(input.atmosphereAbsBar > 0)) throw new RangeError(`atmosphereAbsBar must be > 0, got ${input.atmosphereAbsBar}`);
  const pa = input.atmosphereAbsBar;
  return (input.systemVolumeL * net) / (pa / input.fillPressureAbsBar - pa / input.maxPressureAbsBar);
}
