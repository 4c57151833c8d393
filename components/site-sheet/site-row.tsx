"use client";
import type { PartRow, PipeRow, SiteRow } from "@/lib/site/types";
import type { ShownTick } from "./overlay";

const when = (iso: string) => new Date(iso).toLocaleString("en-GB", { hour: "2-digit", minute: "2-digit", day: "numeric", month: "short" });
const materials: Record<string, string> = { copper: "copper", steel: "steel", pex: "PE-X", multilayer: "multilayer" };

function TickButton({ id, tick, disabled, onToggle }: { id: string; tick?: ShownTick; disabled: boolean; onToggle: () => void }) {
  const on = tick?.ticked === true;
  return (
    <button type="button" onClick={onToggle} disabled={disabled} aria-pressed={on} aria-label={`Installed: ${id}`} data-testid={`tick-${id}`}
      className={`flex h-12 w-12 shrink-0 items-center justify-center rounded-md border-2 text-2xl font-bold ${on
        ? "border-ok bg-ok text-white" : "border-ink/40 bg-white text-transparent"} disabled:opacity-60`}>
      ✓
    </button>
  );
}

function PipeBody({ row }: { row: PipeRow }) {
  return (
    <>
      <p className="text-base font-semibold"><span className="num">{row.id}</span> · <span className="num">{row.size}</span> {materials[row.material] ?? row.material} · <span className="num">{row.lengthM} m</span></p>
      <p className="text-sm text-ink">{row.runs}</p>
      <p className="text-sm text-ink-soft">{row.fittings || "no fittings"}{row.flowM3h ? <> · <span className="num">{row.flowM3h.toFixed(2)} m³/h</span></> : null}</p>
    </>
  );
}

function PartBody({ row }: { row: PartRow }) {
  return (
    <>
      <p className="text-base font-semibold">{row.label}</p>
      <p className="text-sm text-ink-soft"><span className="num">{row.id}</span> · {row.type.replace(/-/g, " ")}</p>
      {row.settings.length > 0 && (
        <dl className="mt-1 space-y-1">
          {row.settings.map((s) => (
            <div key={s.key} className="rounded bg-paper-dark px-2 py-1" data-setting={s.key}>
              <dt className="text-sm text-ink-soft">{s.label}</dt>
              <dd className="num text-lg font-bold text-ink">{s.value}</dd>
              {s.detail ? <dd className="text-sm text-ink">{s.detail}</dd> : null}
              {s.warn ? <dd className="text-sm font-semibold text-fault">{s.warn}</dd> : null}
            </div>
          ))}
        </dl>
      )}
      {row.caution ? <p className="mt-1 border-l-4 border-warn pl-2 text-sm text-ink">{row.caution}</p> : null}
    </>
  );
}

export function SiteRowView({ row, tick, mayRecord, highlighted, onToggle, onDrawing, onPhoto }: {
  row: SiteRow; tick?: ShownTick; mayRecord: boolean; highlighted: boolean; onToggle: () => void; onDrawing?: () => void; onPhoto?: () => void;
}) {
  return (
    <li id={`row-${row.id}`} data-row={row.id} className={`flex scroll-mt-48 gap-3 border-b border-ink/10 px-3 py-3 ${highlighted ? "bg-copper-50 outline-2 outline-copper-500" : "bg-white"}`}>
      <TickButton id={row.id} tick={tick} disabled={!mayRecord} onToggle={onToggle} />
      <div className="min-w-0 flex-1">
        {row.kind === "pipe" ? <PipeBody row={row} /> : <PartBody row={row} />}
        {tick?.ticked && <p className="mt-1 text-sm font-medium text-ok">Installed · {tick.by ?? "someone"} · {when(tick.at)}{tick.waiting ? " · waiting to send" : ""}</p>}
        {tick && !tick.ticked && tick.waiting && <p className="mt-1 text-sm text-ink-soft">Unticked · waiting to send</p>}
        <div className="mt-1 flex gap-2">
          {onDrawing && <button type="button" onClick={onDrawing} className="min-h-11 rounded px-2 text-sm font-semibold text-copper-700 underline">On the drawing</button>}
          {onPhoto && mayRecord && <button type="button" onClick={onPhoto} className="min-h-11 rounded px-2 text-sm font-semibold text-copper-700 underline">Photo</button>}
        </div>
      </div>
    </li>
  );
}
