import "server-only";
import knex, { type Knex } from "knex";
import { knexConfig } from "@/knexfile";
import { config } from "@/lib/config";

// One Knex instance per process, cached on globalThis so dev hot reloads reuse the pool.
const g = globalThis as unknown as { __loopwrightDb?: Knex };

export function db(): Knex {
  g.__loopwrightDb ??= knex(knexConfig(config.databaseUrl));
  return g.__loopwrightDb;
}
