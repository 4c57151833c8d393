"use client";
/**
 * The Design conditions panel: the schematic's fluid and design conditions,
 * shown in the details column when nothing is selected (or when a finding's
 * link or the top bar asks for it). Each change is one undoable
 * update-design command; autosave follows the store's revision, and the
 * results turn stale until the next Size it.
 */
import { DesignForm, type DesignValue } from "@/components/design-conditions/design-form";
import { useBoard } from "../store";

export function DesignPanel() {
  const design = useBoard((s) => s.doc.design);
  const fluid = useBoard((s) => s.doc.fluid);
  const readOnly = useBoard((s) => s.readOnly);
  const focus = useBoard((s) => s.designFocus);
  const dispatch = useBoard((s) => s.dispatch);
  const commit = (next: DesignValue) => {
    const out = dispatch("update-design", { design: next.design, fluid: next.fluid });
    return out.ok ? null : out.reason;
  };
  return (
    <section aria-label="Design conditions" data-testid="design-panel">
      <h3 className="text-sm font-semibold text-ink">Design conditions</h3>
      <p className="pb-2 text-xs text-ink-faint">Every result is sized for these. Changes are saved and undoable; size it again to see their effect.</p>
      <DesignForm value={{ design, fluid }} readOnly={readOnly} commit={commit} focus={focus} />
    </section>
  );
}
