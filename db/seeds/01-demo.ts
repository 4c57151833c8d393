import type { Knex } from "knex";
import { hashPassword } from "../../lib/auth/password";
import { calculate, ENGINE_VERSION } from "../../lib/hydraulics/calculate";
import { demoFirm, demoUsers } from "./demo/people";
import { demoProjects, loadDemoDocument } from "./demo/projects";

// Idempotent: rows are keyed by fixed ids and only inserted when missing, so a second
// `npm start` keeps everything users changed.
export async function seed(knex: Knex): Promise<void> {
  await knex("organisations").insert(demoFirm).onConflict("id").ignore();
  for (const u of demoUsers) {
    const exists = await knex("users").where({ id: u.id }).first();
    if (!exists) {
      await knex("users").insert({ id: u.id, email: u.email, name: u.name, password_hash: await hashPassword(u.password) });
    }
    await knex("memberships").insert({ organisation_id: demoFirm.id, user_id: u.id, role: u.role === "owner" ? "owner" : "member" })
      .onConflict(["organisation_id", "user_id"]).ignore();
  }
  for (const p of demoProjects) {
    await knex("projects").insert({ id: p.id, organisation_id: demoFirm.id, name: p.name, client: p.client, site: p.site,
      design_conditions: p.design, created_by: "demo-owner" }).onConflict("id").ignore();
    // the client's address came later (handover): given to a demo project that has none yet
    await knex("projects").where({ id: p.id, client_email: "" }).update({ client_email: p.clientEmail });
    for (const u of demoUsers) {
      await knex("project_members").insert({ project_id: p.id, user_id: u.id, role: u.role }).onConflict(["project_id", "user_id"]).ignore();
    }
    for (const s of p.schematics) {
      const existing = await knex("schematics").where({ project_id: p.id, name: s.name }).first();
      if (existing) {
        await keepRevisionResults(knex, existing.id);
        continue;
      }
      const doc = loadDemoDocument(s.file, `${p.name} — ${s.name}`);
      const [row] = await knex("schematics").insert({ project_id: p.id, name: s.name, kind: "team", owner_id: "demo-designer",
        draft: doc, updated_by: "demo-designer" }).returning("id");
      await knex("schematic_revisions").insert({ schematic_id: row.id, number: 1, document: doc, status: s.status,
        message: "First design for review", author_id: "demo-designer" });
      await keepRevisionResults(knex, row.id);
    }
  }
}

/** Saving a revision sizes it (lib/revisions/with-results.ts): the demo's revisions carry their results for this engine too. */
async function keepRevisionResults(knex: Knex, schematicId: string): Promise<void> {
  const revisions = await knex("schematic_revisions").where({ schematic_id: schematicId }).select("id", "document");
  for (const r of revisions) {
    const sized = calculate(r.document);
    if (!sized.ok) continue;
    await knex("revision_results").insert({ revision_id: r.id, engine_version: ENGINE_VERSION, results: JSON.stringify(sized.results) })
      .onConflict(["revision_id", "engine_version"]).ignore();
  }
}
