"use client";
/**
 * Details of one pipe: material, a size from that material's catalogue rows
 * only, the typed length, fitting counts and optional overrides. Values are
 * validated with the pipe schema before the update-pipe command.
 */
import { pipeSchema, portRefLabel, type Pipe, type PipeMaterial } from "@/lib/schematic";
import { pipeCatalogue, pipeMaterials } from "@/lib/hydraulics/pipes/catalogue";
import { useBoard } from "../store";
import { NumberField } from "./number-field";
import { issueMessage } from "./schema-fields";

const materialLabel: Record<PipeMaterial, string> = { copper: "Copper (EN 1057)", steel: "Steel (EN 10255)", pex: "PE-X", multilayer: "Multilayer" };
const fittingLabel = { elbow: "Elbows", bend: "Bends", teeRun: "Tees, run", teeBranch: "Tees, branch", reducer: "Reducers" } as const;

/** On a material change keep the nearest bore, so a 22 mm copper pipe becomes DN20, not DN15. */
export function nearestSize(material: PipeMaterial, innerMm: number | undefined): string {
  const rows = pipeCatalogue[material];
  if (innerMm === undefined) return rows[0]!.size;
  return rows.reduce((best, r) => (Math.abs(r.innerDiameterMm - innerMm) < Math.abs(best.innerDiameterMm - innerMm) ? r : best)).size;
}

export function PipeForm({ pipe }: { pipe: Pipe }) {
  const dispatch = useBoard((s) => s.dispatch);
  const readOnly = useBoard((s) => s.readOnly);
  const doc = useBoard((s) => s.doc);
  const update = (patch: Partial<Pipe>, unit = ""): string | null => {
    const r = pipeSchema.safeParse({ ...pipe, ...patch });
    if (!r.success) return issueMessage(r.error.issues[0]!, unit);
    const out = dispatch("update-pipe", { id: pipe.id, patch });
    return out.ok ? null : out.reason;
  };
  const sizes = pipeCatalogue[pipe.material];
  const current = sizes.find((s) => s.size === pipe.size);
  const select = "mt-0.5 block w-full rounded border border-ink/15 bg-white px-2 py-1 text-sm text-ink";

  return (
    <div data-testid="pipe-form">
      <p className="text-xs uppercase tracking-wide text-ink-faint">Pipe</p>
      <p className="num text-lg font-semibold text-ink">{pipe.id}</p>
      <p className="text-xs text-ink-soft">{portRefLabel(doc, pipe.from)} → {portRefLabel(doc, pipe.to)}</p>
      <label className="block py-1 text-xs text-ink-soft">Material
        <select name="material" className={select} disabled={readOnly} value={pipe.material}
          onChange={(e) => {
            const material = e.target.value as PipeMaterial;
            update({ material, size: nearestSize(material, current?.innerDiameterMm) });
          }}>
          {pipeMaterials.map((m) => <option key={m} value={m}>{materialLabel[m]}</option>)}
        </select>
      </label>
      <label className="block py-1 text-xs text-ink-soft">Size
        <select name="size" className={select} disabled={readOnly} value={pipe.size} onChange={(e) => update({ size: e.target.value })}>
          {!current && <option value={pipe.size}>{pipe.size} (not in catalogue)</option>}
          {sizes.map((s) => <option key={s.size} value={s.size}>{s.size} — bore {s.innerDiameterMm} mm</option>)}
        </select>
      </label>
      <NumberField name="lengthM" label="Length" unit="m" value={pipe.lengthM} readOnly={readOnly}
        commit={(v) => (v === null || !(v > 0) ? "A pipe's length must be more than 0 m." : update({ lengthM: v }, "m"))} />
      <fieldset className="mt-2 grid grid-cols-2 gap-x-2">
        <legend className="text-xs font-medium text-ink-soft">Fittings</legend>
        {(Object.keys(fittingLabel) as (keyof typeof fittingLabel)[]).map((k) => (
          <NumberField key={k} name={k} label={fittingLabel[k]} value={pipe.fittings[k]} readOnly={readOnly}
            commit={(v) => (v !== null && !Number.isInteger(v) ? "Must be a whole number." : update({ fittings: { ...pipe.fittings, [k]: v ?? 0 } }))} />
        ))}
      </fieldset>
      <NumberField name="innerDiameterMm" label="Inner diameter override" unit="mm" help={current ? `catalogue: ${current.innerDiameterMm} mm` : undefined}
        value={pipe.innerDiameterMm ?? null} nullable emptyText="Empty: the catalogue bore of the size chosen." readOnly={readOnly} commit={(v) => update({ innerDiameterMm: v ?? undefined }, "mm")} />
    </div>
  );
}
