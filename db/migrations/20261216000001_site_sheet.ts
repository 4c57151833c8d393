import type { Knex } from "knex";

// The site sheet. Site work is an append-only log of events (ticks, unticks, pressure tests,
// fill records, commissioning readings, notes), each with the id the phone gave it, so a
// resend is recognised and applied once; a correction is a new event, never an update.
// The unused first-draft site_records table gives way to it. Attachments gain their upload
// state (pending → listed or refused), what they are pinned to and a thumbnail; firms keep
// their site rules (the pressure test's allowed drop and hold time).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("site_events", (t) => {
    t.uuid("id").primary();
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.uuid("schematic_id").notNullable().references("schematics.id").onDelete("CASCADE");
    t.uuid("revision_id").notNullable().references("schematic_revisions.id").onDelete("CASCADE");
    t.string("kind", 20).notNullable();
    t.string("target", 120).nullable();
    t.jsonb("data").notNullable().defaultTo("{}");
    // added by the server when it applied the event (the firm's rule then in force)
    t.jsonb("context").notNullable().defaultTo("{}");
    t.timestamp("made_at", { useTz: true }).notNullable();
    t.text("author_id").references("users.id").onDelete("SET NULL");
    t.timestamp("received_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.bigIncrements("seq", { primaryKey: false });
    t.index(["schematic_id", "made_at"]);
    t.index(["revision_id"]);
  });
  await knex.raw(`alter table site_events add constraint site_events_kind check
    (kind in ('tick', 'untick', 'pressure-test', 'fill', 'commissioning', 'note'))`);
  await knex.raw(`
    create function lw_site_events_append_only() returns trigger language plpgsql as $$
    begin
      raise exception 'site event % is a record: it is never changed (a correction is a new event)', old.id;
    end $$`);
  await knex.raw(`create trigger lw_site_events_append_only before update on site_events
    for each row execute function lw_site_events_append_only()`);

  await knex.schema.dropTableIfExists("attachments");
  await knex.schema.dropTableIfExists("site_records");
  await knex.raw("drop type if exists site_record_kind");
  await knex.schema.createTable("attachments", (t) => {
    t.uuid("id").primary();
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.uuid("schematic_id").nullable().references("schematics.id").onDelete("CASCADE");
    t.string("target", 120).nullable(); // a part or pipe id of that schematic
    t.string("status", 10).notNullable().defaultTo("pending");
    t.text("storage_key").notNullable().unique();
    t.text("thumbnail_key").nullable();
    t.string("file_name", 240).notNullable();
    t.string("declared_type", 120).notNullable();
    t.string("content_type", 120).nullable(); // what the bytes turned out to be
    t.bigInteger("size_bytes").notNullable();
    t.text("refused_reason").nullable();
    t.text("uploaded_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("completed_at", { useTz: true }).nullable();
    t.index(["project_id", "status"]);
  });
  await knex.raw("alter table attachments add constraint attachments_status check (status in ('pending', 'listed', 'refused'))");

  await knex.schema.alterTable("organisations", (t) => {
    t.jsonb("site_rules").notNullable().defaultTo("{}");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("organisations", (t) => t.dropColumn("site_rules"));
  await knex.schema.dropTableIfExists("attachments");
  await knex.raw("drop trigger if exists lw_site_events_append_only on site_events");
  await knex.raw("drop function if exists lw_site_events_append_only()");
  await knex.schema.dropTableIfExists("site_events");
  await knex.schema.createTable("site_records", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("revision_id").notNullable().references("schematic_revisions.id").onDelete("CASCADE");
    t.enu("kind", ["installed", "pressure-test", "commissioning", "note"], { useNative: true, enumName: "site_record_kind" }).notNullable();
    t.string("target_ref", 120).nullable();
    t.jsonb("data").notNullable().defaultTo("{}");
    t.text("recorded_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["revision_id"]);
  });
  await knex.schema.createTable("attachments", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.uuid("site_record_id").references("site_records.id").onDelete("SET NULL");
    t.text("storage_key").notNullable().unique();
    t.string("file_name", 240).notNullable();
    t.string("content_type", 120).notNullable();
    t.bigInteger("size_bytes").notNullable();
    t.text("uploaded_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}
