import type { Knex } from "knex";

// Review: threads pinned to a part, a pipe or the whole schematic on a revision, their
// messages, the revision history's status moves, who is looking at a board (presence, so
// every app instance agrees), and the firm's rule on approving one's own revision.
// Replaces the first schema's `comments` table, which nothing used.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("comments");

  await knex.schema.createTable("review_threads", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("schematic_id").notNullable().references("schematics.id").onDelete("CASCADE");
    t.uuid("revision_id").notNullable().references("schematic_revisions.id").onDelete("CASCADE");
    // numbered per schematic, as the canvas markers show them
    t.integer("number").notNullable();
    t.enu("anchor_kind", ["part", "pipe", "schematic"], { useNative: true, enumName: "thread_anchor" }).notNullable();
    // a part or pipe id: the thread follows it across revisions, and says so when it is gone
    t.string("anchor_id", 120).nullable();
    t.enu("kind", ["comment", "send-back"], { useNative: true, enumName: "thread_kind" }).notNullable().defaultTo("comment");
    t.text("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("resolved_at", { useTz: true }).nullable();
    t.text("resolved_by").references("users.id").onDelete("SET NULL");
    t.unique(["schematic_id", "number"]);
    t.index(["revision_id"]);
  });
  await knex.raw(`alter table review_threads add constraint review_threads_anchor_id
    check ((anchor_kind = 'schematic') = (anchor_id is null))`);

  await knex.schema.createTable("thread_messages", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("thread_id").notNullable().references("review_threads.id").onDelete("CASCADE");
    t.text("author_id").references("users.id").onDelete("SET NULL");
    t.text("body").notNullable();
    // user ids mentioned (each was sent one e-mail; an edit mails only the new ones)
    t.specificType("mentions", "text[]").notNullable().defaultTo("{}");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("edited_at", { useTz: true }).nullable();
    // deleted by its author: the text is gone, the place in the conversation stays
    t.timestamp("deleted_at", { useTz: true }).nullable();
    t.index(["thread_id", "created_at"]);
  });
  await knex.raw(`alter table thread_messages add constraint thread_messages_body
    check (deleted_at is not null or char_length(body) between 1 and 10000)`);

  // The approval path as it happened: submitted, approved, sent back (with the thread
  // holding the reason), issued, and restores of old revisions as the draft.
  await knex.schema.createTable("revision_events", (t) => {
    t.bigIncrements("id");
    t.uuid("schematic_id").notNullable().references("schematics.id").onDelete("CASCADE");
    t.uuid("revision_id").notNullable().references("schematic_revisions.id").onDelete("CASCADE");
    t.enu("kind", ["status", "restored"], { useNative: true, enumName: "revision_event_kind" }).notNullable();
    t.enu("from_status", null, { useNative: true, existingType: true, enumName: "revision_status" }).nullable();
    t.enu("to_status", null, { useNative: true, existingType: true, enumName: "revision_status" }).nullable();
    t.uuid("thread_id").references("review_threads.id").onDelete("SET NULL");
    t.text("actor_id").references("users.id").onDelete("SET NULL");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["schematic_id", "at"]);
  });

  // One row per open live connection (SSE); every instance writes its own and reads all.
  // A row not refreshed for a minute belongs to an instance that stopped: it is ignored.
  await knex.schema.createTable("board_presence", (t) => {
    t.uuid("connection_id").primary();
    t.uuid("schematic_id").notNullable().references("schematics.id").onDelete("CASCADE");
    t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.timestamp("seen_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["schematic_id", "seen_at"]);
  });

  await liveTriggers(knex);

  await knex.schema.alterTable("organisations", (t) => {
    // "a reviewer may not approve a revision they authored": on unless the firm turns it off
    t.boolean("no_self_approval").notNullable().defaultTo(true);
  });
}

