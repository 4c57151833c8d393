import { lucia } from "@/lib/auth/lucia";
import { RequestScope } from "@/lib/auth/request-context";
import { CLIENT_ADDRESS_HEADER } from "@/lib/http/client-address";

// Calling app code the way Next would, without Next:
// - route handlers: import the route module and call GET/POST/… with a Request that
//   carries the Cookie header; apiHandler() reads the session from that Request.
// - server actions: run them inside a RequestScope (lib/auth/request-context.ts), the
//   seam lib/auth reads cookies and the client address from when Next is not around.

export type Who = "owner" | "designer" | "reviewer" | "installer" | "trainee" | "anon";
export const everyone: Who[] = ["owner", "designer", "reviewer", "installer", "trainee", "anon"];

/** A real lucia session for a demo user, as the Cookie header value. */
export async function cookieFor(who: Who): Promise<string | null> {
  if (who === "anon") return null;
  return cookieForUser(`demo-${who}`);
}

export async function cookieForUser(userId: string): Promise<string> {
  const s = await lucia().createSession(userId, {});
  return `${lucia().sessionCookieName}=${s.id}`;
}

export type Outcome = { status: number; body: any; setCookies: string[]; redirect?: string };

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

export const TEST_ORIGIN = "http://test.local";

/**
 * Calls a route handler as a same-origin browser would: Origin of the app (unless `origin`
 * says otherwise; null for none), a JSON body type (unless `contentType`), and the client
 * address the server would have stamped from the connection (lib/http/client-address.ts).
 */
export async function callRoute(handler: Handler | undefined, o: { method?: string; path: string; cookie: string | null; body?: unknown; params?: Record<string, string>;
  ip?: string; rawBody?: string | Uint8Array; origin?: string | null; contentType?: string | null; headers?: Record<string, string> }): Promise<Outcome> {
  if (!handler) throw new Error(`No ${o.method ?? "GET"} handler exported for ${o.path}`);
  const headers = new Headers({ [CLIENT_ADDRESS_HEADER]: o.ip ?? "10.9.9.9", ...o.headers });
  if (o.contentType !== null) headers.set("content-type", o.contentType ?? "application/json");
  const origin = o.origin === undefined ? TEST_ORIGIN : o.origin;
  if (origin !== null && (o.method ?? "GET") !== "GET") headers.set("origin", origin);
  if (o.cookie) headers.set("cookie", o.cookie);
  const body = o.rawBody ?? (o.body === undefined ? undefined : JSON.stringify(o.body));
  const res = await handler(new Request(`${TEST_ORIGIN}${o.path}`, { method: o.method ?? "GET", headers, body: body as BodyInit | undefined }), { params: Promise.resolve(o.params ?? {}) });
  const text = await res.text();
  let parsed: unknown = null;
  try { parsed = text ? JSON.parse(text) : null; } catch { parsed = text; }
  return { status: res.status, body: parsed, setCookies: res.headers.getSetCookie() };
}

export function form(fields: Record<string, string>): FormData {
  const fd = new FormData();
  for (const [k, v] of Object.entries(fields)) fd.set(k, v);
  return fd;
}

/**
 * Runs a server action as the cookie's owner. ActionResult → its status (200 when ok);
 * Next's redirect() (thrown, with a digest) → 303 with the target; other throws propagate.
 */
export async function callAction(fn: () => Promise<unknown>, cookie: string | null, ip = "10.9.9.9"): Promise<Outcome> {
  const scope = new RequestScope({ cookie, ip });
  try {
    const r = (await scope.run(fn)) as { ok: boolean; status?: number; error?: string; data?: unknown } | undefined | null;
    if (r && typeof r === "object" && "ok" in r) return { status: r.ok ? 200 : r.status ?? 500, body: r, setCookies: scope.setCookies };
    return { status: 200, body: r ?? null, setCookies: scope.setCookies };
  } catch (err) {
    const digest = (err as { digest?: string }).digest;
    if (typeof digest === "string" && digest.startsWith("NEXT_REDIRECT")) {
      return { status: 303, body: null, setCookies: scope.setCookies, redirect: digest.split(";")[2] };
    }
    throw err;
  }
}

/** Cookie header value from Set-Cookie lines (last value per name wins; blank = removed). */
export function cookieFromSetCookies(lines: string[]): string | null {
  const jar = new Map<string, string>();
  for (const l of lines) {
    const [pair] = l.split(";");
    const eq = pair!.indexOf("=");
    jar.set(pair!.slice(0, eq), pair!.slice(eq + 1));
  }
  const parts = [...jar].filter(([, v]) => v !== "").map(([k, v]) => `${k}=${v}`);
  return parts.length ? parts.join("; ") : null;
}
