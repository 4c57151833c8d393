import "server-only";
import { createHash } from "node:crypto";
import { LRUCache } from "lru-cache";
import { calculate, ENGINE_VERSION } from "@/lib/hydraulics/calculate";
import type { Results } from "@/lib/schematic";
import { invalidDocument, type Refused } from "./outcome";

/** Serialized results, ready to send (UTF-8 JSON). */
export class Answer {
  constructor(readonly json: Uint8Array<ArrayBuffer>) {}
  results(): Results {
    return JSON.parse(new TextDecoder().decode(this.json)) as Results;
  }
}

// The engine is a pure function of the document (no clock, no module state), so
// an answer can be kept and served again for the same bytes: a board sized again
// unchanged, an issued revision opened by the whole site team, an API client
// polling. Keyed by SHA-256 of engine version + document bytes; bounded by the
// bytes of the answers kept; per process.
const CACHE_BYTES = Number(process.env.RESULTS_CACHE_MB ?? 64) * 2 ** 20;
const answers = new LRUCache<string, Answer>({ maxSize: Math.max(1, CACHE_BYTES), sizeCalculation: (a) => Math.max(1, a.json.byteLength) });

const keyOf = (doc: Uint8Array | string) => createHash("sha256").update(ENGINE_VERSION).update("\0").update(doc).digest("base64url");

/**
 * The one seam between the app (sizing action, calculate API) and the engine:
 * the results serialized, from the cache when the same document was sized
 * before. The engine parses and validates the document itself (parseSchematic),
 * so a bad document comes back refused with its JSON-path issues. `doc` is the
 * document as received (the API's request body) or as serialized by the caller;
 * `parse` turns it into the document (or refuses it) and is only called on a miss.
 */
export function sizeToAnswer(doc: Uint8Array | string, parse: () => { ok: true; value: unknown } | Refused): Answer | Refused {
  const key = keyOf(doc);
  const hit = answers.get(key);
  if (hit !== undefined) return hit;
  const parsed = parse();
  if (!parsed.ok) return parsed;
  const r = calculate(parsed.value);
  if (!r.ok) return invalidDocument(r.issues);
  const answer = new Answer(new TextEncoder().encode(JSON.stringify(r.results)));
  if (answer.json.byteLength <= CACHE_BYTES / 8) answers.set(key, answer); // one huge answer may not flush the rest
  return answer;
}
