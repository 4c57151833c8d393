import type { Knex } from "knex";

// A project's rooms (heat-loss survey: room temperature, loss, emitter) as one jsonb
// document guarded by lock_version, and each firm's emitter list (the radiators it fits).
// Both are validated by lib/rooms/schema.ts before they are written.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("project_rooms", (t) => {
    t.uuid("project_id").primary().references("projects.id").onDelete("CASCADE");
    t.jsonb("rooms").notNullable().defaultTo("[]");
    t.integer("lock_version").notNullable().defaultTo(1);
    t.text("updated_by").references("users.id").onDelete("SET NULL");
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable("firm_emitters", (t) => {
    t.uuid("organisation_id").primary().references("organisations.id").onDelete("CASCADE");
    t.jsonb("emitters").notNullable().defaultTo("[]");
    t.text("updated_by").references("users.id").onDelete("SET NULL");
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("firm_emitters");
  await knex.schema.dropTableIfExists("project_rooms");
}
