// Review e-mails: a mention in a thread, and each step of the approval path. Each says
// who did what on which schematic, quotes the words that matter, and links to the board
// at that thread or revision. Plain text first, the same words as simple HTML.
import type { Message } from "./message";
import { html } from "./templates";

const QUOTE_MAX = 600;
const quote = (s: string) => (s.length > QUOTE_MAX ? `${s.slice(0, QUOTE_MAX)}…` : s);
const footer = "You get this because you are a member of the project on Loopwright. Open the link to reply; nothing changes until you do.";

function message(to: string, subject: string, intro: string[], button: { label: string; href: string }, body?: string): Message {
  const quoted = body ? [`“${quote(body)}”`] : [];
  return {
    to, subject,
    text: [...intro, ...quoted, "", `${button.label}: ${button.href}`, "", footer, "", "— Loopwright"].join("\n"),
    html: html([...intro, ...quoted], button, [footer]),
  };
}

export interface ReviewPlace { projectName: string; schematicName: string; revisionNumber: number }
const where = (p: ReviewPlace) => `${p.schematicName} (Rev ${p.revisionNumber}) in ${p.projectName}`;

export function mentionMessage(o: { to: string; authorName: string; place: ReviewPlace; threadNumber: number; anchorText: string; body: string; link: string }): Message {
  return message(o.to, `${o.authorName} mentioned you in thread #${o.threadNumber} on ${o.place.schematicName}`,
    [`${o.authorName} mentioned you in thread #${o.threadNumber} on ${o.anchorText}, ${where(o.place)}:`],
    { label: "Open the thread", href: o.link }, o.body);
}

export type StatusStep = "submitted" | "approved" | "sent-back" | "issued";

const stepWords: Record<StatusStep, (actor: string, p: ReviewPlace) => { subject: string; line: string; button: string }> = {
  submitted: (a, p) => ({ subject: `Rev ${p.revisionNumber} of ${p.schematicName} is ready for review`,
    line: `${a} submitted ${where(p)} for review.`, button: "Open the revision" }),
  approved: (a, p) => ({ subject: `Rev ${p.revisionNumber} of ${p.schematicName} was approved`,
    line: `${a} approved ${where(p)}. It can now be issued.`, button: "Open the revision" }),
  "sent-back": (a, p) => ({ subject: `Rev ${p.revisionNumber} of ${p.schematicName} was sent back`,
    line: `${a} sent back ${where(p)}, saying why in a thread:`, button: "Open the thread" }),
  issued: (a, p) => ({ subject: `Rev ${p.revisionNumber} of ${p.schematicName} was issued`,
    line: `${a} issued ${where(p)}. It is now the revision to build from, and read-only.`, button: "Open the issued revision" }),
};

export function revisionStepMessage(o: { to: string; step: StatusStep; actorName: string; place: ReviewPlace; link: string; reason?: string }): Message {
  const w = stepWords[o.step](o.actorName, o.place);
  return message(o.to, w.subject, [w.line], { label: w.button, href: o.link }, o.reason);
}
