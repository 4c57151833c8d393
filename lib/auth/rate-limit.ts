import "server-only";
import { RateLimiterPostgres, RateLimiterRes } from "rate-limiter-flexible";
import { UserError } from "./errors";
import { pgPool } from "./pg-pool";

// Failed sign-ins counted per account and per client address, in PostgreSQL (table
// rate_limits, made by a migration) so every app instance shares the counters.
// A success clears the account's counter; the address counter only decays.

export const ACCOUNT_LIMIT = { points: 5, duration: 15 * 60, blockDuration: 15 * 60 };
export const ADDRESS_LIMIT = { points: 30, duration: 15 * 60, blockDuration: 15 * 60 };

export const RESET_ACCOUNT_LIMIT = { points: 3, duration: 60 * 60 };
export const RESET_ADDRESS_LIMIT = { points: 10, duration: 60 * 60 };

type Limiters = { account: RateLimiterPostgres; address: RateLimiterPostgres; resetAccount: RateLimiterPostgres; resetAddress: RateLimiterPostgres };
const g = globalThis as unknown as { __loopwrightLimiters?: Limiters };

function limiters(): Limiters {
  const common = { storeClient: pgPool(), tableName: "rate_limits", tableCreated: true, clearExpiredByTimeout: false };
  g.__loopwrightLimiters ??= {
    account: new RateLimiterPostgres({ ...common, keyPrefix: "signin-account", ...ACCOUNT_LIMIT }),
    address: new RateLimiterPostgres({ ...common, keyPrefix: "signin-address", ...ADDRESS_LIMIT }),
    resetAccount: new RateLimiterPostgres({ ...common, keyPrefix: "reset-account", ...RESET_ACCOUNT_LIMIT }),
    resetAddress: new RateLimiterPostgres({ ...common, keyPrefix: "reset-address", ...RESET_ADDRESS_LIMIT }),
  };
  return g.__loopwrightLimiters;
}

const minutes = (ms: number) => Math.max(1, Math.ceil(ms / 60_000));

function blocked(kind: "account" | "address", msBeforeNext: number): UserError {
  const wait = `${minutes(msBeforeNext)} minute${minutes(msBeforeNext) === 1 ? "" : "s"}`;
  const msg = kind === "account"
    ? `Too many failed sign-ins for this account. Try again in ${wait}, or reset your password.`
    : `Too many failed sign-ins from your network. Try again in ${wait}.`;
  return new UserError(429, msg, { "retry-after": String(Math.ceil(msBeforeNext / 1000)) });
}

/** Throws a 429 UserError when either counter is used up. */
export async function assertSignInAllowed(email: string, ip: string | null): Promise<void> {
  const { account, address } = limiters();
  const [a, b] = await Promise.all([account.get(email.toLowerCase()), ip ? address.get(ip) : null]);
  if (a && a.consumedPoints >= ACCOUNT_LIMIT.points) throw blocked("account", a.msBeforeNext);
  if (b && b.consumedPoints >= ADDRESS_LIMIT.points) throw blocked("address", b.msBeforeNext);
}

export async function recordFailedSignIn(email: string, ip: string | null): Promise<void> {
  const { account, address } = limiters();
  const swallow = (e: unknown) => { if (!(e instanceof RateLimiterRes)) throw e; };
  await Promise.all([account.consume(email.toLowerCase()).catch(swallow), ip ? address.consume(ip).catch(swallow) : null]);
}

export async function clearAccountCounter(email: string): Promise<void> {
  await limiters().account.delete(email.toLowerCase());
}

/**
 * Password-reset e-mails: a clear 429 when one address asks too often; when one account
 * is asked for too often, returns false so the caller quietly sends nothing (the answer
 * must not reveal whether the account exists).
 */
export async function allowResetMail(email: string, ip: string | null): Promise<boolean> {
  const { resetAccount, resetAddress } = limiters();
  if (ip) {
    try {
      await resetAddress.consume(ip);
    } catch (e) {
      if (!(e instanceof RateLimiterRes)) throw e;
      throw new UserError(429, `Too many password reset requests from your network. Try again in ${minutes(e.msBeforeNext)} minutes.`,
        { "retry-after": String(Math.ceil(e.msBeforeNext / 1000)) });
    }
  }
  try {
    await resetAccount.consume(email.toLowerCase());
    return true;
  } catch (e) {
    if (!(e instanceof RateLimiterRes)) throw e;
    return false;
  }
}
