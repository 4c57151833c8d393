import { expect } from "@playwright/test";

// E-mail the app sent, as the SMTP catcher (maildev) caught it, read through its HTTP API.
type Caught = { subject: string; text: string; to: { address: string }[] };
const base = () => process.env.MAIL_WEB_URL ?? "http://127.0.0.1:1081";

/** The newest message to an address that matches; waits up to 10 s for it. */
export async function caughtMail(match: (m: Caught) => boolean, to: string, also: (m: Caught) => boolean = () => true): Promise<Caught> {
  let found: Caught | undefined;
  await expect.poll(async () => {
    const all = (await (await fetch(`${base()}/api/email`)).json()) as Caught[];
    found = all.filter((m) => m.to.some((t) => t.address.toLowerCase() === to) && match(m) && also(m)).pop();
    return found !== undefined;
  }, { timeout: 10_000, message: `an e-mail to ${to}` }).toBe(true);
  return found!;
}

/** The board link in a message's text. */
export function linkInMail(text: string): string {
  const m = text.match(/https?:\/\/\S+\/projects\/\S+/);
  if (!m) throw new Error(`no board link in: ${text}`);
  return m[0];
}
