import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { config } from "@/lib/config";
import { MessageText } from "@/components/review/message-text";
import { demoDomainsText, isDemoAddress } from "@/lib/mail/demo-addresses";

export const metadata: Metadata = { title: "Caught e-mail" };
export const dynamic = "force-dynamic";

// Development only: lists what the local SMTP catcher (maildev) has caught, newest first,
// with the links inside each message made clickable. Reads maildev's HTTP API.
// Shown only when MAIL_VIEWER=true on a loopback APP_URL (lib/config.ts), and then only
// mail addressed to reserved example domains (lib/mail/demo-addresses.ts), which no real
// person can hold: a reset or invitation link for a real address is never listed.
type CaughtMail = { id: string; subject?: string; text?: string; date?: string; to?: { address: string }[] };

async function caught(): Promise<CaughtMail[] | string> {
  try {
    const res = await fetch(`${config.mailWebUrl}/api/email`, { cache: "no-store", signal: AbortSignal.timeout(3000) });
    if (!res.ok) return `The mail catcher answered ${res.status}.`;
    return ((await res.json()) as CaughtMail[]).filter((m) => (m.to ?? []).length > 0 && (m.to ?? []).every((t) => isDemoAddress(t.address))).reverse();
  } catch {
    return `The mail catcher is not answering at ${config.mailWebUrl}. It starts with npm start.`;
  }
}

export default async function DevMailPage() {
  if (!config.mailViewer) notFound();
  const mail = await caught();
  return (
    <main className="mx-auto max-w-3xl px-4 py-8">
      <p className="text-sm"><Link href="/" className="text-copper-600 hover:underline">Loopwright</Link> · development</p>
      <h1 className="mt-1 text-2xl font-semibold">Caught e-mail</h1>
      <p className="mt-1 text-sm text-ink-soft">Messages the app sent to the local mail catcher ({config.mailWebUrl}) for addresses under the example domains ({demoDomainsText}). Nothing here left this machine.</p>
      {typeof mail === "string" ? <p role="alert" className="mt-6 text-fault">{mail}</p>
        : mail.length === 0 ? <p className="mt-6 text-ink-soft">No e-mail yet. Invite someone from a project&apos;s Team page, or ask for a password reset.</p>
        : (
          <ul className="mt-6 space-y-4" data-testid="caught-mail">
            {mail.map((m) => (
              <li key={m.id} className="rounded-lg border border-ink/10 bg-white p-4 shadow-sm">
                <div className="flex flex-wrap items-baseline justify-between gap-2">
                  <h2 className="font-semibold">{m.subject ?? "(no subject)"}</h2>
                  <span className="num text-xs text-ink-faint">{m.date ? new Date(m.date).toISOString().replace("T", " ").slice(0, 19) : ""}</span>
                </div>
                <p className="text-sm text-ink-soft">to {(m.to ?? []).map((t) => t.address).join(", ")}</p>
                <MessageText text={m.text ?? ""} className="mt-3 text-sm" newTab={false} />
              </li>
            ))}
          </ul>
        )}
    </main>
  );
}
