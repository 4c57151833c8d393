import type { Knex } from "knex";

// An issued revision is the record the installer builds from: the database refuses every
// UPDATE and DELETE of one (a deleted schematic or project would cascade into it, so those
// are refused too while it has issued revisions; lib/projects/admin.ts archives such a
// project instead). Every revision's document stays immutable, as before. Sizing results
// for revisions live in their own table keyed by revision id, so this row never changes.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    create or replace function lw_revision_immutable() returns trigger language plpgsql as $$
    begin
      if old.status = 'issued' then
        raise exception 'schematic revision % is issued: it cannot be % (issued revisions are kept as they were issued)', old.id, lower(tg_op)
          using errcode = 'P0001';
      end if;
      if tg_op = 'UPDATE' and new.document is distinct from old.document then
        raise exception 'schematic revision % is immutable: its document cannot change', old.id using errcode = 'P0001';
      end if;
      return case when tg_op = 'DELETE' then old else new end;
    end $$`);
  await knex.raw("drop trigger if exists lw_revision_immutable on schematic_revisions");
  await knex.raw(`create trigger lw_revision_immutable before update or delete on schematic_revisions
    for each row execute function lw_revision_immutable()`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop trigger if exists lw_revision_immutable on schematic_revisions");
  await knex.raw(`
    create or replace function lw_revision_immutable() returns trigger language plpgsql as $$
    begin
      if new.document is distinct from old.document then
        raise exception 'schematic revision % is immutable: its document cannot change', old.id;
      end if;
      if old.status = 'issued' and new.status is distinct from old.status then
        raise exception 'schematic revision % is issued: its status is final', old.id;
      end if;
      return new;
    end $$`);
  await knex.raw(`create trigger lw_revision_immutable before update on schematic_revisions
    for each row execute function lw_revision_immutable()`);
}
