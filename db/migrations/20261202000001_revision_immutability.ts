import type { Knex } from "knex";

// Saved revisions are immutable: the database itself refuses a change to a revision's
// document, and an issued revision's status is final. Code never does either; this makes it certain.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    create function lw_revision_immutable() returns trigger language plpgsql as $$
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

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop trigger if exists lw_revision_immutable on schematic_revisions");
  await knex.raw("drop function if exists lw_revision_immutable()");
}
