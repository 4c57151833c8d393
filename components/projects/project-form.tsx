"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { Issue } from "@/lib/schematic";
import type { DesignDefaults } from "@/lib/projects/design-defaults";

export interface ProjectFields { name: string; client: string; clientEmail: string; site: string; design: DesignDefaults }
type Result = { ok: true } | { ok: false; error: string; issues?: Issue[] };

const input = "w-full rounded-md border border-ink/15 bg-white px-2.5 py-1.5 text-sm focus:outline-2 focus:outline-copper-500 aria-[invalid=true]:border-fault";

/** Name, client and their e-mail, site and the design defaults every new schematic of the project starts from; new and edit share it. */
export function ProjectForm({ initial, submitLabel, onSubmit, onCancel }: {
  initial: ProjectFields; submitLabel: string; onSubmit: (v: ProjectFields) => Promise<Result>; onCancel?: () => void;
}) {
  const [v, setV] = useState(initial);
  const [temps, setTemps] = useState({ flow: String(initial.design.flowTemperatureC), ret: String(initial.design.returnTemperatureC), out: initial.design.outdoorC === null ? "" : String(initial.design.outdoorC) });
  const [state, setState] = useState<{ error: string; issues: Issue[] } | null>(null);
  const [busy, setBusy] = useState(false);
  const issue = (path: string) => state?.issues.find((i) => i.path === path)?.message;
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setBusy(true);
    const num = (s: string) => (s.trim() === "" ? Number.NaN : Number(s));
    const r = await onSubmit({ ...v, design: { ...v.design, flowTemperatureC: num(temps.flow), returnTemperatureC: num(temps.ret), outdoorC: temps.out.trim() === "" ? null : num(temps.out) } });
    setBusy(false);
    setState(r.ok ? null : { error: r.error, issues: r.issues ?? [] });
  };
  const text = (key: "name" | "client" | "clientEmail" | "site", label: string, hint?: string) => (
    <label className="block text-sm">
      <span className="font-medium">{label}</span>{hint && <span className="ml-1 text-xs text-ink-faint">{hint}</span>}
      <input className={`${input} mt-1`} value={v[key]} onChange={(e) => setV({ ...v, [key]: e.target.value })} aria-invalid={issue(key) ? true : undefined}
        maxLength={key === "site" ? 240 : key === "clientEmail" ? 254 : 160} required={key === "name"} type={key === "clientEmail" ? "email" : "text"}
        data-testid={`project-${key}`} />
      {issue(key) && <span className="text-xs text-fault">{issue(key)}</span>}
    </label>
  );
  const temp = (key: "flow" | "ret" | "out", path: string, label: string) => (
    <label className="block text-sm">
      <span className="font-medium">{label}</span>
      <span className="mt-1 flex items-center gap-1">
        <input className={`${input} num`} inputMode="decimal" value={temps[key]} onChange={(e) => setTemps({ ...temps, [key]: e.target.value })}
          aria-invalid={issue(path) ? true : undefined} />
        <span className="text-xs text-ink-faint">°C</span>
      </span>
      {issue(path) && <span className="text-xs text-fault">{issue(path)}</span>}
    </label>
  );
  return (
    <form onSubmit={submit} className="space-y-3 rounded-lg border border-ink/10 bg-white p-4 shadow-sm" aria-label={submitLabel} data-testid="project-form">
      <div className="grid gap-3 sm:grid-cols-2">
        {text("name", "Project name")}
        {text("site", "Site", "(address or description)")}
        {text("client", "Client")}
        {text("clientEmail", "Handover e-mail", "(the report is sent to this address)")}
      </div>
      <fieldset>
        <legend className="text-sm font-semibold">Design defaults <span className="text-xs font-normal text-ink-faint">— new schematics start from these</span></legend>
        <div className="mt-2 grid gap-3 sm:grid-cols-4">
          {temp("flow", "design.flowTemperatureC", "Flow temperature")}
          {temp("ret", "design.returnTemperatureC", "Return temperature")}
          {temp("out", "design.outdoorC", "Design outdoor temperature")}
          <label className="block text-sm">
            <span className="font-medium">Heat source</span>
            <input className={`${input} mt-1`} value={v.design.heatSource} maxLength={160} placeholder="e.g. 7 kW air-to-water heat pump"
              onChange={(e) => setV({ ...v, design: { ...v.design, heatSource: e.target.value } })} />
          </label>
        </div>
      </fieldset>
      {state && <p role="alert" className="text-sm text-fault">{state.error}</p>}
      <div className="flex gap-2">
        <Button type="submit" disabled={busy}>{busy ? "Saving…" : submitLabel}</Button>
        {onCancel && <Button type="button" variant="secondary" onClick={onCancel}>Cancel</Button>}
      </div>
    </form>
  );
}
