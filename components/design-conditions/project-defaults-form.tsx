"use client";
/**
 * The project's design conditions: the fluid and design values every new
 * schematic of the project starts with. Each change is checked like the
 * board's panel, then saved at once (PUT semantics through a server action);
 * schematics already drawn keep their own.
 */
import { useState, useTransition } from "react";
import type { ProjectDefaults } from "@/lib/schematic/project-defaults";
import { saveProjectDefaultsAction } from "./actions";
import { DesignForm, type DesignValue } from "./design-form";

export function ProjectDefaultsForm({ projectId, initial, canEdit }: { projectId: string; initial: ProjectDefaults; canEdit: boolean }) {
  const [value, setValue] = useState<DesignValue>(initial);
  const [status, setStatus] = useState<string | null>(null);
  const [, start] = useTransition();
  const commit = (next: DesignValue): string | null => {
    const before = value;
    setValue(next);
    setStatus("Saving…");
    start(async () => {
      const r = await saveProjectDefaultsAction({ projectId, defaults: next });
      if (r.ok) setStatus("Saved — new schematics start with these.");
      else {
        setValue(before);
        setStatus(r.error);
      }
    });
    return null;
  };
  return (
    <section className="mt-8 rounded-md border border-ink/10 bg-white p-4" aria-labelledby="defaults-h" data-testid="project-defaults">
      <h2 id="defaults-h" className="text-lg font-semibold">Design conditions for new schematics</h2>
      <p className="mt-1 text-sm text-ink-soft">A new schematic of this project starts with these; each schematic then keeps its own, set in its Design conditions panel.</p>
      {status && <p role="status" className="mt-2 text-xs text-ink-soft">{status}</p>}
      <details className="mt-3">
        <summary className="cursor-pointer text-sm text-copper-700">Show the conditions</summary>
        <div className="mt-3 grid gap-x-6 sm:grid-cols-2">
          <DesignForm value={value} readOnly={!canEdit} commit={commit} idPrefix="project-design" />
        </div>
      </details>
    </section>
  );
}
