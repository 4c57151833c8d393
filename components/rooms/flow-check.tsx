"use client";
/**
 * The flow-temperature check of the saved rooms: at the chosen flow
 * temperature and Δt, each room's emitter output, shortfall, the rating it
 * would need and the firm list's smallest emitter that meets it; the lowest
 * flow temperature at which every room is met; the chart 35–75 °C.
 */
import useSWR from "swr";
import type { FlowCheck as Check } from "@/lib/rooms/flow-temperature";
import { roomsApi } from "./api";
import { FlowChart } from "./flow-chart";

const w = (x: number | null) => (x === null ? "—" : Math.round(x).toLocaleString("en"));

export function FlowCheck({ projectId, flowC, deltaK, version, onTemperatures }: {
  projectId: string; flowC: number; deltaK: number; version: number; onTemperatures: (flowC: number, deltaK: number) => void;
}) {
  const valid = flowC >= 25 && flowC <= 90 && deltaK >= 1 && deltaK <= 30;
  const { data, error, isLoading } = useSWR<Check>(valid ? ["flow", projectId, flowC, deltaK, version] : null,
    () => roomsApi.flowCheck(projectId, flowC, deltaK), { keepPreviousData: true });
  const lowest = data?.lowestFlowTemperatureC ?? null;
  return (
    <section className="mt-10" aria-labelledby="flow-h" data-testid="flow-check">
      <h2 id="flow-h" className="text-lg font-semibold">Flow temperature check</h2>
      <p className="mt-1 text-sm text-ink-soft">Emitter output by EN 442-2 (logarithmic mean excess temperature) and, for floors, the EN 1264 basic characteristic, against each room's saved heat loss.</p>
      <div className="mt-3 flex flex-wrap items-end gap-4">
        <label className="flex flex-col text-xs text-ink-soft">Design flow °C
          <input type="number" step="0.5" min={25} max={90} value={flowC} onChange={(e) => onTemperatures(Number(e.target.value), deltaK)}
            className="mt-0.5 w-24 rounded border border-ink/15 bg-white px-2 py-1 text-sm text-ink" data-testid="flow-c" />
        </label>
        <label className="flex flex-col text-xs text-ink-soft">Δt flow − return, K
          <input type="number" step="0.5" min={1} max={30} value={deltaK} onChange={(e) => onTemperatures(flowC, Number(e.target.value))}
            className="mt-0.5 w-24 rounded border border-ink/15 bg-white px-2 py-1 text-sm text-ink" data-testid="delta-k" />
        </label>
        {data && (
          <p className="text-sm" data-testid="lowest-flow">
            {lowest === null
              ? <>No flow temperature meets every room: <b>{data.limitingRoom}</b> {data.rooms.find((r) => r.name === data.limitingRoom)?.note ?? "cannot be met"}.</>
              : <>Every room is met from <b className="num text-ok">{lowest.toFixed(1)} °C</b> flow (set by {data.limitingRoom}).</>}
          </p>
        )}
      </div>
      {!valid && <p role="alert" className="mt-2 text-sm text-fault">Flow 25–90 °C and Δt 1–30 K.</p>}
      {error && <p role="alert" className="mt-2 text-sm text-fault">{(error as Error).message}</p>}
      {isLoading && !data && <p className="mt-2 text-sm text-ink-faint">Checking…</p>}
      {data && data.rooms.length === 0 && <p className="mt-2 text-sm text-ink-soft">No rooms saved yet.</p>}
      {data && data.rooms.length > 0 && (
        <>
          <div className="mt-4 rounded-md border border-ink/10 bg-white p-2"><FlowChart check={data} /></div>
          <div className="relative mt-4 overflow-x-auto rounded-md border border-ink/10 bg-white">
            <table className="w-full min-w-max text-sm" data-testid="flow-table">
              <thead className="bg-paper-dark text-left text-xs text-ink-soft">
                <tr>{["Room", "Loss W", `Output at ${flowC}/${flowC - deltaK} W`, "Short W", "Needs Φ50 W", "Smallest from the list", "Lowest flow °C"].map((h) => <th key={h} className="px-3 py-2 font-medium">{h}</th>)}</tr>
              </thead>
              <tbody>
                {data.rooms.map((r) => (
                  <tr key={r.name} className="border-t border-ink/5">
                    <td className="px-3 py-1.5">{r.name}{r.note && <span className="block text-xs text-ink-faint">{r.note}</span>}</td>
                    <td className="num px-3 py-1.5">{w(r.heatLossW)}</td>
                    <td className={`num px-3 py-1.5 ${r.met ? "text-ok" : "text-fault"}`}>{w(r.outputW)}</td>
                    <td className="num px-3 py-1.5">{r.shortfallW > 0 ? w(r.shortfallW) : "—"}</td>
                    <td className="num px-3 py-1.5">{w(r.neededOutputAtDt50W)}</td>
                    <td className="px-3 py-1.5">{r.suggested ? <>{r.suggested.name} <span className="num text-xs text-ink-faint">({w(r.suggested.outputAtDt50W)} W)</span></> : "—"}</td>
                    <td className="num px-3 py-1.5">{r.lowestFlowTemperatureC === null ? "—" : r.lowestFlowTemperatureC.toFixed(1)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
    </section>
  );
}
