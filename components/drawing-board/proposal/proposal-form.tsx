"use client";

import { useContext, useEffect } from "react";
import useSWR from "swr";
import { LIFE_COST_ASSUMPTIONS } from "@/lib/hydraulics/optimise/life-cost";
import type { Prices } from "@/lib/hydraulics/optimise/prices";
import { Button } from "@/components/ui/button";
import { fetchJson } from "@/lib/fetch-json";
import { BoardSessionContext } from "../persistence/session-context";
import { useProposal, UI_HEAD_MARGIN_KPA } from "./proposal-store";

const field = "w-20 rounded border border-ink/15 bg-white px-1.5 py-0.5 text-right text-sm num";

function NumberInput({ label, value, onChange, step, min, max, unit, testId }: {
  label: string; value: number; onChange: (v: number) => void; step: number; min: number; max?: number; unit: string; testId?: string;
}) {
  return (
    <label className="flex items-center justify-between gap-2 text-sm">
      <span className="text-ink-soft">{label}</span>
      <span className="flex items-center gap-1">
        <input type="number" className={field} value={value} step={step} min={min} max={max} data-testid={testId}
          onChange={(e) => Number.isFinite(e.target.valueAsNumber) && onChange(e.target.valueAsNumber)} />
        <span className="w-10 text-xs text-ink-faint">{unit}</span>
      </span>
    </label>
  );
}

/** The project's price list, when it has one: its pipe prices go to the optimiser; says which prices are used. */
function PriceSource() {
  const projectId = useContext(BoardSessionContext)?.projectId;
  const { data } = useSWR<{ priceList: { items: number } | null; pipePrices: Prices }>(projectId ? `/api/v1/projects/${projectId}/price-list` : null, fetchJson);
  const setOptions = useProposal((s) => s.setOptions);
  useEffect(() => setOptions({ prices: data?.pipePrices ?? {} }), [data, setOptions]);
  const sizes = Object.values(data?.pipePrices ?? {}).reduce((n, bySize) => n + Object.keys(bySize ?? {}).length, 0);
  return (
    <p className="text-xs text-ink-faint" data-testid="proposal-prices">
      {sizes > 0
        ? `Prices: the firm's price list (${sizes} pipe size${sizes > 1 ? "s" : ""}; only those sizes are offered for their material).`
        : `Prices: invented demo table${data?.priceList ? " — the firm's price list prices no pipe sizes" : " until the firm's price list is entered (handover pack)"}.`}
    </p>
  );
}

/** What to optimise for, the head margin kept on every pump, and (life cost) the energy assumptions. */
export function ProposalForm() {
  const options = useProposal((s) => s.options);
  const setOptions = useProposal((s) => s.setOptions);
  const run = useProposal((s) => s.run);
  const busy = useProposal((s) => s.status === "running");
  const life = options.lifeCost;
  const setLife = (patch: Partial<typeof life>) => setOptions({ lifeCost: { ...life, ...patch } });
  return (
    <form className="space-y-2" onSubmit={(e) => { e.preventDefault(); void run(); }}>
      <fieldset className="flex rounded-md border border-ink/10 p-0.5 text-sm" aria-label="Optimise for">
        {([["pipe-cost", "Pipe cost"], ["life-cost", "Life cost"]] as const).map(([value, text]) => (
          <label key={value} className={`flex-1 cursor-pointer rounded px-2 py-0.5 text-center ${options.objective === value ? "bg-copper-50 text-copper-700" : "text-ink-soft"}`}>
            <input type="radio" name="objective" value={value} className="sr-only" checked={options.objective === value} onChange={() => setOptions({ objective: value })} />
            {text}
          </label>
        ))}
      </fieldset>
      <NumberInput label="Head margin on every pump" value={options.headMarginKpa} step={0.5} min={0} unit="kPa" testId="head-margin"
        onChange={(v) => setOptions({ headMarginKpa: Math.max(0, v) })} />
      <p className="text-xs text-ink-faint">Default {UI_HEAD_MARGIN_KPA} kPa: every circuit may use the pump&apos;s whole head at its design flow.</p>
      {options.objective === "life-cost" && (
        <div className="space-y-1 rounded-md bg-paper-dark/60 p-2">
          <NumberInput label="Years" value={life.years} step={1} min={1} max={100} unit="y" onChange={(v) => setLife({ years: v })} />
          <NumberInput label="Electricity price" value={life.pricePerKwh} step={0.01} min={0} unit="/kWh" onChange={(v) => setLife({ pricePerKwh: v })} />
          <NumberInput label="Pump efficiency" value={Math.round(life.pumpEfficiency * 100)} step={1} min={1} max={100} unit="%" onChange={(v) => setLife({ pumpEfficiency: Math.min(1, Math.max(0.01, v / 100)) })} />
          <NumberInput label="Running hours" value={life.hoursPerYear} step={100} min={0} max={8784} unit="h/y" onChange={(v) => setLife({ hoursPerYear: v })} />
          <p className="text-xs text-ink-faint">
            Energy = Q·Δp/η × hours × years. Defaults are assumptions, not data: {LIFE_COST_ASSUMPTIONS.years} years,
            {" "}{LIFE_COST_ASSUMPTIONS.pricePerKwh}/kWh, {LIFE_COST_ASSUMPTIONS.pumpEfficiency * 100} % wire-to-water, {LIFE_COST_ASSUMPTIONS.hoursPerYear} h a year — put in your own.
          </p>
        </div>
      )}
      <PriceSource />
      <Button type="submit" disabled={busy} className="w-full py-1.5" data-testid="find-sizes">{busy ? "Searching…" : "Find cheapest sizes"}</Button>
    </form>
  );
}
