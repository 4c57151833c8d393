/**
 * Sizing a drawn draft with the engine itself, in passes (each pass is
 * calculateSchematic on the whole document):
 * 1. pipe sizes: the engine's suggested size of every pipe (the larger of
 *    heating and hot water, lib/schematic/apply-suggested-sizes.ts); valve Kv
 *    values from the parts' design flows (rules.ts kvFor). Design flows come
 *    from the loads alone, so they do not change with these choices.
 * 2. pump curves from the required heads and flows; the expansion vessel
 *    from the engine's EN 12828 volume and pre-charge, the cold fill above it.
 * 3. the bypass opening: the engine's recommended opening (needs the pump
 *    curves), rounded up to 0.5 kPa; a larger Kvs while the heat source's
 *    minimum flow is not met with every zone shut.
 * 4. the final results the draft is judged by.
 */
import { calculateSchematic, en12828MinimumFillPressureBar, en12828WaterReserveL } from "@/lib/hydraulics";
import { parseSchematic, type Results, type Schematic } from "@/lib/schematic";
import { applySuggestedSizes } from "@/lib/schematic/apply-suggested-sizes";
import { DP_LIMIT_KPA, FILL_ABOVE_PRECHARGE_BAR, KV_SERIES, kvFor, nextInSeries, pumpCurveFor, VESSEL_SERIES_L } from "./rules";

function run(doc: unknown): { doc: Schematic; results: Results } {
  const parsed = parseSchematic(doc);
  if (!parsed.ok) throw new Error(`draft: generated document does not parse: ${parsed.issues.slice(0, 3).map((i) => i.message).join("; ")}`);
  return { doc: parsed.doc, results: calculateSchematic(parsed.doc) };
}

type Part = Schematic["parts"][number];
const props = (p: Part) => p.props as Record<string, unknown>;

function partFlows(results: Results): Map<string, number> {
  const out = new Map<string, number>();
  for (const m of results.modes) for (const r of m.parts) out.set(r.id, Math.max(out.get(r.id) ?? 0, Math.abs(r.flowM3h ?? 0)));
  return out;
}

function setValves(doc: Schematic, flows: Map<string, number>, minFlowM3h: number): void {
  const hsFlow = flows.get("hs") ?? 0;
  for (const p of doc.parts) {
    const q = flows.get(p.id) ?? 0;
    if (p.type === "isolation-valve") props(p).kv = kvFor(q, DP_LIMIT_KPA.isolation);
    else if (p.type === "strainer") props(p).kv = kvFor(q, DP_LIMIT_KPA.filter);
    else if (p.type === "zone-valve") props(p).kvs = kvFor(q, DP_LIMIT_KPA.zoneValve);
    else if (p.type === "diverter-valve") props(p).kvs = kvFor(q, DP_LIMIT_KPA.diverter);
    else if (p.type === "cylinder") props(p).coilKv = kvFor(q, DP_LIMIT_KPA.coil);
    else if (p.type === "dp-bypass-valve") props(p).kvs = kvFor(Math.max(minFlowM3h, 0.2 * hsFlow), DP_LIMIT_KPA.bypass);
  }
}

function setPumps(doc: Schematic, results: Results): void {
  const duty = new Map<string, { q: number; h: number }>();
  for (const m of results.modes) {
    for (const d of m.pumps) {
      const was = duty.get(d.id) ?? { q: 0, h: 0 };
      duty.set(d.id, { q: Math.max(was.q, d.designFlowM3h ?? 0), h: Math.max(was.h, d.requiredHeadKpa ?? 0) });
    }
  }
  for (const p of doc.parts) {
    const d = duty.get(p.id);
    if (p.type === "pump" && d) props(p).curve = pumpCurveFor(d.q, d.h);
  }
}

function setVessel(doc: Schematic, results: Results): void {
  const ev = results.expansionVessel;
  const vessel = doc.parts.find((p) => p.type === "expansion-vessel");
  if (!vessel || !ev || ev.requiredVolumeL === null || ev.recommendedPrechargeBar === null) return;
  const precharge = Math.ceil(ev.recommendedPrechargeBar * 10) / 10;
  const volumeL = nextInSeries(VESSEL_SERIES_L, ev.requiredVolumeL);
  props(vessel).volumeL = volumeL;
  props(vessel).prechargeBar = precharge;
  vessel.label = `Expansion vessel ${volumeL} L, pre-charge ${precharge} bar`;
  // Cold fill: enough to put the EN 12828 water reserve into this vessel, and pre-charge + 0.3 bar at least.
  const minFill = en12828MinimumFillPressureBar(volumeL, precharge, en12828WaterReserveL(results.volume.systemL ?? 0));
  doc.design.coldFillPressureBar = Math.ceil(Math.max(minFill, precharge + FILL_ABOVE_PRECHARGE_BAR) * 10) / 10;
}

/** Bypass opening from the engine; Kvs up the series while the minimum flow is not met. */
function setBypass(doc: Schematic, results: Results): { doc: Schematic; results: Results } {
  let cur = { doc, results };
  for (let i = 0; i < KV_SERIES.length; i++) {
    const bp = cur.doc.parts.find((p) => p.type === "dp-bypass-valve");
    const rec = cur.results.bypass?.recommendedOpeningKpa ?? null;
    if (!bp || rec === null) return cur;
    props(bp).openingKpa = Math.ceil(rec * 2) / 2;
    cur = run(cur.doc);
    if (cur.results.bypass?.minFlowMet !== false) return cur;
    const kvs = props(bp).kvs as number;
    const next = KV_SERIES.find((k) => k > kvs);
    if (next === undefined) return cur;
    props(bp).kvs = next;
    props(bp).openingKpa = null;
    cur = run(cur.doc);
  }
  return cur;
}

export function sizeDraft(raw: unknown, minFlowM3h: number): { doc: Schematic; results: Results } {
  const first = run(raw);
  const sized = applySuggestedSizes(first.doc, first.results).doc;
  setValves(sized, partFlows(first.results), minFlowM3h);
  const second = run(sized);
  setPumps(second.doc, second.results);
  setVessel(second.doc, second.results);
  const third = run(second.doc);
  return setBypass(third.doc, third.results);
}
