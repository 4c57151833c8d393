"use client";
import { useState } from "react";
import type { PressureTestRule } from "@/lib/site/pressure-test";
import { saveSiteRulesAction } from "./actions";
import { bigButton, Field, num, NumberInput, TextInput } from "./field";

/** Owners set the firm's pressure-test rule and the basis it cites (a standard and clause, or common practice). */
export function RuleEditor({ projectId, rule, onSaved }: { projectId: string; rule: PressureTestRule; onSaved: () => void }) {
  const [open, setOpen] = useState(false);
  const [msg, setMsg] = useState<string | null>(null);
  if (!open) return <button type="button" onClick={() => setOpen(true)} className="min-h-11 text-sm font-semibold text-copper-700 underline">Change the firm&apos;s rule</button>;
  return (
    <form className="space-y-2 rounded-md border border-ink/15 bg-white p-3" onSubmit={async (e) => {
      e.preventDefault();
      const fd = new FormData(e.currentTarget);
      const r = await saveSiteRulesAction({ projectId, pressureTest: { maxDropBar: num(fd.get("maxDropBar")), holdMinutes: num(fd.get("holdMinutes")), basis: String(fd.get("basis") ?? "") } });
      setMsg(r.ok ? "Saved: tests logged from now on are judged by it." : r.error);
      if (r.ok) { setOpen(false); onSaved(); }
    }}>
      <div className="grid grid-cols-2 gap-3">
        <Field label="Allowed drop, bar"><NumberInput name="maxDropBar" defaultValue={rule.maxDropBar} required /></Field>
        <Field label="Hold time, min"><NumberInput name="holdMinutes" defaultValue={rule.holdMinutes} required /></Field>
      </div>
      <Field label="Basis (standard and clause, or common practice)"><TextInput name="basis" defaultValue={rule.basis} required /></Field>
      {msg && <p className="text-sm font-semibold" role="status">{msg}</p>}
      <button type="submit" className={bigButton()}>Save rule</button>
    </form>
  );
}
