"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";

/** Send: e-mail the issued revision's report (PDF attached) to the client; logged in the revision history. */
export function SendPanel({ revisionId, issued, clientEmail }: { revisionId: string; issued: boolean; clientEmail: string }) {
  const [to, setTo] = useState(clientEmail);
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<{ ok: boolean; text: string } | null>(null);
  const send = async (e: React.FormEvent) => {
    e.preventDefault();
    setBusy(true);
    const res = await fetch(`/api/v1/revisions/${revisionId}/handover`, { method: "POST", headers: { "content-type": "application/json" },
      body: JSON.stringify(to.trim() ? { to: to.trim() } : {}) });
    const body = await res.json().catch(() => ({}));
    setBusy(false);
    setResult(res.ok ? { ok: true, text: `Sent to ${body.sent.to} with ${body.sent.file} attached; it is in the revision history.` }
      : { ok: false, text: body.error ?? `${res.status} ${res.statusText}` });
  };
  return (
    <section className="mt-6 rounded-lg border border-ink/10 bg-white p-4 shadow-sm" aria-labelledby="send-h">
      <h2 id="send-h" className="text-lg font-semibold">Send to the client</h2>
      <p className="mt-1 text-sm text-ink-soft">
        E-mails the report as a PDF, with the first of its cautions in the message.{!clientEmail && " The project has no client e-mail yet: give one here, or add it in the project's details."}
      </p>
      <form onSubmit={send} className="mt-3 flex flex-wrap items-end gap-2">
        <label className="text-sm">
          <span className="font-medium">To</span>
          <input type="email" required className="mt-1 block w-72 rounded-md border border-ink/15 px-2.5 py-1.5 text-sm" value={to}
            onChange={(e) => setTo(e.target.value)} placeholder="client@example.com" data-testid="handover-to" />
        </label>
        <Button type="submit" disabled={busy || !issued} data-testid="handover-send">{busy ? "Sending…" : "Send the report"}</Button>
      </form>
      {!issued && <p className="mt-2 text-xs text-ink-faint">Only an issued revision is sent.</p>}
      {result && <p role={result.ok ? "status" : "alert"} className={`mt-2 text-sm ${result.ok ? "text-ok" : "text-fault"}`} data-testid="handover-result">{result.text}</p>}
    </section>
  );
}
