/**
 * Hand calculations for engine tests, written from the published methods and
 * independent of the engine: nothing here imports lib/hydraulics, so a changed
 * engine constant or formula cannot move an expected value. Every number names
 * its source (shared/references.md section, which names the standard, handbook
 * or library behind it).
 */

export interface Water {
  rho: number;
  cp: number;
  nu: number;
}

/**
 * Liquid water at 1 atm, references §1.1: IAPWS-95 density and cp, IAPWS 2008
 * viscosity (computed with CoolProp 8.0.0). Cross-checked there against the
 * CRC/Kell density table and an engineering viscosity table (≤ 0.3 %).
 */
export const WATER: Record<30 | 35 | 40 | 45 | 50 | 55 | 60, Water> = {
  30: { rho: 995.649, cp: 4179.8, nu: 0.8007e-6 },
  35: { rho: 994.033, cp: 4179.3, nu: 0.7234e-6 },
  40: { rho: 992.216, cp: 4179.4, nu: 0.6578e-6 },
  45: { rho: 990.213, cp: 4180.1, nu: 0.6017e-6 },
  50: { rho: 988.035, cp: 4181.3, nu: 0.5531e-6 },
  55: { rho: 985.693, cp: 4183.0, nu: 0.5109e-6 },
  60: { rho: 983.196, cp: 4185.0, nu: 0.474e-6 },
};

/** Volumetric expansion of water from 10 °C, e = ρ10/ρt − 1 (IAPWS-95), references §1.4. */
export const WATER_EXPANSION_FROM_10C: Record<45 | 50 | 55 | 60 | 70 | 80, number> = {
  45: 0.00958,
  50: 0.01181,
  55: 0.01421,
  60: 0.01679,
  70: 0.02244,
  80: 0.02872,
};

/** Copper EN 1057 R250 ("Table X") inner diameters, mm, references §4.1; drawn copper ε 0.0015 mm (§3.3). */
export const COPPER_ID_MM: Record<"15" | "22" | "28" | "35", number> = { "15": 13.6, "22": 20.2, "28": 26.2, "35": 32.6 };
export const COPPER_EPS_MM = 0.0015;

/** Design flow q = P/(ρ·cp·ΔT), m³/h (defining equation, references §10). */
export const flowM3h = (powerW: number, deltaTK: number, w: { rho: number; cp: number }) => (powerW / (w.rho * w.cp * deltaTK)) * 3600;

/** Kv definition (IEC 60534-1, references §6): Δp[bar] = (Q/Kv)²·ρ/1000, returned in kPa. */
export const kvDpKpa = (qM3h: number, kv: number, rho: number) => 100 * (qM3h / kv) ** 2 * (rho / 1000);

/** The Kv that burns dpKpa at qM3h: the inverse of kvDpKpa. */
export const kvForDp = (qM3h: number, dpKpa: number, rho: number) => qM3h / Math.sqrt((dpKpa / 100) * (1000 / rho));

/** Colebrook–White (Colebrook 1939, references §3.1) by fixed-point iteration to 1e-15; laminar 64/Re below Re 2300. */
export function colebrook(re: number, relRough: number): number {
  if (re < 2300) return 64 / re;
  let f = 0.02;
  for (let i = 0; i < 300; i++) {
    const x = -2 * Math.log10(relRough / 3.7 + 2.51 / (re * Math.sqrt(f)));
    const next = 1 / (x * x);
    if (Math.abs(next - f) < 1e-15) return next;
    f = next;
  }
  return f;
}

/**
 * Darcy f over the whole Re range: 64/Re below 2300, Colebrook from 4000, and between them
 * a straight line in Re from 64/2300 to Colebrook(4000) — no published method covers the
 * transition zone (the flow is intermittent); this is the rule the engine states
 * (friction/darcy.ts), applied here so a hand check can cross the zone.
 */
export function darcyFriction(re: number, relRough: number): number {
  if (re < 2300 || re >= 4000) return colebrook(re, relRough);
  return 64 / 2300 + ((re - 2300) / 1700) * (colebrook(4000, relRough) - 64 / 2300);
}

