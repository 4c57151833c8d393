import "server-only";
import { cache } from "react";
import { lucia, SESSION_COOKIE } from "./lucia";
import { readCookie, writeCookie } from "./request-context";

export type SessionUser = { id: string; email: string; name: string; preferences: Record<string, unknown> };

async function setBlank() {
  const c = lucia().createBlankSessionCookie();
  await writeCookie(c.name, c.value, c.attributes);
}

/** The signed-in user, or null. Extends a session past half its life; clears a dead cookie. */
async function loadCurrentUser(): Promise<SessionUser | null> {
  const id = await readCookie(SESSION_COOKIE);
  if (!id) return null;
  const { session, user } = await lucia().validateSession(id);
  if (!session || !user) {
    await setBlank();
    return null;
  }
  if (session.fresh) {
    const c = lucia().createSessionCookie(session.id);
    await writeCookie(c.name, c.value, c.attributes);
  }
  return { id: user.id, email: user.email, name: user.name, preferences: user.preferences };
}

// Per-render memo inside React server rendering; a plain call elsewhere (route handlers, tests).
const cachedCurrentUser = cache(loadCurrentUser);
export async function getCurrentUser(): Promise<SessionUser | null> {
  return cachedCurrentUser();
}

export async function startSession(userId: string): Promise<void> {
  const session = await lucia().createSession(userId, {});
  const c = lucia().createSessionCookie(session.id);
  await writeCookie(c.name, c.value, c.attributes);
}

export async function endSession(): Promise<void> {
  const id = await readCookie(SESSION_COOKIE);
  if (id) await lucia().invalidateSession(id);
  await setBlank();
}

/** After a password change or reset: every other device signs in again. */
export async function endAllSessions(userId: string): Promise<void> {
  await lucia().invalidateUserSessions(userId);
}
