import type { Knex } from "knex";

// The handover pack: the client's e-mail address on the project (the report is sent there),
// the project's price list (the firm's own codes and prices, matched to the materials list),
// and handovers in the revision history (who sent which revision's report to whom).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("projects", (t) => {
    t.string("client_email", 254).notNullable().defaultTo("");
  });

  await knex.schema.createTable("project_price_lists", (t) => {
    t.uuid("project_id").primary().references("projects.id").onDelete("CASCADE");
    // [{code, description, unit, price}] as read from the uploaded CSV, in file order
    t.jsonb("rows").notNullable();
    t.text("uploaded_by").references("users.id").onDelete("SET NULL");
    t.timestamp("uploaded_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // ADD VALUE may run in a transaction (PostgreSQL 12+); the value is used only after commit
  await knex.raw("alter type revision_event_kind add value if not exists 'handover'");
  await knex.schema.alterTable("revision_events", (t) => {
    // a handover's recipient and attachment: {to, file, bytes}
    t.jsonb("detail").nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex("revision_events").where({ kind: "handover" }).delete();
  await knex.schema.alterTable("revision_events", (t) => t.dropColumn("detail"));
  // an enum value cannot be dropped; an unused 'handover' is harmless
  await knex.schema.dropTable("project_price_lists");
  await knex.schema.alterTable("projects", (t) => t.dropColumn("client_email"));
}
