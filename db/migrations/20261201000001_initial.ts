import type { Knex } from "knex";

// First schema: accounts and sessions (lucia's tables), firms, project roles,
// schematics with immutable revisions, review comments, uploads, site records,
// invitations and the audit log.
export async function up(knex: Knex): Promise<void> {
  await knex.raw("create extension if not exists citext");
  await knex.raw("create extension if not exists pgcrypto");

  await knex.schema.createTable("users", (t) => {
    t.text("id").primary();
    t.specificType("email", "citext").notNullable().unique();
    t.string("name", 120).notNullable();
    t.text("password_hash").notNullable();
    t.jsonb("preferences").notNullable().defaultTo("{}");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("sessions", (t) => {
    t.text("id").primary();
    t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.index(["user_id"]);
  });

  await knex.schema.createTable("organisations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.string("name", 160).notNullable();
    t.string("slug", 80).notNullable().unique();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // Firm membership; project roles live in project_members.
  await knex.schema.createTable("memberships", (t) => {
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.enu("role", ["owner", "member"], { useNative: true, enumName: "firm_role" }).notNullable().defaultTo("member");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["organisation_id", "user_id"]);
  });

  await knex.schema.createTable("projects", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.string("name", 160).notNullable();
    t.string("client", 160).notNullable().defaultTo("");
    t.string("site", 240).notNullable().defaultTo("");
    t.jsonb("design_conditions").notNullable().defaultTo("{}");
    t.text("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["organisation_id", "name"]);
  });

  await knex.schema.createTable("project_members", (t) => {
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.enu("role", ["owner", "designer", "reviewer", "installer", "trainee"], { useNative: true, enumName: "project_role" }).notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["project_id", "user_id"]);
    t.index(["user_id"]);
  });

  // A schematic is a team design or a trainee's private practice variant. Its working
  // draft is mutable and guarded by lock_version; saved revisions are immutable rows.
  await knex.schema.createTable("schematics", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.string("name", 160).notNullable();
    t.enu("kind", ["team", "practice"], { useNative: true, enumName: "schematic_kind" }).notNullable().defaultTo("team");
    t.text("owner_id").references("users.id").onDelete("SET NULL");
    t.uuid("variant_of").references("schematics.id").onDelete("SET NULL");
    t.jsonb("draft").notNullable();
    t.integer("lock_version").notNullable().defaultTo(1);
    t.text("updated_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["project_id", "name"]);
  });

  await knex.schema.createTable("schematic_revisions", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("schematic_id").notNullable().references("schematics.id").onDelete("CASCADE");
    t.integer("number").notNullable();
    t.jsonb("document").notNullable();
    t.integer("schema_version").notNullable().defaultTo(1);
    t.enu("status", ["draft", "in-review", "approved", "issued"], { useNative: true, enumName: "revision_status" }).notNullable().defaultTo("draft");
    t.text("message").notNullable().defaultTo("");
    t.text("author_id").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("status_changed_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["schematic_id", "number"]);
  });

  await knex.schema.createTable("comments", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("revision_id").notNullable().references("schematic_revisions.id").onDelete("CASCADE");
    t.string("target_ref", 120).nullable(); // part or pipe id the thread is pinned to
    t.uuid("parent_id").references("comments.id").onDelete("CASCADE");
    t.text("author_id").references("users.id").onDelete("SET NULL");
    t.text("body").notNullable();
    t.boolean("resolved").notNullable().defaultTo(false);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["revision_id"]);
  });

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

  await knex.schema.createTable("invitations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.specificType("email", "citext").notNullable();
    t.enu("role", null, { useNative: true, existingType: true, enumName: "project_role" }).notNullable();
    t.text("token_hash").notNullable().unique();
    t.text("invited_by").references("users.id").onDelete("SET NULL");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("accepted_at", { useTz: true }).nullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("password_resets", (t) => {
    t.text("token_hash").primary();
    t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true }).nullable();
  });

  await knex.schema.createTable("audit_log", (t) => {
    t.bigIncrements("id");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text("actor_id").references("users.id").onDelete("SET NULL");
    t.string("action", 80).notNullable(); // e.g. auth.sign-in, revision.status, member.role
    t.uuid("project_id").references("projects.id").onDelete("SET NULL");
    t.string("target", 200).nullable();
    t.jsonb("detail").notNullable().defaultTo("{}");
    t.string("ip", 64).nullable();
    t.index(["project_id", "at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ["audit_log", "password_resets", "invitations", "attachments", "site_records", "comments",
    "schematic_revisions", "schematics", "project_members", "projects", "memberships", "organisations", "sessions", "users"]) {
    await knex.schema.dropTableIfExists(table);
  }
  for (const type of ["site_record_kind", "revision_status", "schematic_kind", "project_role", "firm_role"]) {
    await knex.raw(`drop type if exists ${type}`);
  }
}
