"use client";

import { designFields } from "@/components/design-conditions/design-fields";
import { useBoard } from "../store";

const names: Record<string, string> = {
  ...Object.fromEntries(designFields.map((f) => [`design.${f.key}`, f.label.toLowerCase()])),
  "fluid.kind": "heating fluid",
  "fluid.percentByVolume": "glycol share",
};

/** Under a finding about design conditions: one link per field, opening the Design conditions panel at it. */
export function DesignFieldLinks({ fields }: { fields?: string[] }) {
  const showDesign = useBoard((s) => s.showDesign);
  if (!fields || fields.length === 0) return null;
  return (
    <span className="ml-2 inline-flex flex-wrap gap-x-2 text-xs">
      {fields.map((f) => (
        <button key={f} type="button" className="text-copper-700 underline decoration-dotted underline-offset-2 hover:text-copper-600"
          onClick={(e) => { e.stopPropagation(); showDesign(f); }}>
          Set {names[f] ?? f} in Design conditions
        </button>
      ))}
    </span>
  );
}
