"use client";
import { useState } from "react";
import { commissioningData, type Reading } from "@/lib/site/events";
import { checkReading, TOLERANCES } from "@/lib/site/commissioning";
import type { SiteSheet } from "@/lib/site/site-view";
import { bigButton, Caution, Field, num, NumberInput, Select, TextInput } from "./field";
import { ChecksTable } from "./records-list";

const f = (n: number | null, d: number, unit: string) => (n === null ? "—" : `${n.toFixed(d)} ${unit}`);

/** The commissioning record: each reading beside its design value; only what is filled in is recorded. */
export function CommissioningForm({ sheet, onSave }: { sheet: SiteSheet; onSave: (data: unknown) => Promise<void> }) {
  const [errors, setErrors] = useState<string[]>([]);
  const [preview, setPreview] = useState<Reading[]>([]);
  const d = sheet.design;

  const readings = (form: HTMLFormElement): unknown[] => {
    const fd = new FormData(form);
    const out: unknown[] = [];
    const v = (k: string) => num(fd.get(k));
    if (v("flow") !== undefined) out.push({ kind: "heat-source-flow", value: v("flow"), unit: fd.get("flowUnit") });
    if (v("flowT") !== undefined) out.push({ kind: "flow-temperature", value: v("flowT"), unit: "°C" });
    if (v("returnT") !== undefined) out.push({ kind: "return-temperature", value: v("returnT"), unit: "°C" });
    if (d.bypass && v("bypass") !== undefined) out.push({ kind: "bypass-opening", value: v("bypass"), unit: "kPa", target: d.bypass.id });
    for (const p of d.pumps) {
      if (v(`head-${p.id}`) !== undefined) out.push({ kind: "pump-head", value: v(`head-${p.id}`), unit: fd.get(`headUnit-${p.id}`), target: p.id,
        setting: String(fd.get(`setting-${p.id}`) ?? "").trim() || undefined });
    }
    if (v("precharge") !== undefined) out.push({ kind: "vessel-precharge", value: v("precharge"), unit: "bar" });
    if (fd.get("svTested")) out.push({ kind: "safety-valve-test", value: fd.get("svTested") === "yes" });
    return out;
  };
  const parse = (form: HTMLFormElement) => commissioningData.safeParse({ readings: readings(form), notes: String(new FormData(form).get("notes") ?? "").trim() || undefined });

  return (
    <form className="space-y-3 px-3 py-3" data-testid="commissioning-form"
      onChange={(e) => { const r = parse(e.currentTarget); setPreview(r.success ? r.data.readings : []); }}
      onSubmit={async (e) => {
        e.preventDefault();
        const form = e.currentTarget;
        const r = parse(form);
        if (!r.success) { setErrors(r.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`)); return; }
        setErrors([]);
        await onSave(r.data);
        form.reset();
        setPreview([]);
      }}>
      <h2 className="text-lg font-bold">Commissioning readings</h2>
      <Caution>Hot water and moving parts: readings are taken with the system running; keep clear of hot pipework and isolate before opening anything.</Caution>
      <p className="text-sm text-ink-soft">Flagged past: flow ±{TOLERANCES.flowPercent} %, temperatures ±{TOLERANCES.temperatureK} K, bypass and pump head ±{TOLERANCES.headPercent} %, pre-charge ±{TOLERANCES.prechargeBar} bar (common practice for site readings).</p>
      <div className="grid grid-cols-[1fr_7rem] gap-3">
        <Field label="Flow at the heat meter" hint={`Design ${f(d.heatSourceFlowM3h, 2, "m³/h")}`}><NumberInput name="flow" /></Field>
        <Field label="Unit"><Select name="flowUnit" defaultValue="m3/h"><option value="m3/h">m³/h</option><option value="l/s">l/s</option><option value="l/min">l/min</option></Select></Field>
      </div>
      <div className="grid grid-cols-2 gap-3">
        <Field label="Flow temperature, °C" hint={`Design ${d.flowTemperatureC} °C`}><NumberInput name="flowT" /></Field>
        <Field label="Return temperature, °C" hint={`Design ${d.returnTemperatureC} °C`}><NumberInput name="returnT" /></Field>
      </div>
      {d.bypass && <Field label="Bypass opening as set, kPa" hint={`Design ${f(d.bypass.openingKpa, 1, "kPa")}`}><NumberInput name="bypass" /></Field>}
      {d.pumps.map((p) => (
        <fieldset key={p.id} className="rounded-md border border-ink/15 p-2">
          <legend className="px-1 text-sm font-semibold">{p.label}</legend>
          <div className="grid grid-cols-[1fr_6rem] gap-3">
            <Field label="Head as set" hint={`Design ${f(p.headKpa, 1, "kPa")}`}><NumberInput name={`head-${p.id}`} /></Field>
            <Field label="Unit"><Select name={`headUnit-${p.id}`} defaultValue="kPa"><option value="kPa">kPa</option><option value="m">m head</option><option value="bar">bar</option></Select></Field>
          </div>
          <Field label="Pump setting (as marked on the pump)"><TextInput name={`setting-${p.id}`} placeholder="e.g. speed III, constant pressure" /></Field>
        </fieldset>
      ))}
      <div className="grid grid-cols-2 gap-3">
        <Field label="Vessel pre-charge, bar" hint={`Design ${f(d.vesselPrechargeBar, 2, "bar")}`}><NumberInput name="precharge" /></Field>
        <Field label={`Safety valve (${d.safetyValveBar} bar) tested`}><Select name="svTested" defaultValue=""><option value="">not tested</option><option value="yes">lifted and reseated</option><option value="no">failed</option></Select></Field>
      </div>
      <Field label="Notes (optional)"><TextInput name="notes" /></Field>
      {preview.length > 0 && <div data-testid="commissioning-preview"><ChecksTable checks={preview.map((r) => checkReading(r, d))} /></div>}
      {errors.length > 0 && <ul className="text-sm font-semibold text-fault" role="alert">{errors.map((e) => <li key={e}>{e}</li>)}</ul>}
      <button type="submit" className={`${bigButton()} w-full`}>Save commissioning record</button>
    </form>
  );
}
