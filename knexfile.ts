import type { Knex } from "knex";
import path from "node:path";

// Serves the app (lib/db.ts), the scripts (migrate, seed) and the tests alike:
// the only difference between them is DATABASE_URL.
const root = process.cwd(); // every script, the app and the tests run from the project root

export function knexConfig(databaseUrl = process.env.DATABASE_URL ?? "postgres://app@127.0.0.1:54329/loopwright"): Knex.Config {
  return {
    client: "pg",
    connection: databaseUrl,
    pool: { min: 0, max: Number(process.env.DB_POOL_MAX ?? 10) },
    migrations: { directory: path.join(root, "db/migrations"), loadExtensions: [".ts"], tableName: "knex_migrations" },
    seeds: { directory: path.join(root, "db/seeds"), loadExtensions: [".ts"] },
  };
}

export default knexConfig();
