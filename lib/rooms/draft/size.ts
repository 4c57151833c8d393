/**
 * Sizing a drawn draft with the engine itself, in passes (each pass is
 * calculateSchematic on the whole document; the working passes simulate only
 * "all zones open", the final one every default scenario):
 * 1. pipe sizes: the engine's suggested size of every pipe (the larger of
 *    heating and hot water, lib/schematic/apply-suggested-sizes.ts). A pipe no
 *    copper size can carry turns steel and takes the engine's steel
 *    suggestion; beyond the steel catalogue it keeps DN50 with an inner
 *    diameter for the design velocity (continuity q = v·πd²/4, so
 *    d = √(4q/(π·v_max)), rounded up to 10 mm), and a
 *    finding says so. Valve Kv values from the parts' design flows (rules.ts).
 *    Design flows come from the loads alone, so these choices do not move them.
 * 2. pump curves from the required heads and flows; the expansion vessel
 *    from the engine's EN 12828 volume and pre-charge, the cold fill above it.
 * 3. the bypass opening: the engine's recommended opening (needs the pump
 *    curves), rounded up to 0.5 kPa; a larger Kvs while the heat source's
 *    minimum flow is not met with every zone shut.
 * 4. the final results the draft is judged by.
 */
import { calculateSchematic, en12828MinimumFillPressureBar, en12828WaterReserveL } from "@/lib/hydraulics";
import { parseSchematic, type Finding, type Results, type Schematic } from "@/lib/schematic";
import { applySuggestedSizes } from "@/lib/schematic/apply-suggested-sizes";
import { DP_LIMIT_KPA, FILL_ABOVE_PRECHARGE_BAR, KV_SERIES, kvFor, nextInSeries, pumpCurveFor, VESSEL_SERIES_L } from "./rules";

type Part = Schematic["parts"][number];
const props = (p: Part) => p.props as Record<string, unknown>;
const QUICK = [{ name: "all zones open", mode: "heating" as const, valves: {} }];
/** Below this a pipe carries nothing in a mode, m³/h (as apply-suggested-sizes). */
const NO_FLOW_M3H = 0.001;

function calc(doc: Schematic, quick: boolean): Results {
  return calculateSchematic(quick ? { ...doc, scenarios: QUICK } : doc);
}

function partFlows(results: Results): Map<string, number> {
  const out = new Map<string, number>();
  for (const m of results.modes) for (const r of m.parts) out.set(r.id, Math.max(out.get(r.id) ?? 0, Math.abs(r.flowM3h ?? 0)));
  return out;
}

/** Pipes with flow but no suggested size in some mode, and their largest flow (m³/h). */
function unsized(results: Results): Map<string, number> {
  const out = new Map<string, number>();
  for (const m of results.modes) {
    for (const p of m.pipes) {
      const q = Math.abs(p.flowM3h ?? 0);
      if (q > NO_FLOW_M3H && p.suggestedSize === null) out.set(p.id, Math.max(out.get(p.id) ?? 0, q));
    }
  }
  return out;
}

function sizePipes(doc: Schematic, findings: Finding[]): Schematic {
  const first = calc(doc, true);
  let cur = applySuggestedSizes(doc, first).doc;
  const tooBig = unsized(first);
  if (tooBig.size === 0) return cur;
  cur = { ...cur, pipes: cur.pipes.map((p) => (tooBig.has(p.id) && p.material === "copper" ? { ...p, material: "steel" as const, size: "DN50" } : p)) };
  cur = applySuggestedSizes(cur, calc(cur, true)).doc;
  const still = unsized(calc(cur, true));
  const vMax = cur.design.maxVelocityMps;
  cur = {
    ...cur,
    pipes: cur.pipes.map((p) => {
      const q = still.get(p.id);
      if (q === undefined) return p;
      const dMm = Math.ceil((Math.sqrt((4 * q) / 3600 / (Math.PI * vMax)) * 1000) / 10) * 10;
      findings.push({ severity: "info", code: "draft.pipe-beyond-catalogue", message: `pipe ${p.id}: ${q.toFixed(2)} m³/h is more than the largest catalogue pipe carries at ${vMax} m/s; drawn as steel with a ${dMm} mm bore (velocity rule): choose a real size`, refs: [p.id] });
      return { ...p, material: "steel" as const, size: "DN50", innerDiameterMm: dMm };
    }),
  };
  return cur;
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
function setBypass(doc: Schematic, results: Results): void {
  let r = results;
  const bp = doc.parts.find((p) => p.type === "dp-bypass-valve");
  if (!bp) return;
  for (let i = 0; i < KV_SERIES.length; i++) {
    const rec = r.bypass?.recommendedOpeningKpa ?? null;
    if (rec === null) return;
    props(bp).openingKpa = Math.ceil(rec * 2) / 2;
    if (calc(doc, true).bypass?.minFlowMet !== false) return;
    const next = KV_SERIES.find((k) => k > (props(bp).kvs as number));
    if (next === undefined) return;
    props(bp).kvs = next;
    props(bp).openingKpa = null;
    r = calc(doc, true);
  }
}

export function sizeDraft(raw: unknown, minFlowM3h: number): { doc: Schematic; results: Results; findings: Finding[] } {
  const parsed = parseSchematic(raw);
  if (!parsed.ok) throw new Error(`draft: generated document does not parse: ${parsed.issues.slice(0, 3).map((i) => i.message).join("; ")}`);
  const findings: Finding[] = [];
  const doc = sizePipes(parsed.doc, findings);
  setValves(doc, partFlows(calc(doc, true)), minFlowM3h);
  const second = calc(doc, true);
  setPumps(doc, second);
  setVessel(doc, second);
  setBypass(doc, calc(doc, true));
  const final = parseSchematic(JSON.parse(JSON.stringify(doc)));
  if (!final.ok) throw new Error(`draft: sized document does not parse: ${final.issues.slice(0, 3).map((i) => i.message).join("; ")}`);
  return { doc: final.doc, results: calc(final.doc, false), findings };
}
