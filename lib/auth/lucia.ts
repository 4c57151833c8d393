import "server-only";
import { Lucia, TimeSpan } from "lucia";
import { NodePostgresAdapter } from "@lucia-auth/adapter-postgresql";
import { config } from "@/lib/config";
import { pgPool } from "./pg-pool";

// lucia 3 (deprecated upstream) is used only in this file and session.ts, so it can be
// replaced by a few dozen lines of our own without touching callers. The adapter reads
// users(id, …) and sessions(id, user_id, expires_at) exactly as the first migration made them.

export const SESSION_COOKIE = "lw_session";

type DbUser = { email: string; name: string; preferences: Record<string, unknown> | null; password_hash?: string };

function makeLucia() {
  return new Lucia(new NodePostgresAdapter(pgPool(), { user: "users", session: "sessions" }), {
    sessionExpiresIn: new TimeSpan(30, "d"),
    sessionCookie: { name: SESSION_COOKIE, expires: true, attributes: { secure: config.secureCookies, sameSite: "lax" } },
    // never pass password_hash on
    getUserAttributes: (a: DbUser) => ({ email: a.email, name: a.name, preferences: a.preferences ?? {} }),
  });
}

declare module "lucia" {
  interface Register {
    Lucia: ReturnType<typeof makeLucia>;
    DatabaseUserAttributes: DbUser;
  }
}

const g = globalThis as unknown as { __loopwrightLucia?: ReturnType<typeof makeLucia> };

export function lucia() {
  g.__loopwrightLucia ??= makeLucia();
  return g.__loopwrightLucia;
}
