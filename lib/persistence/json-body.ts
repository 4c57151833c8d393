import "server-only";
import { Refused } from "./outcome";

export const MAX_BODY_BYTES = 2 * 1024 * 1024;

/**
 * Read a JSON request body, refusing more than `limit` bytes (413) before
 * parsing. The stream is counted as it arrives, so a missing or lying
 * Content-Length cannot make us buffer an unbounded body.
 */
export async function readJsonBody(req: Request, limit = MAX_BODY_BYTES): Promise<{ ok: true; value: unknown } | Refused> {
  const body = await readBodyBytes(req, limit);
  return body.ok ? parseJsonBytes(body.bytes) : body;
}

/** The body's bytes, with the same byte limit (413) as readJsonBody. */
export async function readBodyBytes(req: Request, limit = MAX_BODY_BYTES): Promise<{ ok: true; bytes: Uint8Array } | Refused> {
  const tooBig = new Refused(413, `The request body is larger than ${limit / (1024 * 1024)} MB.`);
  if (Number(req.headers.get("content-length") ?? 0) > limit) return tooBig;
  const chunks: Uint8Array[] = [];
  let total = 0;
  if (req.body) {
    const reader = req.body.getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > limit) {
        await reader.cancel();
        return tooBig;
      }
      chunks.push(value);
    }
  }
  return { ok: true, bytes: chunks.length === 1 ? chunks[0]! : Buffer.concat(chunks) };
}

export function parseJsonBytes(bytes: Uint8Array): { ok: true; value: unknown } | Refused {
  try {
    return { ok: true, value: JSON.parse(new TextDecoder().decode(bytes)) };
  } catch {
    return new Refused(400, "The request body is not valid JSON.", { issues: [{ path: "", message: "document: not valid JSON" }] });
  }
}
