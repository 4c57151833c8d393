"use client";
import { useState } from "react";
import { fillData } from "@/lib/site/events";
import type { SiteSheet } from "@/lib/site/site-view";
import { bigButton, Caution, Field, num, NumberInput, Select, TextInput } from "./field";

/** Flush, fill, inhibitor and glycol records; concentrations are checked against the design (or the maker's dose). */
export function FillForm({ sheet, onSave }: { sheet: SiteSheet; onSave: (data: unknown) => Promise<void> }) {
  const [stage, setStage] = useState("flush");
  const [errors, setErrors] = useState<string[]>([]);
  const glycol = sheet.design.glycolPercent;
  return (
    <form className="space-y-3 px-3 py-3" data-testid="fill-form" onSubmit={async (e) => {
      e.preventDefault();
      const form = e.currentTarget;
      const fd = new FormData(form);
      const text = (k: string) => String(fd.get(k) ?? "").trim() || undefined;
      const r = fillData.safeParse({ stage, method: text("method"), product: text("product"), measuredPercent: num(fd.get("measuredPercent")),
        dosePercent: num(fd.get("dosePercent")), fillPressureBar: num(fd.get("fillPressureBar")), volumeL: num(fd.get("volumeL")), notes: text("notes") });
      if (!r.success) { setErrors(r.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`)); return; }
      setErrors([]);
      await onSave(r.data);
      form.reset();
    }}>
      <h2 className="text-lg font-bold">Flush, fill, inhibitor, glycol</h2>
      <Caution>Hot water and chemicals: let the system cool before draining; wear eye protection with inhibitor and glycol, and follow the maker&apos;s data sheet.</Caution>
      <Field label="Step"><Select name="stage" value={stage} onChange={(e) => setStage(e.target.value)}>
        <option value="flush">Flush</option><option value="fill">Fill</option><option value="inhibitor">Inhibitor</option><option value="glycol">Glycol</option>
      </Select></Field>
      {stage === "flush" && <Field label="Method"><TextInput name="method" placeholder="e.g. mains flush, three volumes" /></Field>}
      {(stage === "inhibitor" || stage === "glycol") && <Field label="Product"><TextInput name="product" /></Field>}
      {stage === "glycol" && <Field label="Measured concentration, % by volume" hint={glycol === null ? "The design is plain water: any glycol is flagged." : `Design: ${glycol} %`}><NumberInput name="measuredPercent" /></Field>}
      {stage === "inhibitor" && (
        <div className="grid grid-cols-2 gap-3">
          <Field label="Measured, %"><NumberInput name="measuredPercent" /></Field>
          <Field label="Maker's dose, %"><NumberInput name="dosePercent" /></Field>
        </div>
      )}
      {stage === "fill" && (
        <div className="grid grid-cols-2 gap-3">
          <Field label="Cold fill pressure, bar" hint={`Design: ${sheet.design.coldFillPressureBar} bar`}><NumberInput name="fillPressureBar" /></Field>
          <Field label="Volume, L"><NumberInput name="volumeL" /></Field>
        </div>
      )}
      <Field label="Notes (optional)"><TextInput name="notes" /></Field>
      {errors.length > 0 && <ul className="text-sm font-semibold text-fault" role="alert">{errors.map((e) => <li key={e}>{e}</li>)}</ul>}
      <button type="submit" className={`${bigButton()} w-full`}>Save {stage} record</button>
    </form>
  );
}
