import knex from "knex";
import { knexConfig } from "../knexfile";

// Runs pending migrations; prints the failing migration's name and error before exiting 1.
async function main() {
  const db = knex(knexConfig());
  try {
  const [batch, done] = await db.migrate.latest();
  console.log(done.length ? `  migrations batch ${batch}: ${done.join(", ")}` : "  database schema up to date");
} catch (err) {
  console.error(`  migration failed: ${(err as Error).message}`);
  process.exitCode = 1;
} finally {
  await db.destroy();
}
}

void main();
