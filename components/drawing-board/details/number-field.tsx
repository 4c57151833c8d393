"use client";
/**
 * A typed number that commits on blur or Enter, after validation; Escape
 * reverts. Numbers are read as the user's locale writes them ("1,500" is
 * 1500 in en-GB; what reads two ways is refused with how to write it). A
 * nullable field may be left empty: `emptyText` says what the engine then
 * does ("typical value assumed …", "not counted …", "computed by sizing").
 */
import { useEffect, useId, useState } from "react";
import { readNumber } from "@/lib/units/read-number";
import { typingLocale } from "./schema-fields";

export interface NumberFieldProps {
  label: string;
  unit?: string;
  help?: string;
  value: number | null | undefined;
  nullable?: boolean;
  /** What an empty value means, shown under a nullable field (and as its placeholder). */
  emptyText?: string;
  readOnly?: boolean;
  /** Validate and store; return an error message to show instead. */
  commit(value: number | null): string | null;
  name?: string;
  id?: string;
}

const show = (v: number | null | undefined) => (v === null || v === undefined ? "" : String(v));

export function NumberField({ label, unit, help, value, nullable, emptyText, readOnly, commit, name, id: givenId }: NumberFieldProps) {
  const ownId = useId();
  const id = givenId ?? ownId;
  const [draft, setDraft] = useState(show(value));
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setDraft(show(value));
    setError(null);
  }, [value]);

  const save = () => {
    if (draft === show(value)) return setError(null);
    if (draft.trim() === "" && nullable) return setError(commit(null));
    const r = readNumber(draft, typingLocale());
    if (!r.ok) return setError(r.message);
    setError(commit(r.value));
  };

  if (readOnly) {
    return (
      <div className="flex justify-between gap-2 py-1 text-sm">
        <span className="text-ink-soft">{label}</span>
        <span className="num text-right">{value === null || value === undefined ? (emptyText ? "empty" : "—") : `${value}${unit ? ` ${unit}` : ""}`}</span>
      </div>
    );
  }
  const hint = nullable && draft.trim() === "" && emptyText ? emptyText : help;
  return (
    <div className="py-1">
      <label htmlFor={id} className="block text-xs text-ink-soft">{label}</label>
      <div className="mt-0.5 flex items-center gap-1">
        <input id={id} name={name} inputMode="decimal" value={draft} aria-invalid={error ? true : undefined} aria-describedby={`${id}-msg`}
          placeholder={nullable ? "empty" : undefined}
          onChange={(e) => setDraft(e.target.value)} onBlur={save}
          onKeyDown={(e) => {
            if (e.key === "Enter") save();
            if (e.key === "Escape") (setDraft(show(value)), setError(null));
          }}
          className={`num w-full rounded border bg-white px-2 py-1 text-sm outline-none focus:border-copper-500 ${error ? "border-fault" : "border-ink/15"}`} />
        {unit && <span className="w-12 shrink-0 text-xs text-ink-faint">{unit}</span>}
      </div>
      <p id={`${id}-msg`} className={`text-xs ${error ? "text-fault" : "text-ink-faint"}`} role={error ? "alert" : undefined}>{error ?? hint}</p>
    </div>
  );
}
