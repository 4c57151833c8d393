import type { Knex } from "knex";

// Sizing kept with what was sized. A revision's results live in their own rows keyed by
// (revision, engine version): the revision row itself is never updated, and a newer engine
// adds a row beside the old one (both kept, so the difference can be shown). The draft's
// last sizing is one row per schematic, with the document it was computed for, so the
// board can say what changed since. Projects gain an archive mark.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("revision_results", (t) => {
    t.uuid("revision_id").notNullable().references("schematic_revisions.id").onDelete("CASCADE");
    t.string("engine_version", 40).notNullable();
    t.jsonb("results").notNullable();
    t.timestamp("computed_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["revision_id", "engine_version"]);
  });
  await knex.schema.createTable("draft_results", (t) => {
    t.uuid("schematic_id").primary().references("schematics.id").onDelete("CASCADE");
    t.string("engine_version", 40).notNullable();
    t.jsonb("document").notNullable();
    t.jsonb("results").notNullable();
    t.text("sized_by").references("users.id").onDelete("SET NULL");
    t.timestamp("sized_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("draft_results");
  await knex.schema.dropTableIfExists("revision_results");
}
