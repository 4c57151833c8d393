import type { Knex } from "knex";

// Project names are unique in a firm whatever their case ("Orchard End" and "orchard end"
// are one name), as the create check already assumed; and a project can be archived (kept,
// hidden from new work) when it cannot be deleted because it holds issued revisions.
export async function up(knex: Knex): Promise<void> {
  // names that clash only by case get their id's first characters appended, so the index can be built
  await knex.raw(`
    update projects p set name = left(p.name, 150) || ' (' || left(p.id::text, 8) || ')'
    where exists (select 1 from projects q where q.organisation_id = p.organisation_id and lower(q.name) = lower(p.name)
      and (q.created_at, q.id) < (p.created_at, p.id))`);
  await knex.raw("alter table projects drop constraint if exists projects_organisation_id_name_unique");
  await knex.raw("create unique index projects_organisation_id_lower_name_unique on projects (organisation_id, lower(name))");
  await knex.schema.alterTable("projects", (t) => {
    t.timestamp("archived_at", { useTz: true }).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("projects", (t) => t.dropColumn("archived_at"));
  await knex.raw("drop index if exists projects_organisation_id_lower_name_unique");
  await knex.raw("alter table projects add constraint projects_organisation_id_name_unique unique (organisation_id, name)");
}
