// What to tell the person when a server action threw instead of answering. proxy.ts refuses
// a request it will not pass on (too large, another site, malformed) with a plain-text
// message starting "Refused: ", which Next.js raises on the browser side as the error's
// message; anything else (no network, a server fault) gets the caller's own words.
export function actionErrorMessage(e: unknown, fallback: string): string {
  const message = e instanceof Error ? e.message : "";
  return message.startsWith("Refused: ") ? message : fallback;
}
