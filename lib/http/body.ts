import "server-only";
import { UserError } from "@/lib/auth/errors";
import { nestsDeeperThan } from "./json-depth";
import { BODY_LIMIT_BYTES, BODY_LIMIT_TEXT, JSON_MAX_DEPTH } from "./limits.mjs";

// The one bounded reader of request bodies. apiHandler (lib/auth/authorize.ts) routes every
// way a handler can read its Request — req.json(), req.text(), req.arrayBuffer(), … and the
// helpers below — through readBodyBytes, so no route can buffer more than BODY_LIMIT_BYTES
// or parse JSON nested deeper than JSON_MAX_DEPTH. Refusals are UserErrors (413 / 400),
// which apiHandler answers as {error, issues}.

const read = new WeakMap<Request, Promise<Uint8Array>>();

export const tooLarge = () => new UserError(413, `The request body is larger than the ${BODY_LIMIT_TEXT} limit.`);

async function readStream(req: Request, raw: ReadableStream<Uint8Array> | null): Promise<Uint8Array> {
  if (Number(req.headers.get("content-length") ?? 0) > BODY_LIMIT_BYTES) throw tooLarge();
  if (!raw) return new Uint8Array(0);
  const chunks: Uint8Array[] = [];
  let total = 0;
  const reader = raw.getReader();
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > BODY_LIMIT_BYTES) {
      await reader.cancel().catch(() => {});
      throw tooLarge();
    }
    chunks.push(value);
  }
  return chunks.length === 1 ? chunks[0]! : Buffer.concat(chunks);
}

/** The body's bytes, read once (later calls share the first read), at most BODY_LIMIT_BYTES. */
export function readBodyBytes(req: Request): Promise<Uint8Array> {
  let p = read.get(req);
  if (!p) {
    p = readStream(req, req.body);
    read.set(req, p);
  }
  return p;
}

/** JSON text → value; 400 naming the fault for invalid JSON or nesting deeper than JSON_MAX_DEPTH. */
export function parseJsonText(text: string, what = "request body"): unknown {
  if (nestsDeeperThan(text, JSON_MAX_DEPTH)) {
    throw new UserError(400, `The ${what} nests arrays and objects more than ${JSON_MAX_DEPTH} levels deep.`);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    const why = e instanceof SyntaxError ? ` (${e.message.slice(0, 120)})` : "";
    throw new UserError(400, `The ${what} is not valid JSON${why}.`);
  }
}

export const decodeUtf8 = (bytes: Uint8Array): string => new TextDecoder().decode(bytes);

/** The body parsed as JSON, through the byte and depth limits. */
export async function readJson(req: Request): Promise<unknown> {
  return parseJsonText(decodeUtf8(await readBodyBytes(req)));
}

/** The body as UTF-8 text (CSV imports and the like), through the byte limit. */
export async function readText(req: Request): Promise<string> {
  return decodeUtf8(await readBodyBytes(req));
}

/**
 * Makes every body reader of this Request go through the bounded reader: the handler may
 * keep writing `await req.json()`. (req.body, the raw stream, is not for handlers.)
 */
export function boundBodyReaders(req: Request): void {
  const bytes = () => readBodyBytes(req);
  const asBlob = async () => new Blob([(await bytes()) as Uint8Array<ArrayBuffer>], { type: req.headers.get("content-type") ?? "" });
  const own: Record<string, () => Promise<unknown>> = {
    json: () => readJson(req),
    text: () => readText(req),
    bytes,
    arrayBuffer: async () => (await bytes()).slice().buffer,
    blob: asBlob,
    formData: async () => new Response(await asBlob(), { headers: { "content-type": req.headers.get("content-type") ?? "" } }).formData(),
  };
  for (const [name, value] of Object.entries(own)) Object.defineProperty(req, name, { value, configurable: true });
}
