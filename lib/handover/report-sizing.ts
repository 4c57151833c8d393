/**
 * The sizing tables of the handover report, read from the revision's kept results (the
 * engine's own numbers, as the sizing report shows them): pipe schedule, circuits and
 * balancing, pump duty with its curve, bypass, expansion vessel, volumes, emitters.
 */
import { splitPortRef, type Results, type Schematic } from "@/lib/schematic";
import { partName } from "@/lib/site/names";
import type { Block, Section } from "./report-blocks";

/** Fixed decimals; "—" for no number; never "-0.00". */
const f = (n: number | null | undefined, d: number) => (n === null || n === undefined || !Number.isFinite(n) ? "—" : (Math.abs(n) < 0.5 * 10 ** -d ? 0 : n).toFixed(d));
const yes = (b: boolean | null | undefined, okWord = "yes", badWord = "no") => (b === null || b === undefined ? "—" : b ? okWord : badWord);

function pipeSchedule(doc: Schematic, results: Results): Section {
  const heating = results.modes.find((m) => m.mode === "heating") ?? results.modes[0];
  const byId = new Map(heating?.pipes.map((p) => [p.id, p]) ?? []);
  const parts = new Map(doc.parts.map((p) => [p.id, p]));
  const end = (ref: string) => {
    const p = parts.get(splitPortRef(ref).partId);
    return p ? partName(p) : ref;
  };
  const rows = doc.pipes.map((p) => {
    const r = byId.get(p.id);
    return [p.id, `${end(p.from)} → ${end(p.to)}`, p.material, p.size, f(p.lengthM, 1), f(r?.flowM3h, 3), f(r?.velocityMps, 2), f(r?.gradientPaPerM, 0), f(r?.pressureDropKpa, 2)];
  });
  return { id: "pipes", title: "Pipe schedule", blocks: [
    { kind: "para", text: `Design mode ${heating?.mode ?? "—"}: flow, velocity and pressure gradient of every pipe at its design flow.` },
    { kind: "table", columns: ["Pipe", "Runs", "Material", "Size", "Length m", "Flow m³/h", "Velocity m/s", "Gradient Pa/m", "Δp kPa"], rows,
      numeric: [false, false, false, false, true, true, true, true, true] },
  ] };
}

function circuits(doc: Schematic, results: Results): Section {
  const names = new Map(doc.parts.map((p) => [p.id, partName(p)]));
  const rows = results.modes.flatMap((m) => m.circuits.map((c) => [m.mode, names.get(c.load) ?? c.load, c.pump ? names.get(c.pump) ?? c.pump : "—",
    f(c.pressureDropKpa, 1), c.index ? "index" : "", f(c.excessKpa, 1), c.balancingKv === null ? "—" : f(c.balancingKv, 2)]));
  return { id: "circuits", title: "Circuits and balancing", blocks: [
    { kind: "para", text: "Each circuit's pressure drop; the index circuit sets the pump head, the others burn their excess in a balancing valve set to the Kv given." },
    { kind: "table", columns: ["Mode", "Load", "Pump", "Δp kPa", "", "Excess kPa", "Balancing Kv"], rows, numeric: [false, false, false, true, false, true, true] },
  ] };
}

function curveOf(doc: Schematic, id: string): [number, number][] | null {
  const p = doc.parts.find((x) => x.id === id);
  const props = (p?.props ?? {}) as { curve?: [number, number][]; pumpCurve?: [number, number][] | null };
  const c = props.curve ?? props.pumpCurve ?? null;
  return Array.isArray(c) && c.length >= 2 ? c : null;
}

