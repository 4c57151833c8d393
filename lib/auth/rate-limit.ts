import "server-only";
import { createHash } from "node:crypto";
import { RateLimiterPostgres, RateLimiterRes } from "rate-limiter-flexible";
import { UserError } from "./errors";
import { pgPool } from "./pg-pool";

// Sign-in attempts counted per account and per client address, in PostgreSQL (table
// rate_limits, made by a migration) so every app instance shares the counters.
//
// An attempt is TAKEN before the password is checked: the limiter's consume is one
// INSERT … ON CONFLICT DO UPDATE … RETURNING, so N parallel tries are counted as N and
// at most ACCOUNT_LIMIT.points of them reach the password check — whether or not the
// address has an account, so the answers do not tell which accounts exist. A success
// clears the account's counter and gives its point back to the client address.
//
// Keys are SHA-256 of the e-mail or address: fixed length (the key column is 255
// characters) and no personal data in the table.

export const ACCOUNT_LIMIT = { points: 5, duration: 15 * 60, blockDuration: 15 * 60 };
export const ADDRESS_LIMIT = { points: 30, duration: 15 * 60, blockDuration: 15 * 60 };

export const RESET_ACCOUNT_LIMIT = { points: 3, duration: 60 * 60 };
export const RESET_ADDRESS_LIMIT = { points: 10, duration: 60 * 60 };

// Handover e-mails carry a report to an outside address: a sender may send 20 an hour and
// one address may receive 10 an hour (common practice for outbound mail on request, no
// published value) — plenty for resending to a client, too few to flood an inbox.
export const HANDOVER_SENDER_LIMIT = { points: 20, duration: 60 * 60 };
export const HANDOVER_RECIPIENT_LIMIT = { points: 10, duration: 60 * 60 };

type Kind = "account" | "address" | "resetAccount" | "resetAddress" | "signUpAccount" | "signUpAddress" | "handoverSender" | "handoverRecipient";
type Limiters = Record<Kind, RateLimiterPostgres>;
const g = globalThis as unknown as { __loopwrightLimiters?: Limiters };

function limiters(): Limiters {
  const common = { storeClient: pgPool(), tableName: "rate_limits", tableCreated: true, clearExpiredByTimeout: false };
  g.__loopwrightLimiters ??= {
    account: new RateLimiterPostgres({ ...common, keyPrefix: "signin-account", ...ACCOUNT_LIMIT }),
    address: new RateLimiterPostgres({ ...common, keyPrefix: "signin-address", ...ADDRESS_LIMIT }),
    resetAccount: new RateLimiterPostgres({ ...common, keyPrefix: "reset-account", ...RESET_ACCOUNT_LIMIT }),
    resetAddress: new RateLimiterPostgres({ ...common, keyPrefix: "reset-address", ...RESET_ADDRESS_LIMIT }),
    // sign-up e-mails (a confirmation link, or "you already have an account"): same budget as resets
    signUpAccount: new RateLimiterPostgres({ ...common, keyPrefix: "signup-account", ...RESET_ACCOUNT_LIMIT }),
    signUpAddress: new RateLimiterPostgres({ ...common, keyPrefix: "signup-address", ...RESET_ADDRESS_LIMIT }),
    handoverSender: new RateLimiterPostgres({ ...common, keyPrefix: "handover-sender", ...HANDOVER_SENDER_LIMIT }),
    handoverRecipient: new RateLimiterPostgres({ ...common, keyPrefix: "handover-recipient", ...HANDOVER_RECIPIENT_LIMIT }),
  };
  return g.__loopwrightLimiters;
}

/** The limiter key for an e-mail (case-folded) or a client address. */
export function limiterKey(value: string): string {
  return createHash("sha256").update(value.toLowerCase()).digest("base64url");
}

const minutes = (ms: number) => Math.max(1, Math.ceil(ms / 60_000));
const wait = (ms: number) => `${minutes(ms)} minute${minutes(ms) === 1 ? "" : "s"}`;
const retryAfter = (ms: number) => ({ "retry-after": String(Math.ceil(ms / 1000)) });

/** consume() → null when allowed, the limiter's answer when refused. */
async function take(kind: Kind, value: string): Promise<RateLimiterRes | null> {
  try {
    await limiters()[kind].consume(limiterKey(value));
    return null;
  } catch (e) {
    if (e instanceof RateLimiterRes) return e;
    throw e;
  }
}

/**
 * Takes one sign-in attempt from the account's and the address's budgets; throws a 429
 * UserError when either is used up. Call before checking the password.
 */
export async function takeSignInAttempt(email: string, ip: string | null): Promise<void> {
  const [byAddress, byAccount] = await Promise.all([ip ? take("address", ip) : null, take("account", email)]);
  if (byAddress) throw new UserError(429, `Too many failed sign-ins from your network. Try again in ${wait(byAddress.msBeforeNext)}.`, retryAfter(byAddress.msBeforeNext));
  if (byAccount) {
    throw new UserError(429, `Too many failed sign-ins for this account. Try again in ${wait(byAccount.msBeforeNext)}, or reset your password.`,
      retryAfter(byAccount.msBeforeNext));
  }
}

/** After a right password: the account starts afresh and the address gets its attempt back. */
export async function signInSucceeded(email: string, ip: string | null): Promise<void> {
  const { account, address } = limiters();
  await Promise.all([account.delete(limiterKey(email)), ip ? address.reward(limiterKey(ip), 1) : null]);
}

/**
 * E-mails sent on request (password resets, sign-up links): a clear 429 when one address
 * asks too often; when one e-mail address is asked for too often, false, so the caller
 * quietly sends nothing (the answer must not reveal whether the account exists).
 */
export async function allowAccountMail(purpose: "reset" | "signUp", email: string, ip: string | null): Promise<boolean> {
  const byAddress = ip ? await take(`${purpose}Address`, ip) : null;
  if (byAddress) {
    const what = purpose === "reset" ? "password reset requests" : "sign-ups";
    throw new UserError(429, `Too many ${what} from your network. Try again in ${wait(byAddress.msBeforeNext)}.`, retryAfter(byAddress.msBeforeNext));
  }
  return (await take(`${purpose}Account`, email)) === null;
}

/** One handover e-mail from this user to this address; a 429 naming the wait when either budget is used up. */
export async function takeHandoverSend(senderId: string, to: string): Promise<void> {
  const [bySender, byRecipient] = await Promise.all([take("handoverSender", senderId), take("handoverRecipient", to)]);
  if (bySender) throw new UserError(429, `You have sent ${HANDOVER_SENDER_LIMIT.points} handover e-mails in the last hour. Try again in ${wait(bySender.msBeforeNext)}.`, retryAfter(bySender.msBeforeNext));
  if (byRecipient) {
    throw new UserError(429, `${to} has been sent ${HANDOVER_RECIPIENT_LIMIT.points} handover e-mails in the last hour. Try again in ${wait(byRecipient.msBeforeNext)}.`,
      retryAfter(byRecipient.msBeforeNext));
  }
}
