/**
 * The design values site readings are compared with, read from the issued document and
 * its kept results (nothing sized here). Client-safe: the phone compares readings it made
 * offline with these before they are sent.
 */
import type { Results, Schematic } from "@/lib/schematic";
import type { CommissioningDesign } from "./commissioning";
import { partName } from "./names";

export function commissioningDesign(doc: Schematic, results: Results | null): CommissioningDesign {
  const heating = results?.modes.find((m) => m.mode === "heating") ?? results?.modes[0];
  const bypassPart = doc.parts.find((p) => p.type === "dp-bypass-valve");
  const drawnOpening = bypassPart ? (bypassPart.props as { openingKpa: number | null }).openingKpa : null;
  const vessel = doc.parts.find((p) => p.type === "expansion-vessel");
  const drawnPrecharge = vessel ? (vessel.props as { prechargeBar: number | null }).prechargeBar : null;
  const pumpIds = new Set((results?.modes ?? []).flatMap((m) => m.pumps.map((p) => p.id)));
  const pumps = [...pumpIds].map((id) => {
    const part = doc.parts.find((p) => p.id === id);
    const heads = (results?.modes ?? []).map((m) => m.pumps.find((p) => p.id === id)?.requiredHeadKpa ?? null).filter((h): h is number => h !== null);
    return { id, label: part ? partName(part) : id, headKpa: heads.length ? Math.max(...heads) : null };
  });
  return {
    heatSourceFlowM3h: heating?.heatSourceFlowM3h ?? null,
    flowTemperatureC: doc.design.flowTemperatureC,
    returnTemperatureC: doc.design.returnTemperatureC,
    bypass: bypassPart ? { id: bypassPart.id, openingKpa: drawnOpening ?? results?.bypass?.recommendedOpeningKpa ?? null } : null,
    pumps,
    vesselPrechargeBar: drawnPrecharge ?? results?.expansionVessel?.recommendedPrechargeBar ?? null,
    safetyValveBar: doc.parts.find((p) => p.type === "safety-valve")
      ? (doc.parts.find((p) => p.type === "safety-valve")!.props as { setBar: number }).setBar : doc.design.safetyValveBar,
    coldFillPressureBar: doc.design.coldFillPressureBar,
    glycolPercent: doc.fluid.kind === "water" ? null : ((doc.fluid as { percentByVolume?: number }).percentByVolume ?? null),
    densityKgM3: results?.fluid.densityKgM3 ?? null,
  };
}
