// Message wording: plain text first (what most phones preview), the same words as simple
// HTML with one copper button. Each message says who sent it, what the link does, when
// it stops working, and what to do if it was not expected.
import type { Message } from "./message";

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

export function html(paragraphs: string[], button: { label: string; href: string }, after: string[]): string {
  const p = (t: string) => `<p style="margin:0 0 14px">${esc(t)}</p>`;
  return `<!doctype html><html><body style="margin:0;background:#faf7f2;font-family:'IBM Plex Sans',Arial,sans-serif;color:#1f1d1a">
<div style="max-width:520px;margin:0 auto;padding:28px 24px">
<div style="font-weight:600;font-size:17px;margin-bottom:20px;color:#7c411b">Loopwright</div>
${paragraphs.map(p).join("\n")}
<p style="margin:22px 0"><a href="${esc(button.href)}" style="background:#b4632b;color:#fff;text-decoration:none;padding:10px 18px;border-radius:6px;display:inline-block">${esc(button.label)}</a></p>
<p style="margin:0 0 14px;font-size:13px;color:#4a453e">Or paste this link into your browser:<br><span style="word-break:break-all">${esc(button.href)}</span></p>
${after.map((t) => `<p style="margin:0 0 10px;font-size:13px;color:#8a8378">${esc(t)}</p>`).join("\n")}
</div></body></html>`;
}

const roleSentence: Record<string, string> = {
  owner: "As an owner you can do everything on the project, including managing its members.",
  designer: "As a designer you can draw and size the schematics and submit them for review.",
  reviewer: "As a reviewer you can read everything, comment on parts and pipes, and approve or send back revisions.",
  installer: "As an installer you get the issued revision and the site sheet for ticking off work and logging tests.",
  trainee: "As a trainee you can read the project, make your own practice variants, size them and compare them.",
};

export function invitationMessage(o: { to: string; inviterName: string; projectName: string; firmName: string; role: string; link: string; expiresAt: Date }): Message {
  const subject = `${o.inviterName} invited you to ${o.projectName} on Loopwright`;
  const intro = [
    `${o.inviterName} (${o.firmName}) has invited you to join the project "${o.projectName}" on Loopwright as ${o.role}.`,
    roleSentence[o.role] ?? "",
  ].filter(Boolean);
  const after = [
    `The link works once and until ${o.expiresAt.toUTCString()}. If you already have a Loopwright account, sign in with it after opening the link; if not, you can create one there.`,
    "If you were not expecting this, you can ignore this e-mail; nothing happens unless you open the link.",
  ];
  return {
    to: o.to, subject,
    text: [...intro, "", `Accept the invitation: ${o.link}`, "", ...after, "", "— Loopwright"].join("\n"),
    html: html(intro, { label: "Accept the invitation", href: o.link }, after),
  };
}

export function passwordResetMessage(o: { to: string; name: string; link: string; expiresAt: Date }): Message {
  const intro = [`Hello ${o.name},`, "Someone (we hope you) asked to reset the password of your Loopwright account. Choose a new one with this link:"];
  const after = [
    `The link works once and until ${o.expiresAt.toUTCString()}. Resetting signs you out on every device.`,
    "If you did not ask for this, ignore this e-mail: your password stays as it is.",
  ];
  return {
    to: o.to, subject: "Reset your Loopwright password",
    text: [...intro, "", o.link, "", ...after, "", "— Loopwright"].join("\n"),
    html: html(intro, { label: "Choose a new password", href: o.link }, after),
  };
}

export function signUpConfirmMessage(o: { to: string; name: string; firm: string; link: string; expiresAt: Date }): Message {
  const intro = [`Hello ${o.name},`, `Someone (we hope you) asked to create a Loopwright account for this address, with the firm "${o.firm}". Finish with this link:`];
  const after = [
    `The link works once and until ${o.expiresAt.toUTCString()}.`,
    "If you did not ask for this, ignore this e-mail: no account is made unless the link is opened.",
  ];
  return {
    to: o.to, subject: "Finish creating your Loopwright account",
    text: [...intro, "", o.link, "", ...after, "", "— Loopwright"].join("\n"),
    html: html(intro, { label: "Create my account", href: o.link }, after),
  };
}

/** Sent instead of a sign-up link when the address already has an account (the form answers the same either way). */
export function accountExistsMessage(o: { to: string; name: string; signInLink: string; resetLink: string }): Message {
  const intro = [`Hello ${o.name},`, "Someone (perhaps you) tried to create a new Loopwright account with this address, which already has one. Sign in with it instead:"];
  const after = [
    `Forgotten the password? Choose a new one here: ${o.resetLink}`,
    "If this was not you, you need do nothing: your account has not changed.",
  ];
  return {
    to: o.to, subject: "You already have a Loopwright account",
    text: [...intro, "", o.signInLink, "", ...after, "", "— Loopwright"].join("\n"),
    html: html(intro, { label: "Sign in", href: o.signInLink }, after),
  };
}
