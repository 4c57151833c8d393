/**
 * Diaphragm expansion vessel sizing after EN 12828:2012+A1:2014 Annex D. The
 * formula layout is from memory (references.md §8.1; the standard's text is not
 * public, open item §14.1). Its acceptance factor (p_e + 1)/(p_e − p_0) is the
 * diaphragm-tank form 1/(1 − P1/P2) of the ASHRAE Handbook—HVAC Systems and
 * Equipment (references §8.2), which the tests check it against. The final
 * pressure p_e = p_SV − 0.5 bar, the pre-charge margin, the water reserve
 * V_WR = max(0.5 %·V_s, 3 L) and the 0.2 bar margin stay from memory.
 * Pressures are bar gauge; "+1" converts to absolute (1 bar atmosphere, as the
 * Annex does).
 */
import { headMToPa, paToBar } from "../units";

export interface En12828Input {
  /** System water content V_s, L (> 0). */
  systemVolumeL: number;
  /** Expansion fraction e between fill and maximum temperature (fluids.expansionFraction), ≥ 0. */
  expansionFraction: number;
  /** Static height of the highest point above the vessel, m (≥ 0). */
  staticHeightM: number;
  /** Designer's cold fill pressure at the vessel, bar g (checked, not used to size). */
  coldFillPressureBar: number;
  /** Safety valve set pressure p_SV, bar g (> 0). */
  safetyValveBar: number;
  /** If given, p_st = ρ·g·h/1e5; otherwise the trade convention 10 m of water per bar. */
  densityKgM3?: number;
  /** Margin added to the static pressure for the pre-charge, bar (default 0.2, EN 12828 minimum). */
  prechargeMarginBar?: number;
  /** Floor on the pre-charge, bar g (default 0 = none; DE practice 0.7–0.8 bar, common practice). */
  minimumPrechargeBar?: number;
}

export interface En12828Result {
  /** V_e = e·V_s, L. */
  expansionVolumeL: number;
  /** V_WR = max(0.005·V_s, 3 L). */
  waterReserveL: number;
  /** Static pressure p_st at the vessel, bar g. */
  staticPressureBar: number;
  /** p_0 = max(p_st + p_D + margin, minimumPrechargeBar) (p_D = 0: vapour pressure, nil below 100 °C), bar g. */
  prechargeBar: number;
  /** p_e = p_SV − 0.5 bar (p_SV ≤ 5 bar) or 0.9·p_SV (p_SV > 5 bar), bar g. */
  finalPressureBar: number;
  /** V_n = (V_e + V_WR)·(p_e + 1)/(p_e − p_0), L. */
  nominalVolumeL: number;
  /** Lowest cold fill pressure that puts V_WR into a vessel of nominalVolumeL: (p_0 + 1)·V_n/(V_n − V_WR) − 1, bar g. */
  minimumFillPressureBar: number;
  /** coldFillPressureBar lies in [minimumFillPressureBar, finalPressureBar). */
  coldFillPressureOk: boolean;
}

function check(name: string, x: number, min: number, strict: boolean): void {
  const ok = Number.isFinite(x) && (strict ? x > min : x >= min);
  if (!ok) throw new RangeError(`${name} must be ${strict ? ">" : "≥"} ${min}, got ${x}`);
}

/** p_e from the safety-valve setting: closing-pressure difference 0.5 bar up to 5 bar, 10 % above (EN 12828 Annex D). */
export function en12828FinalPressureBar(safetyValveBar: number): number {
  check("safetyValveBar", safetyValveBar, 0, true);
  return safetyValveBar <= 5 ? safetyValveBar - 0.5 : 0.9 * safetyValveBar;
}

/** Water reserve V_WR = max(0.5 % of V_s, 3 L) (EN 12828 Annex D), L. */
export function en12828WaterReserveL(systemVolumeL: number): number {
  return Math.max(0.005 * systemVolumeL, 3);
}

/** Minimum cold fill pressure (bar g) for vessel volumeL with pre-charge p0 holding waterReserveL (Boyle, isothermal). */
export function en12828MinimumFillPressureBar(volumeL: number, prechargeBar: number, waterReserveL: number): number {
  check("volumeL", volumeL, 0, true);
  check("waterReserveL", waterReserveL, 0, false);
  if (!(waterReserveL < volumeL)) throw new RangeError(`volumeL ${volumeL} must exceed waterReserveL ${waterReserveL}`);
  return ((prechargeBar + 1) * volumeL) / (volumeL - waterReserveL) - 1;
}

/**
 * Size a diaphragm vessel (EN 12828 Annex D). Example (references.md §8.1 A):
 * V_s 200 L, e 0.014213, h 5 m, p_SV 3 bar → p_0 0.7, p_e 2.5, V_n 11.36 L.
 * Throws RangeError naming the field for bad inputs, and `safetyValveBar` when
 * p_e ≤ p_0 (no vessel can work: the caller reports it as a finding).
 */
export function en12828Vessel(input: En12828Input): En12828Result {
  const { systemVolumeL, expansionFraction, staticHeightM, coldFillPressureBar, safetyValveBar } = input;
  check("systemVolumeL", systemVolumeL, 0, true);
  check("expansionFraction", expansionFraction, 0, false);
  check("staticHeightM", staticHeightM, 0, false);
  check("coldFillPressureBar", coldFillPressureBar, -1, true);
  const margin = input.prechargeMarginBar ?? 0.2;
  check("prechargeMarginBar", margin, 0, false);
  if (input.densityKgM3 !== undefined) check("densityKgM3", input.densityKgM3, 0, true);
  const staticPressureBar =
    input.densityKgM3 === undefined ? staticHeightM / 10 : paToBar(headMToPa(staticHeightM, input.densityKgM3));
  const floor = input.minimumPrechargeBar ?? 0;
  check("minimumPrechargeBar", floor, 0, false);
  const prechargeBar = Math.max(staticPressureBar + margin, floor);
  const finalPressureBar = en12828FinalPressureBar(safetyValveBar);
  if (!(finalPressureBar > prechargeBar)) {
    throw new RangeError(
      `safetyValveBar ${safetyValveBar}: final pressure ${finalPressureBar.toFixed(2)} bar is not above the pre-charge ${prechargeBar.toFixed(2)} bar`,
    );
  }
  const expansionVolumeL = expansionFraction * systemVolumeL;
  const waterReserveL = en12828WaterReserveL(systemVolumeL);
  const nominalVolumeL = ((expansionVolumeL + waterReserveL) * (finalPressureBar + 1)) / (finalPressureBar - prechargeBar);
  const minimumFillPressureBar = en12828MinimumFillPressureBar(nominalVolumeL, prechargeBar, waterReserveL);
  return {
    expansionVolumeL,
    waterReserveL,
    staticPressureBar,
    prechargeBar,
    finalPressureBar,
    nominalVolumeL,
    minimumFillPressureBar,
    coldFillPressureOk: coldFillPressureBar >= minimumFillPressureBar && coldFillPressureBar < finalPressureBar,
  };
}

/** The citation shown with this formula's working. */
export const EN12828_SOURCE =
  "EN 12828:2012+A1:2014, Annex D (diaphragm expansion vessels) — formula layout from memory, not checked against the standard's text; its acceptance factor is the diaphragm-tank form of the ASHRAE Handbook—HVAC Systems and Equipment";
