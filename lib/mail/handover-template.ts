// The handover e-mail: what it is, what the attached report holds, and the cautions' first
// line, in plain text first and the same words as simple HTML.
import type { Message } from "./message";

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

export function handoverMessage(o: { to: string; client: string; project: string; schematic: string; revision: number; firm: string; sender: string;
  caution: string; file: { filename: string; content: Buffer } }): Message {
  const paragraphs = [
    `Hello${o.client ? ` ${o.client}` : ""},`,
    `${o.firm} sends you the handover report of the heating system at ${o.project} (${o.schematic}, revision ${o.revision}). It is attached as a PDF: the schematic, the sizing tables, the settings made on site, the pressure test, fill and commissioning records, anything still open, and the cautions.`,
    `Please note: ${o.caution}`,
    "Keep the report with the system's other documents; the next engineer who works on it will need it.",
    `Sent by ${o.sender} (${o.firm}) through Loopwright. If you were not expecting it, you can ignore this e-mail.`,
  ];
  const html = `<!doctype html><html><body style="margin:0;background:#faf7f2;font-family:'IBM Plex Sans',Arial,sans-serif;color:#1f1d1a">
<div style="max-width:520px;margin:0 auto;padding:28px 24px"><div style="font-weight:600;font-size:17px;margin-bottom:20px;color:#7c411b">Loopwright</div>
${paragraphs.map((p, i) => `<p style="margin:0 0 14px${i === 2 ? ";color:#9a5b00" : ""}">${esc(p)}</p>`).join("\n")}</div></body></html>`;
  return {
    to: o.to, subject: `Handover report: ${o.project} — ${o.schematic}, revision ${o.revision}`,
    text: [...paragraphs, "", "— Loopwright"].join("\n\n"), html,
    attachments: [{ filename: o.file.filename, content: o.file.content, contentType: "application/pdf" }],
  };
}