/** Straight pipe by Darcy–Weisbach, Δp = f·(L/D)·ρv²/2 (references §3.1), f by darcyFriction. */
export function pipeFlow(qM3h: number, dMm: number, epsMm: number, lengthM: number, w: Water) {
  const d = dMm / 1000;
  const v = qM3h / 3600 / ((Math.PI * d * d) / 4);
  if (v === 0) return { v: 0, re: 0, f: 0, gradientPaPerM: 0, dpKpa: 0 };
  const re = (v * d) / w.nu;
  const f = darcyFriction(re, epsMm / dMm);
  const gradientPaPerM = ((f / d) * w.rho * v * v) / 2;
  return { v, re, f, gradientPaPerM, dpKpa: (gradientPaPerM * lengthM) / 1000 };
}

/** Copper pipe Δp, kPa (EN 1057 inner diameter, ε 0.0015 mm). */
export const copperDpKpa = (qM3h: number, size: keyof typeof COPPER_ID_MM, lengthM: number, w: Water) =>
  qM3h <= 0 ? 0 : pipeFlow(qM3h, COPPER_ID_MM[size], COPPER_EPS_MM, lengthM, w).dpKpa;

/** Inner volume πd²/4 of one metre of pipe, litres. */
export const litresPerM = (dMm: number) => ((Math.PI * (dMm / 1000) ** 2) / 4) * 1000;

/** A pump curve read by straight lines between its points (the plain reading of a maker's table). */
export function curveHeadKpa(curve: readonly (readonly [number, number])[], qM3h: number): number {
  for (let i = 1; i < curve.length; i++) {
    const [q0, h0] = curve[i - 1]!;
    const [q1, h1] = curve[i]!;
    if (qM3h <= q1) return h0 + ((h1 - h0) * (qM3h - q0)) / (q1 - q0);
  }
  return Number.NaN;
}

/** Root of a function that changes sign once on [lo, hi], by 200 bisections. */
export function bisect(fn: (x: number) => number, lo: number, hi: number): number {
  let flo = fn(lo);
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    const fm = fn(mid);
    if (Math.sign(fm) === Math.sign(flo)) {
      lo = mid;
      flo = fm;
    } else hi = mid;
  }
  return (lo + hi) / 2;
}

/**
 * EN 442-2 characteristic equation with the logarithmic mean excess temperature
 * (references §7): Φ = Φ50·(ΔT_ln/ΔT_ln,n)^n, ΔT_ln = (t1 − t2)/ln((t1 − tr)/(t2 − tr)),
 * ΔT_ln,n = 10/ln(55/45) = 49.833 K at the standard 75/65/20 °C.
 */
export function en442LogW(phi50: number, n: number, flowC: number, returnC: number, roomC: number): number {
  const dtLn = (flowC - returnC) / Math.log((flowC - roomC) / (returnC - roomC));
  return phi50 * (dtLn / (10 / Math.log(55 / 45))) ** n;
}

/** EN 442 catalogue (arithmetic) form Φ = Φ50·(((t1 + t2)/2 − tr)/50)^n, references §7 — the method NOT to use at low c. */
export const en442ArithW = (phi50: number, n: number, flowC: number, returnC: number, roomC: number) =>
  phi50 * (((flowC + returnC) / 2 - roomC) / 50) ** n;

/**
 * EN 12828:2012 Annex D diaphragm vessel, the layout of references §8.1 (from memory,
 * corroborated; the acceptance factor (p_e + 1)/(p_e − p_0) is the ASHRAE diaphragm
 * form 1/(1 − P1/P2) in absolute pressures, references §8.2, confirmed-in-search):
 *   V_n = (e·V_s + V_WR)·(p_e + 1)/(p_e − p_0), V_WR = max(0.5 %·V_s, 3 L),
 *   p_0 = h/10 + 0.2 bar, p_e = p_SV − 0.5 bar (p_SV ≤ 5 bar).
 */
export function en12828NominalL(systemL: number, e: number, staticHeightM: number, safetyValveBar: number) {
  const p0 = staticHeightM / 10 + 0.2;
  const pe = safetyValveBar - 0.5;
  const reserveL = Math.max(0.005 * systemL, 3);
  return { p0, pe, reserveL, expansionL: e * systemL, nominalL: ((e * systemL + reserveL) * (pe + 1)) / (pe - p0) };
}