function pumps(doc: Schematic, results: Results): Section {
  const names = new Map(doc.parts.map((p) => [p.id, partName(p)]));
  const duties = results.modes.flatMap((m) => m.pumps.map((d) => ({ mode: m.mode, d })));
  const rows = duties.map(({ mode, d }) => [mode, names.get(d.id) ?? d.id, f(d.designFlowM3h, 2), f(d.requiredHeadKpa, 1), f(d.availableHeadKpa, 1),
    f(d.surplusKpa, 1), d.speedFraction === null ? "—" : `${f(d.speedFraction * 100, 0)} %`, yes(d.ok, "meets duty", "short")]);
  const curves: Block[] = duties.flatMap(({ mode, d }) => {
    const curve = curveOf(doc, d.id);
    if (!curve) return [];
    const duty = d.designFlowM3h !== null && d.requiredHeadKpa !== null ? { flowM3h: d.designFlowM3h, headKpa: d.requiredHeadKpa } : null;
    return [{ kind: "pump-curve" as const, id: d.id, label: names.get(d.id) ?? d.id, mode, curve, duty }];
  });
  return { id: "pump", title: "Pump duty", blocks: [
    { kind: "table", columns: ["Mode", "Pump", "Flow m³/h", "Head needed kPa", "Curve gives kPa", "Surplus kPa", "Speed", "Verdict"], rows,
      numeric: [false, false, true, true, true, true, true, false] },
    ...curves,
  ] };
}

function plant(doc: Schematic, results: Results): Section[] {
  const b = results.bypass;
  const v = results.expansionVessel;
  const names = new Map(doc.parts.map((p) => [p.id, partName(p)]));
  const bypass: Section = { id: "bypass", title: "Bypass", blocks: [b
    ? { kind: "table", columns: ["Quantity", "Value"], rows: [
        ["Valve", names.get(b.id) ?? b.id], ["Recommended opening Δp", `${f(b.recommendedOpeningKpa, 1)} kPa`],
        ["Zones' design Δp across it", `${f(b.zonesDpKpa, 1)} kPa`], ["Δp across it with every zone open", `${f(b.openZonesDpKpa, 1)} kPa`],
        ["Heat-source flow, every zone shut", `${f(b.heatSourceFlowAllZonesClosedM3h, 2)} m³/h`], ["Heat source's minimum flow met", yes(b.minFlowMet)]] }
    : { kind: "para", text: "No differential-pressure bypass valve in this design." }] };
  const vessel: Section = { id: "vessel", title: "Expansion vessel", blocks: [v
    ? { kind: "table", columns: ["Quantity", "Value"], rows: [
        ["System volume", `${f(v.systemVolumeL, 1)} L`], ["Expansion volume", `${f(v.expansionVolumeL, 2)} L`],
        ["Vessel volume required", `${f(v.requiredVolumeL, 1)} L`], ["Vessel volume provided", `${f(v.providedVolumeL, 1)} L`],
        ["Recommended pre-charge", `${f(v.recommendedPrechargeBar, 2)} bar`], ["Cold fill", `${f(doc.design.coldFillPressureBar, 2)} bar`],
        ["Safety valve", `${f(doc.design.safetyValveBar, 1)} bar`], ["Verdict", yes(v.ok, "large enough", "too small")]] }
    : { kind: "para", text: "No expansion vessel in this design." }] };
  const volumes: Section = { id: "volumes", title: "Volumes and hot water", blocks: [{ kind: "table", columns: ["Quantity", "Value"], rows: [
    ["System water volume", `${f(results.volume.systemL, 1)} L`], ["Heat source's minimum volume", `${f(results.volume.minimumL, 1)} L`],
    ["Buffer recommended", yes(results.volume.bufferRecommended)],
    ...(results.hotWater ? [["Cylinder reheat time", `${f(results.hotWater.reheatMinutes, 0)} min`]] : []),
  ] }] };
  return [bypass, vessel, volumes];
}

function emitters(doc: Schematic, results: Results): Section {
  const names = new Map(doc.parts.map((p) => [p.id, partName(p)]));
  const rows = results.emitters.map((e) => [names.get(e.id) ?? e.id, f(e.heatLoadW, 0), f(e.outputAtDesignW, 0), yes(e.ok, "meets load", "short")]);
  return { id: "emitters", title: "Emitters at design flow temperature", blocks: [
    { kind: "para", text: `Output at the design flow ${f(doc.design.flowTemperatureC, 0)} °C and return ${f(doc.design.returnTemperatureC, 0)} °C.` },
    rows.length ? { kind: "table", columns: ["Emitter", "Heat load W", "Output W", "Verdict"], rows, numeric: [false, true, true, false] }
      : { kind: "para", text: "No emitters in this design." },
  ] };
}

export function sizingSections(doc: Schematic, results: Results): Section[] {
  return [pipeSchedule(doc, results), circuits(doc, results), pumps(doc, results), ...plant(doc, results), emitters(doc, results)];
}
