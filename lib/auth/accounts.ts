import "server-only";
import { randomBytes } from "node:crypto";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { audit } from "@/lib/audit";
import { config } from "@/lib/config";
import { later } from "@/lib/later";
import { passwordResetMessage, sendMail } from "@/lib/mail";
import { UserError } from "./errors";
import { hashPassword, verifyPassword } from "./password";
import { maybeSweep } from "./housekeeping";
import { allowAccountMail, signInSucceeded, takeSignInAttempt } from "./rate-limit";
import { requestIp } from "./request-context";
import { endAllSessions, endSession, startSession, type SessionUser } from "./session";
import { hashToken, newToken } from "./tokens";

// Account life cycle: sign in/out (sign-up: ./sign-up.ts), password change and reset. Inputs arrive
// already parsed by the zod schemas in ./schemas.ts.

export const RESET_TTL_MS = 60 * 60 * 1000;
// A fixed hash to verify against when the e-mail is unknown, so both paths take as long.
const DUMMY_HASH = "scrypt$32768$8$1$AAAAAAAAAAAAAAAAAAAAAA==$AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA=";

export function newUserId(): string {
  return `u_${randomBytes(15).toString("base64url")}`;
}

export async function emailTaken(email: string, trx: Knex = db()): Promise<boolean> {
  return !!(await trx("users").where({ email }).first("id"));
}

export async function insertUser(trx: Knex, u: { name: string; email: string; password: string } | { name: string; email: string; passwordHash: string }): Promise<string> {
  if (await emailTaken(u.email, trx)) {
    throw new UserError(409, "An account with this e-mail address already exists. Sign in instead, or reset the password.");
  }
  const id = newUserId();
  const passwordHash = "passwordHash" in u ? u.passwordHash : await hashPassword(u.password);
  await trx("users").insert({ id, name: u.name, email: u.email, password_hash: passwordHash });
  return id;
}

export async function signIn(input: { email: string; password: string }): Promise<string> {
  const ip = await requestIp();
  maybeSweep();
  await takeSignInAttempt(input.email, ip); // counted before the check, so parallel tries cannot slip past
  const user = await db()("users").where({ email: input.email }).first("id", "password_hash");
  const ok = await verifyPassword(user?.password_hash ?? DUMMY_HASH, input.password).catch(() => false);
  if (!user || !ok) {
    await audit({ actorId: user?.id ?? null, action: "auth.sign-in-failed", target: input.email, ip, detail: { reason: user ? "password" : "unknown-email" } });
    throw new UserError(400, "That e-mail address and password do not match an account. Check both, or reset your password.");
  }
  await signInSucceeded(input.email, ip);
  await startSession(user.id);
  await audit({ actorId: user.id, action: "auth.sign-in", target: input.email, ip });
  return user.id;
}

/** Development demo: sign in as the seeded person for a role, without a password (loopback only, see lib/config.ts). */
export async function signInAsDemo(role: string): Promise<string> {
  if (!config.demoSignIn) throw new UserError(403, "Demo sign-in is turned off on this server.");
  const user = await db()("users").where({ id: `demo-${role}` }).first("id", "email");
  if (!user) throw new UserError(404, `There is no demo ${role} on this server; run the demo seed (npm start) first.`);
  await startSession(user.id);
  await audit({ actorId: user.id, action: "auth.sign-in", target: user.email, ip: await requestIp(), detail: { demo: true } });
  return user.id;
}

export async function signOut(user: SessionUser | null): Promise<void> {
  await endSession();
  if (user) await audit({ actorId: user.id, action: "auth.sign-out", target: user.email, ip: await requestIp() });
}

export async function changePassword(user: SessionUser, input: { current: string; password: string }): Promise<void> {
  const row = await db()("users").where({ id: user.id }).first("password_hash");
  if (!row || !(await verifyPassword(row.password_hash, input.current).catch(() => false))) {
    throw new UserError(400, "Current password is not right.");
  }
  await db()("users").where({ id: user.id }).update({ password_hash: await hashPassword(input.password) });
  await endAllSessions(user.id);
  await startSession(user.id);
  await audit({ actorId: user.id, action: "auth.password-changed", target: user.email, ip: await requestIp() });
}

/**
 * Always answers the same way, in the same time: the limiter and the look-up are done for
 * every address, and the token, e-mail and audit row for a real account happen after the
 * answer (lib/later.ts), so neither the words nor the speed tell which addresses have accounts.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  const ip = await requestIp();
  const allowed = await allowAccountMail("reset", email, ip);
  const user = await db()("users").where({ email }).first("id", "name", "email");
  if (!allowed || !user) return;
  later("password reset e-mail", async () => {
    const { token, hash } = newToken();
    const expiresAt = new Date(Date.now() + RESET_TTL_MS);
    await db()("password_resets").insert({ token_hash: hash, user_id: user.id, expires_at: expiresAt });
    await sendMail(passwordResetMessage({ to: user.email, name: user.name, link: `${config.appUrl}/reset-password/${token}`, expiresAt }));
    await audit({ actorId: user.id, action: "auth.password-reset-requested", target: user.email, ip });
  });
}

export type ResetCheck = { ok: true; userId: string; email: string } | { ok: false; reason: string };

export async function checkResetToken(token: string, trx: Knex = db(), lock = false): Promise<ResetCheck> {
  const q = trx("password_resets as r").join("users as u", "u.id", "r.user_id")
    .where("r.token_hash", hashToken(token)).first("r.user_id", "r.expires_at", "r.used_at", "u.email");
  const row = await (lock ? q.forUpdate() : q);
  if (!row) return { ok: false, reason: "This password reset link is not valid. Check it was copied whole, or ask for a new one." };
  if (row.used_at) return { ok: false, reason: "This password reset link has already been used. Ask for a new one if you need to." };
  if (new Date(row.expires_at).getTime() <= Date.now()) return { ok: false, reason: "This password reset link has expired (links last one hour). Ask for a new one." };
  return { ok: true, userId: row.user_id, email: row.email };
}

export async function resetPassword(input: { token: string; password: string }): Promise<string> {
  const userId = await db().transaction(async (trx) => {
    const check = await checkResetToken(input.token, trx, true);
    if (!check.ok) throw new UserError(400, check.reason);
    await trx("users").where({ id: check.userId }).update({ password_hash: await hashPassword(input.password) });
    await trx("password_resets").where({ token_hash: hashToken(input.token) }).update({ used_at: trx.fn.now() });
    return check.userId;
  });
  await endAllSessions(userId);
  await startSession(userId);
  await audit({ actorId: userId, action: "auth.password-reset", ip: await requestIp() });
  return userId;
}
