/**
 * Read a number as a person types it in their locale: "1,500" is fifteen
 * hundred for en-GB (comma groups thousands), "1.500" is fifteen hundred for
 * de-DE; never silently 1.5. A text the locale cannot read one way only —
 * "1,5" for en-GB (a decimal comma, or a thousands group cut short?) — is
 * refused with a message that says how to write it.
 * The separators come from Intl.NumberFormat for the locale (ECMA-402).
 */

export type ReadNumber = { ok: true; value: number } | { ok: false; message: string };

export interface Separators {
  decimal: string;
  group: string;
}

/** Decimal and group separators of a locale ("en-GB" → "." and ","); unknown locales fall back to en-GB's. */
export function separatorsOf(locale: string | undefined): Separators {
  try {
    const parts = new Intl.NumberFormat(locale, { useGrouping: true }).formatToParts(12345.6);
    const decimal = parts.find((p) => p.type === "decimal")?.value ?? ".";
    const group = parts.find((p) => p.type === "group")?.value ?? ",";
    return { decimal, group: /\s/.test(group) ? " " : group };
  } catch {
    return { decimal: ".", group: "," };
  }
}

const SPACES = /[\s\u00a0\u202f\u2009]/g;
const G = "\u0001"; // canonical group mark while reading

/** Digits in groups of three after a first group of 1–3, the only way a group mark may appear; null otherwise. */
function ungroup(intPart: string): string | null {
  if (!intPart.includes(G)) return /^\d*$/.test(intPart) ? intPart : null;
  const groups = intPart.split(G);
  if (!/^\d{1,3}$/.test(groups[0]!) || !groups.slice(1).every((g) => /^\d{3}$/.test(g))) return null;
  return groups.join("");
}

export function readNumber(text: string, locale?: string): ReadNumber {
  const { decimal, group } = separatorsOf(locale);
  const shown = text.trim();
  if (shown === "") return { ok: false, message: "Type a number." };
  const example = decimal === "." ? "1500 or 1,500 for fifteen hundred, 1.5 for one and a half" : "1500 or 1.500 for fifteen hundred, 1,5 for one and a half";
  const twoWays = { ok: false as const, message: `“${shown}” can be read two ways: write ${example}.` };
  // Spaces (ordinary, no-break, thin) group digits in many locales and in SI style.
  let t = shown.replace(/\u2212/g, "-").replace(SPACES, G);
  if (group !== " ") t = t.split(group).join(G);
  const other = decimal === "." ? "," : ".";
  // The other mark where this locale never writes it: a decimal mark from another convention, or a group?
  if (other !== group && t.includes(other)) return twoWays;
  const m = /^([-+]?)([^eE]*)([eE][-+]?\d+)?$/.exec(t);
  if (!m) return { ok: false, message: `“${shown}” is not a number: write ${example}.` };
  const [, sign, mantissa = "", exp = ""] = m;
  const [intPart = "", frac, ...more] = mantissa.split(decimal);
  if (more.length > 0) return { ok: false, message: `“${shown}” has more than one decimal mark: write ${example}.` };
  if (frac !== undefined && !/^\d+$/.test(frac)) return frac.includes(G) ? twoWays : { ok: false, message: `“${shown}” is not a number: write ${example}.` };
  const digits = ungroup(intPart);
  if (digits === null) return /^[\d\u0001]+$/.test(intPart) ? twoWays : { ok: false, message: `“${shown}” is not a number: write ${example}.` };
  if (digits === "" && frac === undefined) return { ok: false, message: `“${shown}” is not a number: write ${example}.` };
  const value = Number(`${sign}${digits || "0"}${frac !== undefined ? `.${frac}` : ""}${exp}`);
  if (!Number.isFinite(value)) return { ok: false, message: `“${shown}” is too large for a field.` };
  return { ok: true, value };
}
