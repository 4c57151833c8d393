/**
 * How deeply JSON text nests, found by one pass over the characters (strings skipped), so a
 * body nested thousands of levels deep is refused before JSON.parse or any recursive walk
 * sees it. Returns true as soon as `max` is exceeded. Client-safe, no dependencies.
 */
export function nestsDeeperThan(text: string, max: number): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 92 /* \ */) i++;
      else if (c === 34 /* " */) inString = false;
    } else if (c === 34) inString = true;
    else if (c === 91 /* [ */ || c === 123 /* { */) {
      if (++depth > max) return true;
    } else if (c === 93 /* ] */ || c === 125 /* } */) depth--;
  }
  return false;
}
