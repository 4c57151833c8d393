"use client";
import { useState } from "react";
import { pressureTestData } from "@/lib/site/events";
import { evaluatePressureTest, isolateBeforeTest } from "@/lib/site/pressure-test";
import type { SiteSheet } from "@/lib/site/site-view";
import { bigButton, Caution, Field, inputClass, num, NumberInput, Select, TextInput, Verdict } from "./field";

const localNow = (minutesAgo = 0) => {
  const d = new Date(Date.now() - minutesAgo * 60_000);
  return new Date(d.getTime() - d.getTimezoneOffset() * 60_000).toISOString().slice(0, 16);
};
const toIso = (local: FormDataEntryValue | null) => (local ? new Date(String(local)).toISOString() : "");

/** The pressure test log: the fields a test sheet asks for, the verdict against the firm's rule, and the caution first. */
export function PressureTestForm({ sheet, corrects, onSave }: { sheet: SiteSheet; corrects: string | null; onSave: (data: unknown) => Promise<void> }) {
  const [testBar, setTestBar] = useState<number | null>(null);
  const [errors, setErrors] = useState<string[]>([]);
  const [preview, setPreview] = useState<ReturnType<typeof evaluatePressureTest> | null>(null);
  const rule = sheet.rules.pressureTest;
  const isolate = isolateBeforeTest(sheet.testParts, testBar);

  const read = (form: HTMLFormElement) => {
    const fd = new FormData(form);
    return pressureTestData.safeParse({
      medium: fd.get("medium"), testPressureBar: num(fd.get("testPressureBar")), startPressureBar: num(fd.get("startPressureBar")),
      endPressureBar: num(fd.get("endPressureBar")), startedAt: toIso(fd.get("startedAt")), endedAt: toIso(fd.get("endedAt")),
      ambientStartC: num(fd.get("ambientStartC")), ambientEndC: num(fd.get("ambientEndC")), witness: fd.get("witness"),
      notes: String(fd.get("notes") ?? "") || undefined, corrects: corrects ?? undefined,
    });
  };

  return (
    <form className="space-y-3 px-3 py-3" data-testid="pressure-test-form"
      onChange={(e) => { const r = read(e.currentTarget); setPreview(r.success ? evaluatePressureTest(r.data, rule) : null); }}
      onSubmit={async (e) => {
        e.preventDefault();
        const form = e.currentTarget;
        const r = read(form);
        if (!r.success) { setErrors(r.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`)); return; }
        setErrors([]);
        await onSave(r.data);
        form.reset();
        setPreview(null);
      }}>
      <h2 className="text-lg font-bold">Pressure test{corrects ? " (correction)" : ""}</h2>
      <Caution title="Before you pressurise">{sheet.cautions.pressureTest}</Caution>
      {isolate.length > 0 && (
        <ul className="list-disc space-y-1 pl-6 text-sm" data-testid="isolate-list">{isolate.map((t) => <li key={t}>{t}</li>)}</ul>
      )}
      <p className="text-sm">Your firm&apos;s rule: at most <strong className="num">{rule.maxDropBar} bar</strong> drop over <strong className="num">{rule.holdMinutes} min</strong>. Basis: {rule.basis}.</p>
      <Field label="Medium"><Select name="medium" defaultValue="water"><option value="water">Water</option><option value="air">Air</option><option value="inert-gas">Inert gas</option></Select></Field>
      <Field label="Test pressure, bar"><NumberInput name="testPressureBar" required onChange={(e) => setTestBar(num(e.target.value) ?? null)} /></Field>
      <Field label="Started"><input type="datetime-local" name="startedAt" required defaultValue={localNow(60)} className={inputClass} /></Field>
      <Field label="Ended"><input type="datetime-local" name="endedAt" required defaultValue={localNow()} className={inputClass} /></Field>
      <div className="grid grid-cols-2 gap-3">
        <Field label="Start reading, bar"><NumberInput name="startPressureBar" required /></Field>
        <Field label="End reading, bar"><NumberInput name="endPressureBar" required /></Field>
        <Field label="Ambient at start, °C"><NumberInput name="ambientStartC" required /></Field>
        <Field label="Ambient at end, °C"><NumberInput name="ambientEndC" required /></Field>
      </div>
      <Field label="Witnessed by"><TextInput name="witness" required autoComplete="name" /></Field>
      <Field label="Notes (optional)"><TextInput name="notes" /></Field>
      {preview && (
        <div className="rounded-md border border-ink/20 bg-white p-2 text-sm" data-testid="pressure-preview">
          <Verdict ok={preview.pass}>{preview.pass ? "PASS" : "FAIL"}</Verdict>{" "}
          drop <span className="num">{preview.dropBar.toFixed(2)} bar</span> over <span className="num">{preview.heldMinutes.toFixed(0)} min</span>
          {preview.reasons.map((r) => <p key={r} className="text-fault">{r}</p>)}
          {preview.notes.map((n) => <p key={n}>{n}</p>)}
        </div>
      )}
      {errors.length > 0 && <ul className="text-sm font-semibold text-fault" role="alert">{errors.map((e) => <li key={e}>{e}</li>)}</ul>}
      <button type="submit" className={`${bigButton()} w-full`}>Log pressure test</button>
    </form>
  );
}
