import knex from "knex";
import { knexConfig } from "../knexfile";

async function main() {
  const db = knex(knexConfig());
  try {
  await db.seed.run();
  console.log("  demo data in place");
} catch (err) {
  console.error(`  seed failed: ${(err as Error).message}`);
  process.exitCode = 1;
} finally {
  await db.destroy();
}
}

void main();
