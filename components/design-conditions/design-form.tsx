"use client";
/**
 * The design conditions as a form: the fluid and every design field with its
 * unit, limits and one-line meaning. A change is checked with the engine's
 * own rules (lib/hydraulics/design-conditions.ts) before `commit`: what sizing
 * could not use is refused beside the field with the reason, and nothing is
 * stored. Used by the board's Design conditions panel and the project page.
 */
import { useEffect, useState } from "react";
import { NumberField } from "@/components/drawing-board/details/number-field";
import { designConditionIssues, type DesignIssue } from "@/lib/hydraulics/design-conditions";
import { GLYCOL_MAX_PERCENT_BY_VOLUME } from "@/lib/hydraulics/fluids/glycol";
import type { Design, Fluid } from "@/lib/schematic";
import { designGroups, designLimits, limitsText, type DesignFieldInfo } from "./design-fields";

export interface DesignValue {
  design: Design;
  fluid: Fluid;
}

/** New problems a change brings (those it did not have before), the edited field's first. */
export function problemsOf(before: DesignValue, after: DesignValue, path: string): DesignIssue[] {
  const had = new Set(designConditionIssues(before.design, before.fluid).map((i) => `${i.path}|${i.message}`));
  const now = designConditionIssues(after.design, after.fluid).filter((i) => !had.has(`${i.path}|${i.message}`));
  return [...now.filter((i) => i.path === path), ...now.filter((i) => i.path !== path)];
}

const fieldId = (idPrefix: string, path: string) => `${idPrefix}-${path.replace(/\./g, "-")}`;

const fluidLabel: Record<Fluid["kind"], string> = {
  water: "Water",
  "propylene-glycol": "Propylene glycol and water",
  "ethylene-glycol": "Ethylene glycol and water",
};

export function DesignForm({ value, readOnly, commit, idPrefix = "design", focus }: {
  value: DesignValue;
  readOnly: boolean;
  /** Store the change; return an error message to show instead. */
  commit(next: DesignValue): string | null;
  idPrefix?: string;
  /** a field to bring into view and focus ("design.safetyValveBar"), with a counter so a repeat asks again */
  focus?: { field: string | null; n: number } | null;
}) {
  const [fluidError, setFluidError] = useState<string | null>(null);
  useEffect(() => {
    if (!focus?.field) return;
    const el = document.getElementById(fieldId(idPrefix, focus.field));
    el?.scrollIntoView({ block: "center" });
    el?.focus();
  }, [focus, idPrefix]);

  const change = (path: string, next: DesignValue): string | null => {
    const problems = problemsOf(value, next, path);
    if (problems.length > 0) return problems.map((p) => p.message).join(" ");
    return commit(next);
  };
  const setDesign = (f: DesignFieldInfo, v: number | null) => {
    const { nullable } = designLimits(f.key);
    if (v === null && !nullable) return "This field needs a value.";
    return change(`design.${f.key}`, { ...value, design: { ...value.design, [f.key]: v } });
  };
  const glycol = value.fluid.kind !== "water" ? value.fluid.percentByVolume : null;
  const select = "mt-0.5 block w-full rounded border border-ink/15 bg-white px-2 py-1 text-sm text-ink";

  return (
    <div className="space-y-3" data-testid={`${idPrefix}-form`}>
      <fieldset>
        <legend className="text-xs font-semibold text-ink-soft">Fluid</legend>
        <label className="block py-1 text-xs text-ink-soft">
          Heating fluid
          <select id={fieldId(idPrefix, "fluid.kind")} name="fluid" className={select} disabled={readOnly} value={value.fluid.kind}
            onChange={(e) => {
              const kind = e.target.value as Fluid["kind"];
              const fluid: Fluid = kind === "water" ? { kind } : { kind, percentByVolume: glycol ?? 30 };
              setFluidError(change("fluid.kind", { ...value, fluid }));
            }}>
            {(Object.keys(fluidLabel) as Fluid["kind"][]).map((k) => <option key={k} value={k}>{fluidLabel[k]}</option>)}
          </select>
          <span className={fluidError ? "text-fault" : "text-ink-faint"} role={fluidError ? "alert" : undefined}>
            {fluidError ?? "Properties at the mean of flow and return: water by IAPWS-IF97 and IAPWS 2008, glycol mixtures from the ASHRAE tables."}
          </span>
        </label>
        {value.fluid.kind !== "water" && (
          <NumberField id={fieldId(idPrefix, "fluid.percentByVolume")} name="percentByVolume" label="Glycol share" unit="% vol" value={glycol}
            help={`By volume; the glycol tables cover 0–${GLYCOL_MAX_PERCENT_BY_VOLUME} %. Sets the freezing point and the properties.`} readOnly={readOnly}
            commit={(v) => (v === null ? "This field needs a value." : change("fluid.percentByVolume", { ...value, fluid: { kind: value.fluid.kind as "propylene-glycol", percentByVolume: v } }))} />
        )}
      </fieldset>
      {designGroups.map((g) => (
        <fieldset key={g.title}>
          <legend className="text-xs font-semibold text-ink-soft">{g.title}</legend>
          {g.fields.map((f) => {
            const limits = limitsText(f);
            return (
              <NumberField key={f.key} id={fieldId(idPrefix, `design.${f.key}`)} name={f.key} label={f.label} unit={f.unit}
                value={value.design[f.key]} nullable={designLimits(f.key).nullable} emptyText={f.empty} readOnly={readOnly}
                help={`${f.meaning}${limits ? ` (${limits})` : ""}`} commit={(v) => setDesign(f, v)} />
            );
          })}
        </fieldset>
      ))}
    </div>
  );
}
