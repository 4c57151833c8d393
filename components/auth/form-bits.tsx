"use client";

import { useState } from "react";
import { useFormStatus } from "react-dom";
import { buttonClass } from "@/components/ui/button";

// Small form pieces shared by the sign-in, sign-up, reset, invitation, account and team
// forms. Errors come back from server actions as ActionResult {error, issues[]}.

import type { ActionResult } from "@/lib/auth/authorize";

export type FormResult = ActionResult<string> | null;

export function fieldError(state: FormResult, name: string): string | undefined {
  return state && !state.ok ? state.issues?.find((i) => i.path === name)?.message : undefined;
}

export function Field({ label, name, state, hint, defaultValue, ...input }: React.InputHTMLAttributes<HTMLInputElement> & { label: string; name: string; state: FormResult; hint?: string }) {
  const err = fieldError(state, name);
  const id = `f-${name}`;
  // React resets a form after its action runs; keep what was typed (except passwords)
  // so a failed attempt does not wipe the e-mail address.
  const [value, setValue] = useState(String(defaultValue ?? ""));
  const keep = input.type !== "password" ? { value, onChange: (e: React.ChangeEvent<HTMLInputElement>) => setValue(e.target.value) } : { defaultValue };
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-medium text-ink">{label}</label>
      <input
        id={id} name={name} aria-invalid={err ? true : undefined} aria-describedby={err ? `${id}-err` : hint ? `${id}-hint` : undefined}
        className={`mt-1 block w-full rounded-md border bg-white px-3 py-2 text-sm shadow-sm outline-none transition focus:border-copper-500 focus:ring-2 focus:ring-copper-100 ${err ? "border-fault" : "border-ink/15"}`}
        {...input}
        {...keep}
      />
      {err ? <p id={`${id}-err`} className="mt-1 text-xs text-fault">{err}</p>
        : hint ? <p id={`${id}-hint`} className="mt-1 text-xs text-ink-faint">{hint}</p> : null}
    </div>
  );
}

export function FormAlert({ state }: { state: FormResult }) {
  if (!state) return null;
  if (state.ok) return <p role="status" className="rounded-md border border-ok/30 bg-ok/5 px-3 py-2 text-sm text-ok">{state.data}</p>;
  // a single field issue is shown beside its field; the banner covers the rest
  if (state.issues && state.issues.length > 0) return <p role="alert" className="rounded-md border border-fault/30 bg-fault/5 px-3 py-2 text-sm text-fault">Please correct the highlighted field{state.issues.length > 1 ? "s" : ""}.</p>;
  return <p role="alert" className="rounded-md border border-fault/30 bg-fault/5 px-3 py-2 text-sm text-fault">{state.error}</p>;
}

export function SubmitButton({ children, pending: pendingLabel, variant = "primary", className = "w-full" }: { children: React.ReactNode; pending?: string; variant?: "primary" | "secondary" | "danger"; className?: string }) {
  const { pending } = useFormStatus();
  return (
    <button type="submit" disabled={pending} className={buttonClass(variant, className)}>
      {pending ? (pendingLabel ?? "Working…") : children}
    </button>
  );
}
