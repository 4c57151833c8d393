"use client";
/**
 * A typed number that commits on blur or Enter, after validation; Escape
 * reverts. A nullable field gets a "let the engine choose" box: ticked means
 * null, unticked waits for a valid number — no made-up value is stored.
 */
import { useEffect, useId, useState } from "react";
import { parseNumber } from "./schema-fields";

export interface NumberFieldProps {
  label: string;
  unit?: string;
  help?: string;
  value: number | null | undefined;
  nullable?: boolean;
  nullLabel?: string;
  readOnly?: boolean;
  /** Validate and store; return an error message to show instead. */
  commit(value: number | null): string | null;
  name?: string;
}

const show = (v: number | null | undefined) => (v === null || v === undefined ? "" : String(v));

export function NumberField({ label, unit, help, value, nullable, nullLabel, readOnly, commit, name }: NumberFieldProps) {
  const id = useId();
  const [draft, setDraft] = useState(show(value));
  const [error, setError] = useState<string | null>(null);
  const [engine, setEngine] = useState(nullable && value === null);
  useEffect(() => {
    setDraft(show(value));
    setEngine(nullable === true && value === null);
    setError(null);
  }, [value, nullable]);

  const save = () => {
    if (draft === show(value)) return setError(null);
    const n = parseNumber(draft);
    if (n === null) return setError(draft.trim() === "" && nullable ? "Type a value, or let the engine choose." : "Enter a number.");
    setError(commit(n));
  };
  const toggle = (checked: boolean) => {
    setEngine(checked);
    if (checked) setError(commit(null));
  };

  if (readOnly) {
    return (
      <div className="flex justify-between gap-2 py-1 text-sm">
        <span className="text-ink-soft">{label}</span>
        <span className="num">{value === null || value === undefined ? nullLabel ?? "engine" : `${value}${unit ? ` ${unit}` : ""}`}</span>
      </div>
    );
  }
  return (
    <div className="py-1">
      <label htmlFor={id} className="block text-xs text-ink-soft">{label}</label>
      {nullable && (
        <label className="mt-0.5 flex items-center gap-1.5 text-xs text-ink-soft">
          <input type="checkbox" checked={engine} onChange={(e) => toggle(e.target.checked)} className="accent-copper-500" />
          let the engine choose{nullLabel ? ` (${nullLabel})` : ""}
        </label>
      )}
      {!engine && (
        <div className="mt-0.5 flex items-center gap-1">
          <input id={id} name={name} inputMode="decimal" value={draft} aria-invalid={error ? true : undefined} aria-describedby={`${id}-msg`}
            onChange={(e) => setDraft(e.target.value)} onBlur={save}
            onKeyDown={(e) => {
              if (e.key === "Enter") save();
              if (e.key === "Escape") (setDraft(show(value)), setError(null));
            }}
            className={`num w-full rounded border bg-white px-2 py-1 text-sm outline-none focus:border-copper-500 ${error ? "border-fault" : "border-ink/15"}`} />
          {unit && <span className="w-14 shrink-0 text-xs text-ink-faint">{unit}</span>}
        </div>
      )}
      <p id={`${id}-msg`} className={`text-xs ${error ? "text-fault" : "text-ink-faint"}`} role={error ? "alert" : undefined}>{error ?? help}</p>
    </div>
  );
}
