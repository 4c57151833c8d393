"use client";
import { useEffect, useId, useState } from "react";

/** A short text committed on blur/Enter (labels). */
export function TextField({ label, value, readOnly, maxLength, commit }: { label: string; value: string; readOnly?: boolean; maxLength: number; commit(v: string): string | null }) {
  const id = useId();
  const [draft, setDraft] = useState(value);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => setDraft(value), [value]);
  const save = () => draft.trim() !== value && setError(commit(draft.trim()));
  if (readOnly) return value ? <p className="py-1 text-sm text-ink-soft">{value}</p> : null;
  return (
    <div className="py-1">
      <label htmlFor={id} className="block text-xs text-ink-soft">{label}</label>
      <input id={id} value={draft} maxLength={maxLength} onChange={(e) => setDraft(e.target.value)} onBlur={save}
        onKeyDown={(e) => e.key === "Enter" && save()}
        className="mt-0.5 w-full rounded border border-ink/15 bg-white px-2 py-1 text-sm outline-none focus:border-copper-500" />
      {error && <p className="text-xs text-fault" role="alert">{error}</p>}
    </div>
  );
}
