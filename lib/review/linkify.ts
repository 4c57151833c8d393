/**
 * Plain text cut into text and link pieces, so a message can be shown as text (React
 * escapes it; no HTML is ever rendered) with its web links clickable. Only http and
 * https addresses become links; trailing punctuation stays text. Pure.
 */
export type Piece = { text: string; href?: undefined } | { text: string; href: string };

const URLISH = /\bhttps?:\/\/[^\s<>"'`]+/gi;
const TRAILING = /[.,;:!?)\]}'"]+$/;

function safeHref(candidate: string): string | null {
  try {
    const u = new URL(candidate);
    return u.protocol === "http:" || u.protocol === "https:" ? u.href : null;
  } catch {
    return null;
  }
}

export function linkify(text: string): Piece[] {
  const out: Piece[] = [];
  let last = 0;
  for (const m of text.matchAll(URLISH)) {
    const start = m.index;
    let url = m[0];
    // keep a closing bracket that belongs to the address, e.g. …/Thing_(part)
    const tail = url.match(TRAILING)?.[0] ?? "";
    if (tail && !(tail === ")" && url.includes("("))) url = url.slice(0, url.length - tail.length);
    const href = safeHref(url);
    if (!href) continue;
    if (start > last) out.push({ text: text.slice(last, start) });
    out.push({ text: url, href });
    last = start + url.length;
  }
  if (last < text.length) out.push({ text: text.slice(last) });
  return out;
}
