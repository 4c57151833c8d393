/**
 * A finding says one thing once: the same code naming the same parts and pipes twice is a
 * repeat (two messages for one fault). Lists each repeated "code [refs]" of a results document.
 */
export function repeatedFindings(findings: readonly { code: string; refs: readonly string[] }[]): string[] {
  const seen = new Set<string>();
  const repeats: string[] = [];
  for (const f of findings) {
    const key = `${f.code} [${[...f.refs].sort().join(", ")}]`;
    if (seen.has(key)) repeats.push(key);
    seen.add(key);
  }
  return repeats;
}
