import "server-only";
import pg from "pg";
import { config } from "@/lib/config";

// A small node-postgres pool for lucia's adapter and rate-limiter-flexible's store, which
// both want a pg Pool rather than Knex. Cached on globalThis like lib/db.ts.
const g = globalThis as unknown as { __loopwrightPgPool?: pg.Pool };

export function pgPool(): pg.Pool {
  g.__loopwrightPgPool ??= new pg.Pool({ connectionString: config.databaseUrl, max: Number(process.env.AUTH_POOL_MAX ?? 10) });
  return g.__loopwrightPgPool;
}
