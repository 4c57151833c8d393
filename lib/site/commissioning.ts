/**
 * Commissioning readings and fill records against the design. Each reading is brought
 * back to the design's units (lib/units/display.ts), its deviation shown, and flagged
 * past a tolerance. The tolerances are common practice for site readings, not a
 * standard's clause (values chosen here and stated on the sheet):
 * - heat-source flow ±10 % (a heat meter's site reading against the design flow);
 * - flow and return temperature ±2 K;
 * - bypass opening and pump head ±10 %;
 * - vessel pre-charge ±0.1 bar; cold fill pressure ±0.2 bar;
 * - glycol concentration ±2 percentage points; inhibitor within ±10 % of the maker's dose.
 */
import { flowToM3h, pressureToKpa } from "@/lib/units/display";
import type { FillData, Reading } from "./events";

export interface CommissioningDesign {
  heatSourceFlowM3h: number | null;
  flowTemperatureC: number;
  returnTemperatureC: number;
  bypass: { id: string; openingKpa: number | null } | null;
  pumps: { id: string; label: string; headKpa: number | null }[];
  vesselPrechargeBar: number | null;
  safetyValveBar: number;
  coldFillPressureBar: number;
  glycolPercent: number | null;
  densityKgM3: number | null;
}

export const TOLERANCES = {
  flowPercent: 10, temperatureK: 2, openingPercent: 10, headPercent: 10,
  prechargeBar: 0.1, fillBar: 0.2, glycolPoints: 2, inhibitorPercent: 10,
} as const;

export interface ReadingCheck {
  label: string;
  measured: string;
  design: string;
  /** "+0.12 m³/h (+5.0 %)" or "" when there is nothing to compare */
  deviation: string;
  /** null: no design value to compare with */
  ok: boolean | null;
  tolerance: string;
}

const sign = (n: number, d: number) => `${n >= 0 ? "+" : "−"}${Math.abs(n).toFixed(d)}`;

function relative(label: string, measured: number, design: number | null, unit: string, d: number, tol: number, shown: string): ReadingCheck {
  const tolerance = `±${tol} %`;
  if (design === null || design === 0) return { label, measured: shown, design: "—", deviation: "", ok: null, tolerance };
  const dev = measured - design;
  const pct = (dev / design) * 100;
  return { label, measured: shown, design: `${design.toFixed(d)} ${unit}`, deviation: `${sign(dev, d)} ${unit} (${sign(pct, 1)} %)`, ok: Math.abs(pct) <= tol + 1e-9, tolerance };
}

/** `unit` of the values; `devUnit` of differences (a temperature difference is in K). */
function absolute(label: string, measured: number, design: number | null, unit: string, d: number, tol: number, shown: string, devUnit = unit): ReadingCheck {
  const tolerance = `±${tol} ${devUnit}`;
  if (design === null) return { label, measured: shown, design: "—", deviation: "", ok: null, tolerance };
  const dev = measured - design;
  return { label, measured: shown, design: `${design.toFixed(d)} ${unit}`, deviation: `${sign(dev, d)} ${devUnit}`, ok: Math.abs(dev) <= tol + 1e-9, tolerance };
}

export function checkReading(r: Reading, design: CommissioningDesign): ReadingCheck {
  const shown = typeof r.value === "boolean" ? (r.value ? "lifted and reseated" : "did not lift or reseat") : `${r.value} ${r.unit ?? ""}`.trim();
  switch (r.kind) {
    case "heat-source-flow":
      return relative("Heat-source flow (heat meter)", flowToM3h(r.value, r.unit), design.heatSourceFlowM3h, "m³/h", 2, TOLERANCES.flowPercent, shown);
    case "flow-temperature":
      return absolute("Flow temperature", r.value, design.flowTemperatureC, "°C", 1, TOLERANCES.temperatureK, shown, "K");
    case "return-temperature":
      return absolute("Return temperature", r.value, design.returnTemperatureC, "°C", 1, TOLERANCES.temperatureK, shown, "K");
    case "bypass-opening":
      return relative("Bypass opening as set", pressureToKpa(r.value, r.unit, design.densityKgM3), design.bypass?.openingKpa ?? null, "kPa", 1, TOLERANCES.openingPercent, shown);
    case "pump-head": {
      const pump = design.pumps.find((p) => p.id === r.target);
      const c = relative(`Pump head, ${pump?.label ?? r.target}`, pressureToKpa(r.value, r.unit, design.densityKgM3), pump?.headKpa ?? null, "kPa", 1, TOLERANCES.headPercent, shown);
      return r.setting ? { ...c, measured: `${shown} (setting ${r.setting})` } : c;
    }
    case "vessel-precharge":
      return absolute("Vessel pre-charge", r.unit === "kPa" ? pressureToKpa(r.value, "kPa") / 100 : r.value, design.vesselPrechargeBar, "bar", 2, TOLERANCES.prechargeBar, shown);
    case "safety-valve-test":
      return { label: `Safety valve tested (set ${design.safetyValveBar} bar)`, measured: shown, design: "lifts and reseats", deviation: "", ok: r.value, tolerance: "" };
  }
}

/** A fill record's measurements against the design (glycol, cold fill) or the maker's dose (inhibitor). */
export function checkFill(d: FillData, design: CommissioningDesign): ReadingCheck[] {
  const out: ReadingCheck[] = [];
  if (d.fillPressureBar !== undefined)
    out.push(absolute("Cold fill pressure", d.fillPressureBar, design.coldFillPressureBar, "bar", 2, TOLERANCES.fillBar, `${d.fillPressureBar} bar`));
  if (d.measuredPercent !== undefined && d.stage === "glycol") {
    const c = absolute("Glycol concentration", d.measuredPercent, design.glycolPercent, "%", 1, TOLERANCES.glycolPoints, `${d.measuredPercent} %`);
    out.push(design.glycolPercent === null ? { ...c, design: "water (the design names no glycol)", ok: false, deviation: "the design fluid is plain water" } : c);
  }
  if (d.measuredPercent !== undefined && d.stage === "inhibitor")
    out.push(relative("Inhibitor concentration (maker's dose)", d.measuredPercent, d.dosePercent ?? null, "%", 1, TOLERANCES.inhibitorPercent, `${d.measuredPercent} %`));
  return out;
}
