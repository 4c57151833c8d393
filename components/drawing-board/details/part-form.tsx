"use client";
/**
 * Details of one part: a form generated from its type's zod props schema.
 * Each field validates against that schema before it commits, and commits as
 * one update-part-props command (one undo step per field).
 */
import { partPropsSchemas, partRegistry, type Part } from "@/lib/schematic";
import { useBoard } from "../store";
import { NumberField } from "./number-field";
import { fieldsOf, issueMessage, type FieldInfo } from "./schema-fields";
import { emptyText } from "./empty-text";
import { TextField } from "./text-field";
import dynamic from "next/dynamic";

// The curve editor brings the charting library: load it when a pump is selected, not with the board.
const PumpCurveEditor = dynamic(() => import("./pump-curve-editor").then((m) => m.PumpCurveEditor), {
  ssr: false,
  loading: () => <p className="text-xs text-ink-faint">Loading the curve…</p>,
});

const STARTING_CURVE: [number, number][] = [[0, 60], [1.5, 45], [3, 0]];

export function PartForm({ part }: { part: Part }) {
  const dispatch = useBoard((s) => s.dispatch);
  const readOnly = useBoard((s) => s.readOnly);
  const schema = partPropsSchemas[part.type];
  const props = part.props as Record<string, unknown>;

  const commit = (f: FieldInfo, value: unknown): string | null => {
    const r = schema.safeParse({ ...props, [f.name]: value });
    if (!r.success) {
      const issue = r.error.issues.find((i) => i.path[0] === f.name) ?? r.error.issues[0]!;
      return issueMessage(issue, f.unit);
    }
    const out = dispatch("update-part-props", { id: part.id, props: { [f.name]: value } });
    return out.ok ? null : out.reason;
  };

  return (
    <div data-testid="part-form">
      <p className="text-xs uppercase tracking-wide text-ink-faint">{partRegistry[part.type].label}</p>
      <p className="num text-lg font-semibold text-ink">{part.id}</p>
      <TextField label="Label" value={part.label ?? ""} readOnly={readOnly} maxLength={200}
        commit={(label) => {
          const out = dispatch("update-part", { id: part.id, patch: { label: label || undefined } });
          return out.ok ? null : out.reason;
        }} />
      {fieldsOf(schema).map((f) => {
        const value = props[f.name];
        if (f.kind === "number")
          return <NumberField key={f.name} name={f.name} label={f.label} unit={f.unit} help={f.help} value={value as number | null} nullable={f.nullable}
            emptyText={f.nullable ? emptyText(part.type, f.name, f.nullHint) : undefined} readOnly={readOnly} commit={(v) => commit(f, v)} />;
        if (f.kind === "boolean")
          return (
            <label key={f.name} className="flex items-center gap-2 py-1 text-sm">
              <input type="checkbox" name={f.name} checked={value === true} disabled={readOnly} onChange={(e) => commit(f, e.target.checked)} className="accent-copper-500" />
              {f.label}
            </label>
          );
        if (f.kind === "enum")
          return (
            <label key={f.name} className="block py-1 text-xs text-ink-soft">
              {f.label}
              <select name={f.name} value={String(value)} disabled={readOnly} onChange={(e) => commit(f, e.target.value)} className="mt-0.5 block w-full rounded border border-ink/15 bg-white px-2 py-1 text-sm text-ink">
                {f.options.map((o) => <option key={o} value={o}>{o}</option>)}
              </select>
            </label>
          );
        return (
          <div key={f.name}>
            {f.nullable && !readOnly && (
              <label className="flex items-center gap-2 pt-2 text-sm">
                <input type="checkbox" checked={value !== null} onChange={(e) => commit(f, e.target.checked ? STARTING_CURVE : null)} className="accent-copper-500" />
                {f.label.replace(/^built-in /i, "Built-in ")}
              </label>
            )}
            {value !== null && <PumpCurveEditor label={f.nullable ? "Points (a starting curve — type the maker's)" : f.label} value={value as [number, number][]} readOnly={readOnly} commit={(v) => commit(f, v)} />}
          </div>
        );
      })}
      {!readOnly && (
        <div className="mt-3 flex gap-2 text-xs">
          <button type="button" className="rounded border border-ink/15 px-2 py-1 hover:bg-paper-dark" onClick={() => dispatch("rotate-selection")}>Turn 90° (R)</button>
          <button type="button" className="rounded border border-ink/15 px-2 py-1 hover:bg-paper-dark" onClick={() => dispatch("flip-selection")}>Mirror (X)</button>
        </div>
      )}
    </div>
  );
}