// Live boards: every write that someone looking at a board should see is announced on
// the channel lw_live (delivered at commit, to every app instance that LISTENs), whichever
// route, action or script made it. Payloads are small: what changed and where; clients
// fetch the rest. s = schematic, t = type, r = revision, st = its status, th = thread.
const CHANNEL = "lw_live";
async function liveTriggers(knex: Knex): Promise<void> {
  await knex.raw(`
    create function lw_live_draft() returns trigger language plpgsql as $$
    begin
      if new.lock_version is distinct from old.lock_version then
        perform pg_notify('${CHANNEL}', json_build_object('s', new.id, 't', 'draft', 'v', new.lock_version, 'by', new.updated_by)::text);
      end if;
      return null;
    end $$`);
  await knex.raw(`create trigger lw_live_draft after update on schematics for each row execute function lw_live_draft()`);

  await knex.raw(`
    create function lw_live_revision() returns trigger language plpgsql as $$
    begin
      if tg_op = 'INSERT' or new.status is distinct from old.status then
        perform pg_notify('${CHANNEL}', json_build_object('s', new.schematic_id, 't', 'revision', 'r', new.id, 'st', new.status)::text);
      end if;
      return null;
    end $$`);
  await knex.raw(`create trigger lw_live_revision after insert or update on schematic_revisions for each row execute function lw_live_revision()`);

  await knex.raw(`
    create function lw_live_thread() returns trigger language plpgsql as $$
    declare th uuid; sch uuid; rev uuid;
    begin
      if tg_table_name = 'thread_messages' then
        th := coalesce(new.thread_id, old.thread_id);
        select schematic_id, revision_id into sch, rev from review_threads where id = th;
      else
        th := coalesce(new.id, old.id); sch := coalesce(new.schematic_id, old.schematic_id); rev := coalesce(new.revision_id, old.revision_id);
      end if;
      if sch is not null then
        perform pg_notify('${CHANNEL}', json_build_object('s', sch, 't', 'thread', 'th', th, 'r', rev,
          'st', (select status from schematic_revisions where id = rev))::text);
      end if;
      return null;
    end $$`);
  await knex.raw(`create trigger lw_live_thread after insert or update or delete on review_threads for each row execute function lw_live_thread()`);
  await knex.raw(`create trigger lw_live_message after insert or update or delete on thread_messages for each row execute function lw_live_thread()`);

  await knex.raw(`
    create function lw_live_presence() returns trigger language plpgsql as $$
    begin
      perform pg_notify('${CHANNEL}', json_build_object('s', coalesce(new.schematic_id, old.schematic_id), 't', 'presence')::text);
      return null;
    end $$`);
  await knex.raw(`create trigger lw_live_presence after insert or delete on board_presence for each row execute function lw_live_presence()`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop trigger if exists lw_live_draft on schematics");
  await knex.raw("drop trigger if exists lw_live_revision on schematic_revisions");
  for (const fn of ["lw_live_draft", "lw_live_revision"]) await knex.raw(`drop function if exists ${fn}()`);
  await knex.schema.alterTable("organisations", (t) => t.dropColumn("no_self_approval"));
  for (const table of ["board_presence", "revision_events", "thread_messages", "review_threads"]) await knex.schema.dropTableIfExists(table);
  for (const fn of ["lw_live_thread", "lw_live_presence"]) await knex.raw(`drop function if exists ${fn}()`);
  for (const type of ["revision_event_kind", "thread_kind", "thread_anchor"]) await knex.raw(`drop type if exists ${type}`);
  await knex.schema.createTable("comments", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("revision_id").notNullable().references("schematic_revisions.id").onDelete("CASCADE");
    t.string("target_ref", 120).nullable();
    t.uuid("parent_id").references("comments.id").onDelete("CASCADE");
    t.text("author_id").references("users.id").onDelete("SET NULL");
    t.text("body").notNullable();
    t.boolean("resolved").notNullable().defaultTo(false);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["revision_id"]);
  });
}
