// Reads messages the SMTP catcher (maildev) caught, through its HTTP API.
const base = () => process.env.MAIL_WEB_URL ?? "http://127.0.0.1:1081";

export type Caught = { id: string; subject: string; text: string; html: string; to: { address: string }[] };

/** The newest message to the address (with that subject, when given), waiting up to timeoutMs for it. */
export async function mailTo(address: string, o: { subject?: string | RegExp; timeoutMs?: number } = {}): Promise<Caught> {
  const until = Date.now() + (o.timeoutMs ?? 5000);
  const subjectOk = (s: string) => o.subject === undefined || (typeof o.subject === "string" ? s === o.subject : o.subject.test(s));
  for (;;) {
    const all = (await (await fetch(`${base()}/api/email`)).json()) as Caught[];
    const mine = all.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()) && subjectOk(m.subject));
    if (mine.length) return mine[mine.length - 1]!;
    if (Date.now() > until) throw new Error(`no e-mail to ${address}${o.subject ? ` with subject ${o.subject}` : ""} caught at ${base()}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

export function linkIn(text: string, path: string): string {
  const m = text.match(new RegExp(`https?://\\S+${path}/([A-Za-z0-9_-]+)`));
  if (!m) throw new Error(`no ${path} link in: ${text}`);
  return m[1]!;
}

/** Every message caught for an address so far, oldest first. */
export async function mailsTo(address: string): Promise<Caught[]> {
  const all = (await (await fetch(`${base()}/api/email`)).json()) as Caught[];
  return all.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
}

/** Waits until an address has `n` messages (then a moment longer, to catch an unwanted extra one). */
export async function waitForMails(address: string, n: number, timeoutMs = 5000): Promise<Caught[]> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const mine = await mailsTo(address);
    if (mine.length >= n) {
      await new Promise((r) => setTimeout(r, 300));
      return mailsTo(address);
    }
    if (Date.now() > until) return mine;
    await new Promise((r) => setTimeout(r, 150));
  }
}
