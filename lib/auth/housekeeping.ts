import "server-only";
import { lucia } from "./lucia";
import { pgPool } from "./pg-pool";

// Expired sessions, spent rate-limit counters and old sign-up requests are deleted now and then, from whichever
// instance happens to run a sign-in (no timers, so any number of instances can run).
const CHANCE = 0.02;

export function maybeSweep(): void {
  if (Math.random() >= CHANCE) return;
  void Promise.all([
    lucia().deleteExpiredSessions(),
    pgPool().query("delete from rate_limits where expire is not null and expire < $1", [Date.now() - 3_600_000]),
    pgPool().query("delete from sign_up_requests where expires_at < now() - interval '1 day'"),
  ]).catch((err) => console.error("[loopwright] housekeeping failed", err));
}
