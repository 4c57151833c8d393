import "server-only";
import { AsyncLocalStorage } from "node:async_hooks";
import { clientAddressFrom } from "@/lib/http/client-address";

// Where lib/auth reads the session cookie and client address, and writes cookies.
//
// Inside Next (pages, layouts, server actions) there is no scope and we use
// next/headers' cookies()/headers(). Route handlers wrapped in apiHandler() run inside
// a scope built from their own Request, so they read the Cookie header directly and the
// cookies they set are copied onto the Response. Tests use the same seam for server
// actions: `withRequestCookies("lw_session=…", () => someAction(formData))`, or a
// `RequestScope` to also collect the Set-Cookie lines an action wrote.

type CookieOptions = { httpOnly?: boolean; secure?: boolean; sameSite?: "lax" | "strict" | "none"; path?: string; maxAge?: number; expires?: Date };

export class RequestScope {
  readonly cookies = new Map<string, string>();
  readonly setCookies: string[] = [];
  readonly ip: string | null;
  constructor(init: { cookie?: string | null; ip?: string | null } = {}) {
    for (const part of (init.cookie ?? "").split(";")) {
      const eq = part.indexOf("=");
      if (eq > 0) this.cookies.set(part.slice(0, eq).trim(), decodeURIComponent(part.slice(eq + 1).trim()));
    }
    this.ip = init.ip ?? null;
  }
  static fromRequest(req: Request): RequestScope {
    return new RequestScope({ cookie: req.headers.get("cookie"), ip: clientIp(req.headers) });
  }
  run<T>(fn: () => Promise<T>): Promise<T> {
    return storage.run(this, fn);
  }
}

const storage = new AsyncLocalStorage<RequestScope>();

export function withRequestCookies<T>(cookie: string | null, fn: () => Promise<T>, ip = "127.0.0.1"): Promise<T> {
  return new RequestScope({ cookie, ip }).run(fn);
}

// The client address as stamped from the connection (lib/http/client-address.ts); a
// caller's own X-Forwarded-For is never read here.
const clientIp = clientAddressFrom;

export async function readCookie(name: string): Promise<string | null> {
  const scope = storage.getStore();
  if (scope) return scope.cookies.get(name) ?? null;
  const { cookies } = await import("next/headers");
  return (await cookies()).get(name)?.value ?? null;
}

export async function writeCookie(name: string, value: string, options: CookieOptions): Promise<void> {
  const scope = storage.getStore();
  if (scope) {
    scope.cookies.set(name, value);
    scope.setCookies.push(serialize(name, value, options));
    return;
  }
  const { cookies } = await import("next/headers");
  try {
    (await cookies()).set(name, value, options);
  } catch {
    // Server components may not set cookies; the next action or route call will.
  }
}

export async function requestIp(): Promise<string | null> {
  const scope = storage.getStore();
  if (scope) return scope.ip;
  try {
    const { headers } = await import("next/headers");
    return clientIp(await headers());
  } catch {
    return null;
  }
}

export function currentScope(): RequestScope | undefined {
  return storage.getStore();
}

function serialize(name: string, value: string, o: CookieOptions): string {
  const parts = [`${name}=${encodeURIComponent(value)}`, `Path=${o.path ?? "/"}`];
  if (o.maxAge !== undefined) parts.push(`Max-Age=${Math.floor(o.maxAge)}`);
  if (o.expires) parts.push(`Expires=${o.expires.toUTCString()}`);
  if (o.httpOnly) parts.push("HttpOnly");
  if (o.secure) parts.push("Secure");
  if (o.sameSite) parts.push(`SameSite=${o.sameSite[0]!.toUpperCase()}${o.sameSite.slice(1)}`);
  return parts.join("; ");
}
