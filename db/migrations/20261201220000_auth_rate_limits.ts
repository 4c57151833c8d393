import type { Knex } from "knex";

// Sign-in attempt counters for rate-limiter-flexible's PostgreSQL store (RateLimiterPostgres
// with tableCreated: true). Columns are the ones that store reads and writes; living in
// PostgreSQL, the counters are shared by every app instance.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("rate_limits", (t) => {
    t.string("key", 255).primary();
    t.integer("points").notNullable().defaultTo(0);
    t.bigInteger("expire").nullable();
  });
  await knex.schema.alterTable("invitations", (t) => {
    t.timestamp("revoked_at", { useTz: true }).nullable();
    t.index(["project_id"]);
  });
  await knex.schema.alterTable("password_resets", (t) => {
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["user_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("password_resets", (t) => { t.dropIndex(["user_id"]); t.dropColumn("created_at"); });
  await knex.schema.alterTable("invitations", (t) => { t.dropIndex(["project_id"]); t.dropColumn("revoked_at"); });
  await knex.schema.dropTableIfExists("rate_limits");
}
