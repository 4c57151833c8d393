import type { Knex } from "knex";

// Sign-up waits for its e-mail link (lib/auth/sign-up.ts): the request is kept here, its
// token only as SHA-256 and the password only as its scrypt hash, until the link is opened.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("sign_up_requests", (t) => {
    t.text("token_hash").primary();
    t.specificType("email", "citext").notNullable();
    t.string("name", 120).notNullable();
    t.string("firm", 160).notNullable();
    t.text("password_hash").notNullable();
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true }).nullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["email"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("sign_up_requests");
}
