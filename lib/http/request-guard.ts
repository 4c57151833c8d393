import { config } from "@/lib/config";

// Checks every state-changing request passes before any handler code runs: route handlers
// through apiHandler (lib/auth/authorize.ts), server-action posts through proxy.ts. Pure
// (headers in, refusal out), so the proxy and the route wrapper share it.
//
// - Origin: a browser names the page that sent a POST/PUT/PATCH/DELETE. It must be this
//   app (APP_URL's host, or the host the request was sent to). A request with no Origin is
//   let through only when it carries no cookie: non-browser clients (scripts, curl, tests)
//   have no victim's session to ride on, and browsers always send Origin on these methods.
// - Content-Type: a body must be one of the types the route declares (application/json
//   unless it says otherwise), so a cross-site HTML form (text/plain, urlencoded,
//   multipart) can never be read as JSON.

export type Refusal = { status: 403 | 415; error: string };

const STATE_CHANGING = new Set(["POST", "PUT", "PATCH", "DELETE"]);
export const changesState = (method: string): boolean => STATE_CHANGING.has(method.toUpperCase());

type RequestLike = { method: string; url: string; headers: Headers };

function hostOf(url: string | null): string | null {
  try {
    return url ? new URL(url).host.toLowerCase() : null;
  } catch {
    return null;
  }
}

function ownHosts(req: RequestLike): Set<string> {
  const hosts = [hostOf(config.appUrl), hostOf(req.url), req.headers.get("host")?.toLowerCase() ?? null];
  return new Set(hosts.filter((h): h is string => !!h));
}

export function originRefusal(req: RequestLike): Refusal | null {
  if (!changesState(req.method)) return null;
  const origin = req.headers.get("origin");
  if (origin === null) {
    if (!req.headers.get("cookie")) return null;
    return {
      status: 403,
      error: "Refused: this request carries a session cookie but no Origin header. Browsers send it themselves; other clients must send Origin: "
        + `${new URL(config.appUrl).origin} (or call without a cookie).`,
    };
  }
  const host = hostOf(origin);
  if (host && ownHosts(req).has(host)) return null;
  return { status: 403, error: `Refused: this request came from another site (${origin.slice(0, 120)}). Loopwright accepts changes only from its own pages.` };
}

/** The media type of the body, lower-case, without parameters ("" when none). */
export function mediaType(headers: Headers): string {
  return (headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
}

export function contentTypeRefusal(req: RequestLike, accepts: readonly string[]): Refusal | null {
  if (!changesState(req.method)) return null;
  const type = mediaType(req.headers);
  const hasBody = Number(req.headers.get("content-length") ?? 0) > 0 || req.headers.has("transfer-encoding");
  if (accepts.includes(type) || (!type && !hasBody)) return null;
  const path = hostOf(req.url) ? new URL(req.url).pathname : req.url;
  return {
    status: 415,
    error: `${req.method} ${path} takes a body of type ${accepts.join(" or ")}; this request sent ${type || "no Content-Type"}.`,
  };
}
