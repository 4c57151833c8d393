"use client";
import type { OutboxItem } from "./offline/store";
import type { Link } from "./offline/use-site-data";

/** offline · n waiting · all sent — always in view, so the installer knows what has reached the office. */
export function SyncStatus({ link, sending, items, onRetry }: { link: Link; sending: boolean; items: OutboxItem[]; onRetry: () => void }) {
  const waiting = items.filter((i) => i.state === "waiting").length;
  const refused = items.filter((i) => i.state === "refused").length;
  const offline = link === "offline" || link === "no-signal";
  const text = link === "signed-out" ? `Signed out: sign in again to send ${waiting} waiting`
    : offline ? `Offline · ${waiting} waiting`
    : waiting > 0 ? `${sending ? "Sending" : "Online"} · ${waiting} waiting`
    : "All sent";
  const tone = offline || link === "signed-out" ? "bg-ink text-white" : waiting > 0 ? "bg-warn text-white" : "bg-ok text-white";
  return (
    <div className="flex items-center gap-2" aria-live="polite">
      <span data-testid="sync-state" data-waiting={waiting} data-link={link} className={`rounded-full px-3 py-1.5 text-sm font-semibold ${tone}`}>
        {text}
      </span>
      {refused > 0 && <span data-testid="sync-refused" className="rounded-full bg-fault px-3 py-1.5 text-sm font-semibold text-white">{refused} refused</span>}
      {offline && waiting > 0 && <button type="button" onClick={onRetry} className="min-h-11 rounded-md px-2 text-sm font-semibold text-copper-700 underline">Try now</button>}
    </div>
  );
}
