import type { NextRequest } from "next/server";
import { nestsDeeperThan } from "./json-depth";
import { BODY_LIMIT_BYTES, BODY_LIMIT_TEXT, JSON_MAX_DEPTH } from "./limits.mjs";
import { mediaType, originRefusal, type Refusal } from "./request-guard";

// Server actions are posted to page URLs and decoded by Next.js before our code runs; a
// body Next cannot decode, or one over its size limit, ends as a 500 there. proxy.ts runs
// these checks first and answers 4xx with a plain-text message, which the browser side of
// a server action raises as the error's message (lib/action-error.ts shows it).
//   - another site's Origin (or a cookie with no Origin): 403
//   - larger than BODY_LIMIT_BYTES (the same limit next.config.mjs gives Next): 413
//   - not one of the two encodings React sends (text/plain JSON, multipart/form-data): 415
//   - JSON that is invalid or nested deeper than JSON_MAX_DEPTH: 400

export type ActionRefusal = { status: 400 | 413 | 415 | Refusal["status"]; error: string };

const isDigits = (s: string) => /^\d+$/.test(s);
const REFUSED = "Refused: "; // every message starts so (lib/action-error.ts shows these to the person)

function jsonFault(text: string): ActionRefusal | null {
  if (nestsDeeperThan(text, JSON_MAX_DEPTH)) {
    return { status: 400, error: `${REFUSED}the data sent to the server action nests arrays and objects more than ${JSON_MAX_DEPTH} levels deep.` };
  }
  try {
    JSON.parse(text);
    return null;
  } catch {
    return { status: 400, error: `${REFUSED}the data sent to the server action is not valid JSON.` };
  }
}

export async function actionRefusal(req: NextRequest): Promise<ActionRefusal | null> {
  if (req.method !== "POST") return null;
  const type = mediaType(req.headers);
  const isFetchAction = req.headers.has("next-action");
  if (!isFetchAction && type !== "multipart/form-data") return null; // not a server action
  const origin = originRefusal(req);
  if (origin) return origin;
  const tooLarge: ActionRefusal = { status: 413, error: `${REFUSED}the data sent is larger than the ${BODY_LIMIT_TEXT} limit for one request.` };
  if (Number(req.headers.get("content-length") ?? 0) > BODY_LIMIT_BYTES) return tooLarge;
  if (type === "text/plain" && isFetchAction) {
    const text = await req.text();
    return Buffer.byteLength(text) > BODY_LIMIT_BYTES ? tooLarge : jsonFault(text);
  }
  if (type === "multipart/form-data") {
    const body = await req.arrayBuffer();
    if (body.byteLength > BODY_LIMIT_BYTES) return tooLarge;
    let form: FormData;
    try {
      form = await new Response(body, { headers: { "content-type": req.headers.get("content-type") ?? "" } }).formData();
    } catch {
      return { status: 400, error: `${REFUSED}the form data sent could not be read.` };
    }
    // React's encoding puts each argument row in a field named by its number, as JSON
    for (const [name, value] of form.entries()) {
      if (isFetchAction && isDigits(name) && typeof value === "string") {
        const fault = jsonFault(value);
        if (fault) return fault;
      }
    }
    return null;
  }
  if (isFetchAction) return { status: 415, error: `${REFUSED}a server action takes text/plain or multipart/form-data as React sends them; this request sent ${type || "no Content-Type"}.` };
  return null;
}
