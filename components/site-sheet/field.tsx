"use client";
// Form parts for gloved thumbs in daylight: 16 px text (no zoom on focus), 48 px tall targets, dark ink.
import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

export const inputClass = "mt-1 block h-12 w-full rounded-md border border-ink/30 bg-white px-3 text-base text-ink focus:border-copper-500 focus:outline-2 focus:outline-copper-300";
export const bigButton = (kind: "primary" | "secondary" = "primary") =>
  `inline-flex min-h-12 items-center justify-center gap-2 rounded-md px-4 text-base font-semibold ${kind === "primary"
    ? "bg-copper-600 text-white active:bg-copper-700 disabled:bg-copper-300" : "border border-ink/25 bg-white text-ink active:bg-paper-dark"}`;

export function Field({ label, hint, children }: { label: string; hint?: ReactNode; children: ReactNode }) {
  return (
    <label className="block text-sm font-medium text-ink">
      {label}
      {children}
      {hint ? <span className="mt-0.5 block text-sm font-normal text-ink">{hint}</span> : null}
    </label>
  );
}

export function NumberInput(props: InputHTMLAttributes<HTMLInputElement>) {
  return <input type="number" inputMode="decimal" step="any" className={inputClass} {...props} />;
}

export function TextInput(props: InputHTMLAttributes<HTMLInputElement>) {
  return <input type="text" className={inputClass} {...props} />;
}

export function Select({ children, ...props }: SelectHTMLAttributes<HTMLSelectElement>) {
  return <select className={inputClass} {...props}>{children}</select>;
}

/** "" → undefined, "1,5" → 1.5 (a comma typed as the decimal mark), "x" → NaN (caught by the schema). */
export function num(v: FormDataEntryValue | null): number | undefined {
  const t = String(v ?? "").trim().replace(",", ".");
  return t === "" ? undefined : Number(t);
}

export function Caution({ children, title = "Caution" }: { children: ReactNode; title?: string }) {
  return (
    <div role="note" className="rounded-md border-l-4 border-warn bg-[#fff8e6] px-3 py-2 text-sm text-ink">
      <strong className="font-semibold">{title}: </strong>{children}
    </div>
  );
}

export function Verdict({ ok, children }: { ok: boolean | null; children: ReactNode }) {
  const c = ok === null ? "bg-paper-dark text-ink" : ok ? "bg-ok text-white" : "bg-fault text-white";
  return <span className={`inline-block rounded px-2 py-0.5 text-sm font-bold ${c}`}>{children}</span>;
}
