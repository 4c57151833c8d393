"use client";
import { useState } from "react";
import type { OutboxItem } from "./offline/store";
import type { Link } from "./offline/use-site-data";

/** offline · n waiting · all sent — always in view, so the installer knows what has reached the office. */
const what = (i: OutboxItem) => (i.type === "photo" ? i.filename : `${i.event.kind}${i.event.target ? ` ${i.event.target}` : ""}`);

export function SyncStatus({ link, sending, items, onRetry, onDismiss }: {
  link: Link; sending: boolean; items: OutboxItem[]; onRetry: () => void; onDismiss: (seq: number) => void;
}) {
  const [open, setOpen] = useState(false);
  const waiting = items.filter((i) => i.state === "waiting").length;
  const refused = items.filter((i) => i.state === "refused").length;
  const offline = link === "offline" || link === "no-signal";
  const text = link === "signed-out" ? `Signed out: sign in again to send ${waiting} waiting`
    : offline ? `Offline · ${waiting} waiting`
    : waiting > 0 ? `${sending ? "Sending" : "Online"} · ${waiting} waiting`
    : "All sent";
  const tone = offline || link === "signed-out" ? "bg-ink text-white" : waiting > 0 ? "bg-warn text-white" : "bg-ok text-white";
  const refusedItems = items.filter((i) => i.state === "refused");
  return (
    <div className="flex flex-wrap items-center gap-2" aria-live="polite">
      <span data-testid="sync-state" data-waiting={waiting} data-link={link} className={`rounded-full px-3 py-1.5 text-sm font-semibold ${tone}`}>
        {text}
      </span>
      {refused > 0 && (
        <button type="button" data-testid="sync-refused" aria-expanded={open} onClick={() => setOpen(!open)}
          className="min-h-11 rounded-full bg-fault px-3 text-sm font-semibold text-white">{refused} refused</button>
      )}
      {offline && waiting > 0 && <button type="button" onClick={onRetry} className="min-h-11 rounded-md px-2 text-sm font-semibold text-copper-700 underline">Try now</button>}
      {open && refusedItems.length > 0 && (
        <ul className="w-full space-y-1 pb-2 text-sm" data-testid="refused-list">
          {refusedItems.map((i) => (
            <li key={i.seq} className="flex items-start gap-2 rounded bg-white p-2">
              <span className="min-w-0 flex-1"><strong>{what(i)}</strong>: {i.error}</span>
              <button type="button" onClick={() => onDismiss(i.seq!)} className="min-h-11 shrink-0 rounded-md border border-ink/25 px-2 font-semibold">Dismiss</button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
