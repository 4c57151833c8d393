/**
 * "@Name" mentions in a message, matched against the people who may read it. Pure.
 * The board's picker inserts "@" + the person's name; here a name counts only when it
 * is followed by something other than a letter or digit, so "@Ann" is not "@Anna Lee".
 */
export interface Mentionable { id: string; name: string }

const letterOrDigit = /[\p{L}\p{N}]/u;

export function mentionedIn(body: string, people: readonly Mentionable[]): string[] {
  const text = body.toLocaleLowerCase("en");
  const found: string[] = [];
  for (const p of people) {
    const needle = `@${p.name.toLocaleLowerCase("en")}`;
    for (let at = text.indexOf(needle); at !== -1; at = text.indexOf(needle, at + 1)) {
      const next = text.charAt(at + needle.length);
      if (!next || !letterOrDigit.test(next)) {
        found.push(p.id);
        break;
      }
    }
  }
  return found;
}

/** The "@partial" being typed just before the caret, for the picker; null when none. */
export function mentionQuery(text: string, caret: number): { start: number; query: string } | null {
  const before = text.slice(0, caret);
  const at = before.lastIndexOf("@");
  if (at === -1 || (at > 0 && letterOrDigit.test(before.charAt(at - 1)))) return null;
  const query = before.slice(at + 1);
  if (query.length > 40 || /[\n@]/.test(query) || /\s{2}/.test(query)) return null;
  return { start: at, query };
}

/** Initials for a presence dot or a message: "Imogen Pryce" → "IP". */
export function initialsOf(name: string): string {
  const words = name.trim().split(/\s+/).filter(Boolean);
  const letters = words.length > 1 ? [words[0]!, words[words.length - 1]!] : words;
  return letters.map((w) => [...w][0]!.toLocaleUpperCase("en")).join("") || "?";
}
