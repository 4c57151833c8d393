"use client";
import { checkFill, checkReading, type ReadingCheck } from "@/lib/site/commissioning";
import { evaluatePressureTest, type PressureTestVerdict } from "@/lib/site/pressure-test";
import type { SiteSheet } from "@/lib/site/site-view";
import type { PressureTestData } from "@/lib/site/events";
import type { OutboxItem } from "./offline/store";
import { waitingRecords } from "./overlay";
import { Verdict } from "./field";

const when = (iso: string) => new Date(iso).toLocaleString("en-GB", { hour: "2-digit", minute: "2-digit", day: "numeric", month: "short", year: "numeric" });

interface Card { id: string; by: string | null; at: string; state: "sent" | "waiting" | "refused"; error?: string; correctedBy?: string | null; revision?: number }

function Meta({ c }: { c: Card }) {
  return (
    <p className="text-sm text-ink-soft">
      {c.by ?? "someone"} · {when(c.at)}{c.revision ? ` · rev ${c.revision}` : ""}
      {c.state === "waiting" && <strong className="ml-1 text-warn">· waiting to send</strong>}
      {c.state === "refused" && <strong className="ml-1 text-fault">· refused: {c.error}</strong>}
      {c.correctedBy && <strong className="ml-1 text-ink">· corrected by a later record</strong>}
    </p>
  );
}

export function ChecksTable({ checks }: { checks: ReadingCheck[] }) {
  if (!checks.length) return null;
  return (
    <table className="mt-1 w-full text-left text-sm">
      <thead><tr className="text-ink-soft"><th className="py-1 font-medium">Reading</th><th className="font-medium">Measured</th><th className="font-medium">Design</th><th className="font-medium">Deviation</th></tr></thead>
      <tbody>
        {checks.map((c, i) => (
          <tr key={i} className="border-t border-ink/10 align-top" data-check-ok={String(c.ok)}>
            <td className="py-1 pr-1">{c.label}</td>
            <td className="num pr-1">{c.measured}</td>
            <td className="num pr-1">{c.design}</td>
            <td className="num">
              {c.deviation || "—"}{" "}
              {c.ok !== null && <Verdict ok={c.ok}>{c.ok ? "OK" : `past ${c.tolerance}`}</Verdict>}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function PressureCard({ c, d, v, onCorrect }: { c: Card; d: PressureTestData; v: PressureTestVerdict; onCorrect?: () => void }) {
  return (
    <li className={`rounded-md border border-ink/15 bg-white p-3 ${c.correctedBy ? "opacity-60" : ""}`} data-testid="pressure-record" data-state={c.state}>
      <p className="text-base"><Verdict ok={v.pass}>{v.pass ? "PASS" : "FAIL"}</Verdict>{" "}
        <span className="num">{d.testPressureBar} bar</span> {d.medium.replace("-", " ")} · drop <span className="num">{v.dropBar.toFixed(2)} bar</span> over <span className="num">{v.heldMinutes.toFixed(0)} min</span></p>
      <p className="text-sm">Witness: {d.witness} · ambient <span className="num">{d.ambientStartC} → {d.ambientEndC} °C</span></p>
      {v.reasons.map((r) => <p key={r} className="text-sm font-semibold text-fault">{r}</p>)}
      {v.notes.map((n) => <p key={n} className="text-sm">{n}</p>)}
      <p className="text-sm text-ink-soft">Rule: ≤ {v.rule.maxDropBar} bar over {v.rule.holdMinutes} min. Basis: {v.rule.basis}.</p>
      <Meta c={c} />
      {onCorrect && !c.correctedBy && c.state === "sent" && <button type="button" onClick={onCorrect} className="min-h-11 text-sm font-semibold text-copper-700 underline">Correct this record</button>}
    </li>
  );
}

export function PressureRecords({ sheet, items, onCorrect }: { sheet: SiteSheet; items: OutboxItem[]; onCorrect?: (id: string) => void }) {
  const waiting = waitingRecords(items, "pressure-test");
  const sent = [...sheet.records.pressureTests].reverse();
  if (!waiting.length && !sent.length) return <p className="px-3 text-sm text-ink-soft">No pressure test logged yet.</p>;
  return (
    <ul className="space-y-2 px-3">
      {waiting.map((w) => <PressureCard key={w.event.id} c={{ id: w.event.id, by: sheet.me.name, at: w.event.madeAt, state: w.state === "refused" ? "refused" : "waiting", error: w.error }}
        d={w.event.data} v={evaluatePressureTest(w.event.data, sheet.rules.pressureTest)} />)}
      {sent.map((r) => <PressureCard key={r.id} c={{ id: r.id, by: r.author.name, at: r.madeAt, state: "sent", correctedBy: r.correctedBy, revision: r.revisionNumber }}
        d={r.data} v={r.verdict} onCorrect={sheet.me.mayRecord && onCorrect ? () => onCorrect(r.id) : undefined} />)}
    </ul>
  );
}

export function CheckedRecords({ sheet, items, kind }: { sheet: SiteSheet; items: OutboxItem[]; kind: "fill" | "commissioning" }) {
  const local = kind === "fill"
    ? waitingRecords(items, "fill").map((w) => ({ c: { id: w.event.id, by: sheet.me.name, at: w.event.madeAt, state: w.state === "refused" ? "refused" as const : "waiting" as const, error: w.error }, title: w.event.data.stage, checks: checkFill(w.event.data, sheet.design), notes: w.event.data.notes }))
    : waitingRecords(items, "commissioning").map((w) => ({ c: { id: w.event.id, by: sheet.me.name, at: w.event.madeAt, state: w.state === "refused" ? "refused" as const : "waiting" as const, error: w.error }, title: "Commissioning", checks: w.event.data.readings.map((r) => checkReading(r, sheet.design)), notes: w.event.data.notes }));
  const sent = kind === "fill"
    ? sheet.records.fills.map((r) => ({ c: { id: r.id, by: r.author.name, at: r.madeAt, state: "sent" as const, correctedBy: r.correctedBy, revision: r.revisionNumber }, title: r.data.stage, checks: r.checks, notes: r.data.notes }))
    : sheet.records.commissioning.map((r) => ({ c: { id: r.id, by: r.author.name, at: r.madeAt, state: "sent" as const, correctedBy: r.correctedBy, revision: r.revisionNumber }, title: "Commissioning", checks: r.checks, notes: r.data.notes }));
  const all = [...local, ...sent.reverse()];
  if (!all.length) return <p className="px-3 text-sm text-ink-soft">Nothing recorded yet.</p>;
  return (
    <ul className="space-y-2 px-3">
      {all.map(({ c, title, checks, notes }) => (
        <li key={c.id} className="rounded-md border border-ink/15 bg-white p-3" data-testid={`${kind}-record`} data-state={c.state}>
          <p className="text-base font-semibold capitalize">{title}</p>
          <ChecksTable checks={checks} />
          {notes && <p className="text-sm">{notes}</p>}
          <Meta c={c} />
        </li>
      ))}
    </ul>
  );
}
