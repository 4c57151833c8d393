import "server-only";
import { UserError } from "@/lib/auth/errors";
import { decodeUtf8, parseJsonText, readBodyBytes as readBounded } from "@/lib/http/body";
import { BODY_LIMIT_BYTES } from "@/lib/http/limits.mjs";
import { Refused } from "./outcome";

// The Refused-returning face of the one bounded reader (lib/http/body.ts), for code written
// against it. New route code: `await readJson(req)` (or plain `await req.json()`) inside apiHandler.

export const MAX_BODY_BYTES = BODY_LIMIT_BYTES;

function asRefused(e: unknown): Refused {
  if (e instanceof UserError) return new Refused(e.status, e.message, e.status === 400 ? { issues: [{ path: "", message: e.message }] } : {});
  throw e;
}

export async function readBodyBytes(req: Request): Promise<{ ok: true; bytes: Uint8Array } | Refused> {
  try {
    return { ok: true, bytes: await readBounded(req) };
  } catch (e) {
    return asRefused(e);
  }
}

export function parseJsonBytes(bytes: Uint8Array): { ok: true; value: unknown } | Refused {
  try {
    return { ok: true, value: parseJsonText(decodeUtf8(bytes)) };
  } catch (e) {
    return asRefused(e);
  }
}

export async function readJsonBody(req: Request): Promise<{ ok: true; value: unknown } | Refused> {
  const body = await readBodyBytes(req);
  return body.ok ? parseJsonBytes(body.bytes) : body;
}
