"use client";
/**
 * "First draft": the plant choice (heat source, zones, hot water, separation,
 * what to do with short emitters) for the saved rooms; the server draws and
 * sizes the schematic and saves it as a new one to open on the drawing board.
 */
import Link from "next/link";
import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import type { Room } from "@/lib/rooms/schema";
import { roomsApi, type DraftAnswer } from "./api";

const field = "mt-0.5 rounded border border-ink/15 bg-white px-2 py-1 text-sm text-ink";
const label = "flex flex-col text-xs text-ink-soft";

export function DraftForm({ projectId, rooms, flowC, deltaK, practice }: { projectId: string; rooms: Room[]; flowC: number; deltaK: number; practice: boolean }) {
  const [kind, setKind] = useState<"heat-pump" | "boiler">("heat-pump");
  const [ratedKw, setRatedKw] = useState(() => String(Math.max(4, Math.ceil(rooms.reduce((s, r) => s + r.heatLossW, 0) / 1000))));
  const [minFlow, setMinFlow] = useState("0.6");
  const [cylinderL, setCylinderL] = useState<string | null>("200");
  const [separation, setSeparation] = useState<"bypass" | "buffer" | "low-loss-header">("bypass");
  const [emitters, setEmitters] = useState<"upsize" | "keep">("upsize");
  const [zones, setZones] = useState<string[]>(["Zone 1"]);
  const [zoneOf, setZoneOf] = useState<Record<string, number>>({});
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<DraftAnswer | null>(null);

  const plant = useMemo(() => ({
    heatSource: { kind, ratedOutputKw: Number(ratedKw), minFlowM3h: Number(minFlow) },
    flowTemperatureC: flowC, deltaTK: deltaK,
    zones: zones.map((name, z) => ({ name, rooms: rooms.filter((r) => (zoneOf[r.name] ?? 0) === z).map((r) => r.name) })).filter((z) => z.rooms.length > 0),
    hotWaterCylinderL: cylinderL === null ? null : Number(cylinderL), separation, emitters,
  }), [kind, ratedKw, minFlow, flowC, deltaK, zones, zoneOf, rooms, cylinderL, separation, emitters]);

  const generate = async () => {
    setBusy(true);
    setError(null);
    setDone(null);
    try {
      setDone(await roomsApi.draft(projectId, plant));
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  };

  return (
    <section className="mt-10" aria-labelledby="draft-h" data-testid="draft-form">
      <h2 id="draft-h" className="text-lg font-semibold">First draft</h2>
      <p className="mt-1 text-sm text-ink-soft">A complete schematic from the saved rooms at {flowC}/{flowC - deltaK} °C: plant room, a zone valve per zone, each room&apos;s emitter with its load, pipes sized by the engine. {practice ? "As a trainee you get a private practice copy." : "It opens on the drawing board as a new schematic to edit."}</p>
      <div className="mt-3 grid gap-3 sm:grid-cols-3 lg:grid-cols-6">
        <label className={label}>Heat source
          <select className={field} value={kind} onChange={(e) => setKind(e.target.value as typeof kind)}><option value="heat-pump">heat pump</option><option value="boiler">boiler</option></select>
        </label>
        <label className={label}>Rated output kW<input className={field} inputMode="decimal" value={ratedKw} onChange={(e) => setRatedKw(e.target.value)} data-testid="rated-kw" /></label>
        <label className={label}>Minimum flow m³/h<input className={field} inputMode="decimal" value={minFlow} onChange={(e) => setMinFlow(e.target.value)} /></label>
        <label className={label}>Separation
          <select className={field} value={separation} onChange={(e) => setSeparation(e.target.value as typeof separation)}>
            <option value="bypass">bypass valve</option><option value="buffer">buffer vessel</option><option value="low-loss-header">low-loss header</option>
          </select>
        </label>
        <label className={label}>Short emitters
          <select className={field} value={emitters} onChange={(e) => setEmitters(e.target.value as typeof emitters)}>
            <option value="upsize">replace (upsize)</option><option value="keep">keep, list shortfall</option>
          </select>
        </label>
        <div className={label}>
          <label className="flex items-center gap-1.5"><input type="checkbox" checked={cylinderL !== null} onChange={(e) => setCylinderL(e.target.checked ? "200" : null)} /> Hot-water cylinder, L</label>
          <input className={field} inputMode="decimal" value={cylinderL ?? ""} disabled={cylinderL === null} onChange={(e) => setCylinderL(e.target.value)} aria-label="Cylinder volume, L" />
        </div>
      </div>
      <fieldset className="mt-4">
        <legend className="text-sm font-semibold">Zones</legend>
        <div className="mt-2 flex flex-wrap items-center gap-2">
          {zones.map((z, i) => (
            <input key={i} value={z} onChange={(e) => setZones(zones.map((x, j) => (j === i ? e.target.value : x)))} aria-label={`Zone ${i + 1} name`} className={`${field} w-36`} />
          ))}
          <Button variant="secondary" className="px-2 py-1" onClick={() => setZones([...zones, `Zone ${zones.length + 1}`])} disabled={zones.length >= 20}>Add zone</Button>
        </div>
        <ul className="mt-3 grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
          {rooms.map((r) => (
            <li key={r.name} className="flex items-center justify-between gap-2 rounded border border-ink/10 bg-white px-2 py-1 text-sm">
              <span className="truncate">{r.name}</span>
              <select value={zoneOf[r.name] ?? 0} onChange={(e) => setZoneOf({ ...zoneOf, [r.name]: Number(e.target.value) })} aria-label={`Zone of ${r.name}`} className="rounded border border-ink/15 bg-white px-1 py-0.5 text-sm">
                {zones.map((z, i) => <option key={i} value={i}>{z}</option>)}
              </select>
            </li>
          ))}
        </ul>
      </fieldset>
      <div className="mt-4 flex flex-wrap items-center gap-3">
        <Button onClick={generate} disabled={busy || rooms.length === 0}>{busy ? "Drawing and sizing…" : "Generate first draft"}</Button>
        {rooms.length === 0 && <span className="text-sm text-ink-faint">Save some rooms first.</span>}
      </div>
      {error && <p role="alert" className="mt-2 text-sm text-fault">{error}</p>}
      {done && (
        <div className="mt-4 rounded-lg border border-ok/30 bg-white p-4" data-testid="draft-done">
          <p className="text-sm"><b>{done.name}</b> is drawn and sized{done.engineFindings.length ? ` (${done.engineFindings.length} engine finding${done.engineFindings.length === 1 ? "" : "s"} to look at)` : " with no engine errors or warnings"}.</p>
          {done.findings.length > 0 && (
            <ul className="mt-2 space-y-1 text-sm">
              {done.findings.map((f, i) => <li key={i} className={f.severity === "warning" ? "text-warn" : "text-ink-soft"}>{f.message}</li>)}
            </ul>
          )}
          <Link href={`/projects/${projectId}/schematics/${done.schematicId}`} className="mt-3 inline-block rounded-md bg-copper-500 px-3 py-1.5 text-sm font-medium text-white hover:bg-copper-600">Open on the drawing board</Link>
        </div>
      )}
    </section>
  );
}
