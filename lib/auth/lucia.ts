import "server-only";
import { Lucia, TimeSpan, type DatabaseSession, type DatabaseUser } from "lucia";
import { NodePostgresAdapter } from "@lucia-auth/adapter-postgresql";
import { config } from "@/lib/config";
import { pgPool } from "./pg-pool";

// lucia 3 (deprecated upstream) is used only in this file and session.ts, so it can be
// replaced by a few dozen lines of our own without touching callers. The adapter reads
// users(id, …) and sessions(id, user_id, expires_at) exactly as the first migration made them.

export const SESSION_COOKIE = "lw_session";

type DbUser = { email: string; name: string; preferences: Record<string, unknown> | null; password_hash?: string };

/**
 * The stock adapter reads a session and its user with two queries in parallel; every
 * signed-in request pays for it, so this reads both in one join (one pool client, one
 * round trip). Same rows, same shapes as the adapter's own transforms.
 */
class OneTripAdapter extends NodePostgresAdapter {
  override async getSessionAndUser(sessionId: string): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    const { rows } = await pgPool().query(
      `select s.id as session_id, s.user_id, s.expires_at, u.email, u.name, u.preferences
         from sessions s join users u on u.id = s.user_id where s.id = $1`,
      [sessionId],
    );
    const r = rows[0];
    if (!r) return [null, null];
    return [
      { id: r.session_id, userId: r.user_id, expiresAt: r.expires_at, attributes: {} },
      { id: r.user_id, attributes: { email: r.email, name: r.name, preferences: r.preferences } },
    ];
  }
}

function makeLucia() {
  return new Lucia(new OneTripAdapter(pgPool(), { user: "users", session: "sessions" }), {
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
