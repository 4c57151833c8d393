"use client";
import { useState } from "react";
import { noteData } from "@/lib/site/events";
import type { SiteSheet } from "@/lib/site/site-view";
import type { OutboxItem } from "./offline/store";
import { waitingRecords } from "./overlay";
import { bigButton, Field, Select, TextInput } from "./field";

const when = (iso: string) => new Date(iso).toLocaleString("en-GB", { hour: "2-digit", minute: "2-digit", day: "numeric", month: "short" });

/** Site notes, on the schematic or pinned to a part or pipe; never edited, a later note says what changed. */
export function Notes({ sheet, items, onSave }: { sheet: SiteSheet; items: OutboxItem[]; onSave: (target: string | null, data: unknown) => Promise<void> }) {
  const [error, setError] = useState<string | null>(null);
  const waiting = waitingRecords(items, "note").map((w) => ({ id: w.event.id, by: sheet.me.name, at: w.event.madeAt, target: w.event.target ?? null, text: w.event.data.text, state: w.state }));
  const sent = sheet.records.notes.map((n) => ({ id: n.id, by: n.author.name, at: n.madeAt, target: n.target, text: n.data.text, state: "sent" as const })).reverse();
  return (
    <div className="space-y-3 px-3">
      <h2 className="text-lg font-bold">Site notes</h2>
      {sheet.me.mayRecord && (
        <form className="space-y-2" data-testid="note-form" onSubmit={async (e) => {
          e.preventDefault();
          const form = e.currentTarget;
          const fd = new FormData(form);
          const r = noteData.safeParse({ text: fd.get("text") });
          if (!r.success) { setError(r.error.issues[0]!.message); return; }
          setError(null);
          await onSave(String(fd.get("target") ?? "") || null, r.data);
          form.reset();
        }}>
          <Field label="Note"><TextInput name="text" /></Field>
          <Field label="About"><Select name="target" defaultValue=""><option value="">the whole schematic</option>
            {sheet.groups.flatMap((g) => g.rows).map((id) => <option key={id} value={id}>{id}</option>)}</Select></Field>
          {error && <p role="alert" className="text-sm font-semibold text-fault">{error}</p>}
          <button type="submit" className={bigButton("secondary")}>Add note</button>
        </form>
      )}
      <ul className="space-y-2">
        {[...waiting, ...sent].map((n) => (
          <li key={n.id} className="rounded-md border border-ink/15 bg-white p-2 text-sm" data-testid="note-record">
            <p className="text-base">{n.text}</p>
            <p className="text-ink-soft">{n.target ? `${n.target} · ` : ""}{n.by ?? "someone"} · {when(n.at)}{n.state === "waiting" ? " · waiting to send" : n.state === "refused" ? " · refused" : ""}</p>
          </li>
        ))}
      </ul>
    </div>
  );
}
