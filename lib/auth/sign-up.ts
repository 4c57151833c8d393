import "server-only";
import { randomBytes } from "node:crypto";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { audit } from "@/lib/audit";
import { config } from "@/lib/config";
import { later } from "@/lib/later";
import { accountExistsMessage, sendMail, signUpConfirmMessage } from "@/lib/mail";
import { insertUser } from "./accounts";
import { UserError } from "./errors";
import { hashPassword } from "./password";
import { allowAccountMail } from "./rate-limit";
import { requestIp } from "./request-context";
import { startSession } from "./session";
import { hashToken, newToken } from "./tokens";

// Open sign-up in two steps, so the form never tells whether an address has an account:
// 1. the form always answers "check your e-mail", after the same work either way (the
//    password is hashed, the address looked up); after the answer, a new address gets a
//    confirmation link (the request kept, hashed, in sign_up_requests) and an address that
//    already has an account gets a note to its owner instead;
// 2. the link's page creates the person, their firm (of which they are owner), and signs them in.

export const SIGN_UP_TTL_MS = 24 * 60 * 60 * 1000;

export function checkEmailMessage(email: string): string {
  return `Check your e-mail: we sent a message to ${email} to finish creating your account. The link works for 24 hours.`;
}

function slugify(name: string): string {
  const base = name.toLowerCase().normalize("NFKD").replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60) || "firm";
  return `${base}-${randomBytes(3).toString("hex")}`;
}

export async function requestSignUp(input: { name: string; email: string; password: string; firm: string }): Promise<void> {
  const ip = await requestIp();
  const passwordHash = await hashPassword(input.password);
  const allowed = await allowAccountMail("signUp", input.email, ip);
  const existing = await db()("users").where({ email: input.email }).first("id", "name", "email");
  if (!allowed) return;
  if (existing) {
    later("account-exists e-mail", async () => {
      await sendMail(accountExistsMessage({ to: existing.email, name: existing.name, signInLink: `${config.appUrl}/sign-in`, resetLink: `${config.appUrl}/forgot-password` }));
      await audit({ actorId: existing.id, action: "auth.sign-up-existing", target: existing.email, ip });
    });
    return;
  }
  later("sign-up e-mail", async () => {
    const { token, hash } = newToken();
    const expiresAt = new Date(Date.now() + SIGN_UP_TTL_MS);
    await db()("sign_up_requests").insert({ token_hash: hash, email: input.email, name: input.name, firm: input.firm, password_hash: passwordHash, expires_at: expiresAt });
    await sendMail(signUpConfirmMessage({ to: input.email, name: input.name, firm: input.firm, link: `${config.appUrl}/sign-up/${token}`, expiresAt }));
    await audit({ actorId: null, action: "auth.sign-up-requested", target: input.email, ip });
  });
}

export type SignUpCheck = { ok: true; email: string; name: string; firm: string } | { ok: false; reason: string };

export async function checkSignUpToken(token: string, trx: Knex = db(), lock = false): Promise<SignUpCheck & { passwordHash?: string }> {
  const q = trx("sign_up_requests").where({ token_hash: hashToken(token) }).first("email", "name", "firm", "password_hash", "expires_at", "used_at");
  const row = await (lock ? q.forUpdate() : q);
  if (!row) return { ok: false, reason: "This sign-up link is not valid. Check it was copied whole, or sign up again." };
  if (row.used_at) return { ok: false, reason: "This sign-up link has already been used. Sign in with the account it made." };
  if (new Date(row.expires_at).getTime() <= Date.now()) return { ok: false, reason: "This sign-up link has expired (links last 24 hours). Sign up again." };
  return { ok: true, email: row.email, name: row.name, firm: row.firm, passwordHash: row.password_hash };
}

/** Step 2: the person, their firm, their session. Returns the new user's id. */
export async function confirmSignUp(token: string): Promise<string> {
  const r = await db().transaction(async (trx) => {
    const check = await checkSignUpToken(token, trx, true);
    if (!check.ok) throw new UserError(400, check.reason);
    await trx("sign_up_requests").where({ token_hash: hashToken(token) }).update({ used_at: trx.fn.now() });
    const id = await insertUser(trx, { name: check.name, email: check.email, passwordHash: check.passwordHash! });
    const [org] = await trx("organisations").insert({ name: check.firm, slug: slugify(check.firm) }).returning("id");
    await trx("memberships").insert({ organisation_id: org.id, user_id: id, role: "owner" });
    return { id, email: check.email };
  });
  await startSession(r.id);
  await audit({ actorId: r.id, action: "auth.sign-up", target: r.email, ip: await requestIp() });
  return r.id;
}
