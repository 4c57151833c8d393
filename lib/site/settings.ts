/**
 * The settings an installer makes on each part, read from the issued document and
 * its kept results (no sizing here): balancing presets (./balancing.ts), the bypass
 * opening, each pump's duty and head, the vessel's pre-charge and the cold fill,
 * the safety valve's setting, the store temperature. Metres of head use the
 * circulating fluid's density from the results (lib/units/display.ts, h = p/(ρ·g)).
 */
import type { Part, Results, Schematic } from "@/lib/schematic";
import { convertPressure } from "@/lib/units/display";
import { balancingSetting, balancingTargets } from "./balancing";
import type { SiteSetting } from "./types";

const f = (n: number | null | undefined, d: number) => (n === null || n === undefined ? "—" : n.toFixed(d));

export const CAUTION_HOT_WATER =
  "Hot water: stored water is kept hot enough to control legionella and can scald at the taps; follow the maker's instructions and local rules for the store temperature and blending.";
export const CAUTION_PRESSURE =
  "Pressure: isolate and release pressure before working on this part; never set or test it above the lowest rating of the parts it protects.";

function pumpSettings(id: string, results: Results): SiteSetting[] {
  const rho = results.fluid.densityKgM3;
  return results.modes.flatMap((m) => {
    const duty = m.pumps.find((p) => p.id === id);
    if (!duty) return [];
    const head = duty.requiredHeadKpa;
    const metres = head === null ? null : convertPressure(head, "m", rho);
    const s: SiteSetting = {
      key: `pump-${m.mode}`, label: `Pump duty (${m.mode})`,
      value: `${f(duty.designFlowM3h, 2)} m³/h at ${f(head, 1)} kPa`,
      detail: `set the head to ${f(metres, 2)} m; its curve gives ${f(duty.availableHeadKpa, 1)} kPa at that flow`,
    };
    return [duty.ok === false ? { ...s, warn: "The pump's curve does not reach this duty: ask the designer." } : s];
  });
}

function bypassSettings(part: Part, results: Results): SiteSetting[] {
  const set = (part.props as { openingKpa: number | null }).openingKpa;
  const b = results.bypass?.id === part.id ? results.bypass : null;
  const rec = b?.recommendedOpeningKpa ?? null;
  const opening = set ?? rec;
  const s: SiteSetting = {
    key: "bypass", label: "Bypass opening", value: `${f(opening, 1)} kPa`,
    detail: [set !== null && rec !== null ? `recommended ${f(rec, 1)} kPa` : "", b?.heatSourceFlowAllZonesClosedM3h != null
      ? `heat source still gets ${f(b.heatSourceFlowAllZonesClosedM3h, 2)} m³/h with every zone shut` : ""].filter(Boolean).join("; "),
  };
  if (set !== null && rec !== null && set < rec - 0.05) return [{ ...s, warn: `Drawn below the recommended ${f(rec, 1)} kPa: it may open while zones are open. Ask the designer.` }];
  return [s];
}

function vesselSettings(part: Part, doc: Schematic, results: Results): SiteSetting[] {
  const drawn = (part.props as { prechargeBar: number | null }).prechargeBar;
  const rec = results.expansionVessel?.recommendedPrechargeBar ?? null;
  const pre = drawn ?? rec;
  return [
    { key: "precharge", label: "Pre-charge", value: `${f(pre, 2)} bar`,
      detail: `set with the water side isolated and at zero pressure${drawn !== null && rec !== null ? `; recommended ${f(rec, 2)} bar` : ""}` },
    { key: "cold-fill", label: "Cold fill pressure", value: `${f(doc.design.coldFillPressureBar, 2)} bar`, detail: "at the gauge, system cold" },
  ];
}

function safetyValveSettings(part: Part, doc: Schematic): SiteSetting[] {
  const set = (part.props as { setBar: number }).setBar;
  const s: SiteSetting = { key: "safety-valve", label: "Safety valve setting", value: `${f(set, 1)} bar` };
  if (Math.abs(set - doc.design.safetyValveBar) > 1e-9)
    return [{ ...s, warn: `The design's safety-valve setting is ${f(doc.design.safetyValveBar, 1)} bar: check which one is fitted.` }];
  return [s];
}

/** Every setting to make on a part; empty for parts that are only fitted. */
export function partSettings(part: Part, doc: Schematic, results: Results | null, balancing?: ReturnType<typeof balancingTargets>): SiteSetting[] {
  const out: SiteSetting[] = [];
  const p = part.props as Record<string, unknown>;
  if (results) {
    const target = (balancing ?? balancingTargets(doc, results)).get(part.id);
    if (target) out.push(balancingSetting(part, target));
    if (part.type === "pump" || ((part.type === "heat-pump" || part.type === "boiler") && p.pumpCurve)) out.push(...pumpSettings(part.id, results));
    if (part.type === "dp-bypass-valve") out.push(...bypassSettings(part, results));
    if (part.type === "expansion-vessel") out.push(...vesselSettings(part, doc, results));
    if (part.type === "heat-pump" || part.type === "boiler") {
      const flow = results.modes.find((m) => m.mode === "heating")?.heatSourceFlowM3h ?? null;
      out.push({ key: "heat-source-flow", label: "Design flow", value: `${f(flow, 2)} m³/h`, detail: `its minimum is ${f(p.minFlowM3h as number, 2)} m³/h` });
    }
  }
  if (part.type === "safety-valve") out.push(...safetyValveSettings(part, doc));
  if (part.type === "filling-loop") out.push({ key: "cold-fill", label: "Fill to", value: `${f(doc.design.coldFillPressureBar, 2)} bar cold`, detail: "close and disconnect it after filling where local water rules ask" });
  if (part.type === "cylinder") out.push({ key: "store", label: "Store temperature", value: `${f(p.storeTemperatureC as number, 0)} °C` });
  if (part.type === "zone-valve" || part.type === "isolation-valve") out.push({ key: "as-drawn", label: "As drawn", value: p.open === false ? "Shut" : "Open" });
  if (part.type === "diverter-valve") out.push({ key: "as-drawn", label: "Rest position", value: `ab → ${String(p.position)}` });
  return out;
}

export function partCaution(part: Part): string | undefined {
  if (part.type === "cylinder") return CAUTION_HOT_WATER;
  if (part.type === "expansion-vessel" || part.type === "safety-valve" || part.type === "heat-pump" || part.type === "boiler") return CAUTION_PRESSURE;
  return undefined;
}
